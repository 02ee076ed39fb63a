import { Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import { ENGINE_VERSION, type Dimension } from 'ligament';
import type { AuthUser } from '../auth/auth-user.js';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { uploadsConfig } from '../config/index.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { EventsService } from '../events/events.service.js';
import { MemberResult } from '../results/models/member-result.model.js';
import { findingChain, findingKey, inputsHash } from '../results/result-rows.js';
import { RecomputePool } from './recompute-pool.service.js';
import type { RecheckDto, RecheckFindingDto, RecheckValueChangeDto } from './dto/revision.dto.js';
import { SubmittalsService } from './submittals.service.js';

const COMPARED = ['Ag', 'An', 'Ae', 'U', 'yielding', 'rupture', 'available'] as const;
/** What each compared value measures, for writing it with its unit. */
const QUANTITY: Record<(typeof COMPARED)[number], Dimension> = {
  Ag: 'area',
  An: 'area',
  Ae: 'area',
  U: 'ratio',
  yielding: 'force',
  rupture: 'force',
  available: 'force',
};

/** Same to 1e-9 relative: a recheck reports real changes, not float noise. */
function same(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
}

/**
 * Re-runs a stored submittal's original bytes through the current loader and engine and reports
 * what differs from what was stored. The stored results stay as they were (they are the record of
 * that check); the recheck itself is an event.
 */
@Injectable()
export class RecheckService {
  constructor(
    @InjectModel(CalcFile) private readonly calcFiles: typeof CalcFile,
    @InjectModel(MemberResult) private readonly results: typeof MemberResult,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @Inject(uploadsConfig.KEY) private readonly limits: ConfigType<typeof uploadsConfig>,
    private readonly submittals: SubmittalsService,
    private readonly events: EventsService,
    private readonly pool: RecomputePool,
  ) {}

  async recheck(submittalId: number, actor: AuthUser): Promise<RecheckDto> {
    const submittal = await this.submittals.find(submittalId);
    const [files, stored, storedDisc] = await Promise.all([
      this.calcFiles.findAll({ where: { submittalId }, order: [['id', 'ASC']] }),
      this.results.findAll({ where: { submittalId } }),
      this.discrepancies.findAll({ where: { submittalId } }),
    ]);
    const fileNames = new Map(files.map((f) => [f.id, f.fileName]));
    const outcome = await this.pool.check(
      files.map((f) => ({ name: f.fileName, content: f.content })),
      this.limits,
    );
    const valueChanges: RecheckValueChangeDto[] = [];
    const newFindings: RecheckFindingDto[] = [];
    let goneFindings: RecheckFindingDto[] = [];
    let unchangedFindings = 0;
    if (outcome.ok) {
      const storedByMember = new Map(stored.map((r) => [`${fileNames.get(r.calcFileId)}|${r.memberId}`, r]));
      const storedKeys = new Map(storedDisc.map((d) => [`${d.fileName}|${findingKey(d)}`, d]));
      const seen = new Set<string>();
      for (const file of outcome.files) {
        for (const member of file.audit.members) {
          const old = storedByMember.get(`${file.name}|${member.memberId}`);
          const now = {
            Ag: member.result.Ag,
            An: member.result.An,
            Ae: member.result.Ae,
            U: member.result.U,
            yielding: member.result.yielding.available,
            rupture: member.result.rupture.available,
            available: member.result.governing.available,
          };
          for (const field of COMPARED) {
            if (!old || !same(old[field], now[field])) {
              valueChanges.push({
                fileName: file.name,
                memberId: member.memberId,
                field,
                stored: old ? old[field] : null,
                current: now[field],
                units: file.document.profile.units,
                quantity: QUANTITY[field],
              });
            }
          }
          if (old && old.inputsHash !== inputsHash(file.document, member.memberId)) {
            valueChanges.push({
              fileName: file.name,
              memberId: member.memberId,
              field: 'inputsHash',
              stored: null,
              current: null,
              units: file.document.profile.units,
              quantity: null,
            });
          }
          for (const f of member.findings) {
            const chain = findingChain(f);
            const key = `${file.name}|${findingKey({ code: f.code, memberId: f.memberId ?? null, chain })}`;
            seen.add(key);
            if (storedKeys.has(key)) unchangedFindings++;
            else
              newFindings.push({
                fileName: file.name,
                code: f.code,
                memberId: f.memberId ?? null,
                chain,
                severity: f.severity,
                message: f.message,
              });
          }
        }
      }
      goneFindings = storedDisc
        .filter((d) => !seen.has(`${d.fileName}|${findingKey(d)}`))
        .map((d) => ({
          fileName: d.fileName,
          code: d.code,
          memberId: d.memberId,
          chain: d.chain,
          severity: d.severity,
          message: d.message,
        }));
    }
    const loadErrors = outcome.ok ? [] : [...outcome.errors];
    const result: RecheckDto = {
      submittalId,
      storedEngineVersion: submittal.engineVersion,
      currentEngineVersion: ENGINE_VERSION,
      changed: valueChanges.length + newFindings.length + goneFindings.length + loadErrors.length > 0,
      valueChanges,
      newFindings,
      goneFindings,
      unchangedFindings,
      loadErrors,
    };
    await this.events.record({
      type: 'submittal.rechecked',
      actorId: actor.id,
      projectId: submittal.projectId,
      submittalId,
      data: {
        storedEngineVersion: result.storedEngineVersion,
        currentEngineVersion: result.currentEngineVersion,
        changed: result.changed,
        valueChanges: valueChanges.length,
        newFindings: newFindings.length,
        goneFindings: goneFindings.length,
      },
    });
    return result;
  }
}
