import { ConflictException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { createTwoFilesPatch } from 'diff';
import { diffDocuments, type CalcDocument } from 'ligament';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { canonicalJson } from '../common/hash.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { matchFiles } from '../discrepancies/discrepancy-identity.js';
import type { DiffDiscrepancyDto, FileDiffDto, RevisionDiffDto } from './dto/revision.dto.js';
import { SubmittalsService } from './submittals.service.js';

/** The file's own JSON in canonical form (sorted keys, 2 spaces), so the diff shows content changes only. */
export function canonicalFileText(file: Pick<CalcFile, 'content' | 'document'>): string {
  try {
    return `${canonicalJson(JSON.parse(file.content.toString('utf8')))}\n`;
  } catch {
    return `${canonicalJson(file.document)}\n`;
  }
}

type Pairable = Pick<CalcFile, 'id' | 'fileName' | 'memberIds' | 'content' | 'document'>;

/**
 * The change between two stored documents by meaning; `null` for a side that is absent (an added or
 * removed file: every member added or removed). Null when a stored document cannot be compared
 * (written by an engine whose document shape differs): the text diff still shows what changed.
 */
export function changesByMeaning(
  previous: CalcDocument | null,
  current: CalcDocument | null,
): FileDiffDto['changes'] {
  try {
    if (previous && current) return diffDocuments(previous, current);
    if (current) return diffDocuments({ ...current, members: [] }, current);
    if (previous) return diffDocuments(previous, { ...previous, members: [] });
    return [];
  } catch {
    return null;
  }
}

/**
 * Pairs each current file with its counterpart in the previous submittal (`matchFiles`: same file
 * name first, then the previous file sharing the most member ids). Unpaired files are added / removed.
 */
export function pairFiles(previous: readonly Pairable[], current: readonly Pairable[]): FileDiffDto[] {
  const pairs = matchFiles(previous, current);
  const paired = new Set(pairs.values());
  const out: FileDiffDto[] = [];
  const byName: FileDiffDto[] = [];
  const byMembers: FileDiffDto[] = [];
  const added: FileDiffDto[] = [];
  for (const file of current) {
    const previousFile = pairs.get(file);
    if (previousFile?.fileName === file.fileName) byName.push(diffPair(previousFile, file, 'file-name'));
    else if (previousFile) byMembers.push(diffPair(previousFile, file, 'member-ids'));
    else
      added.push({
        change: 'added',
        previousFile: null,
        currentFile: file.fileName,
        matchedBy: 'none',
        patch: createTwoFilesPatch('/dev/null', `b/${file.fileName}`, '', canonicalFileText(file)),
        changes: changesByMeaning(null, file.document),
      });
  }
  out.push(...byName, ...byMembers, ...added);
  for (const p of previous) {
    if (paired.has(p)) continue;
    out.push({
      change: 'removed',
      previousFile: p.fileName,
      currentFile: null,
      matchedBy: 'none',
      patch: createTwoFilesPatch(`a/${p.fileName}`, '/dev/null', canonicalFileText(p), ''),
      changes: changesByMeaning(p.document, null),
    });
  }
  return out;
}

function diffPair(previous: Pairable, current: Pairable, matchedBy: 'file-name' | 'member-ids'): FileDiffDto {
  const a = canonicalFileText(previous);
  const b = canonicalFileText(current);
  return {
    change: a === b ? 'unchanged' : 'changed',
    previousFile: previous.fileName,
    currentFile: current.fileName,
    matchedBy,
    patch: a === b ? '' : createTwoFilesPatch(`a/${previous.fileName}`, `b/${current.fileName}`, a, b),
    changes: a === b ? [] : changesByMeaning(previous.document, current.document),
  };
}

function brief(d: Discrepancy): DiffDiscrepancyDto {
  return {
    id: d.id,
    code: d.code,
    memberId: d.memberId,
    chain: d.chain,
    severity: d.severity,
    status: d.status,
    message: d.message,
  };
}

@Injectable()
export class RevisionsService {
  constructor(
    @InjectModel(CalcFile) private readonly calcFiles: typeof CalcFile,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    private readonly submittals: SubmittalsService,
  ) {}

  /** The revision against the submittal it revises: file diffs, and discrepancies closed, kept, opened. */
  async diff(submittalId: number): Promise<RevisionDiffDto> {
    const current = await this.submittals.find(submittalId);
    if (current.revisionOfId === null)
      throw new ConflictException(`Submittal ${submittalId} is not a revision of another submittal.`);
    const previousId = current.revisionOfId;
    const [prevFiles, curFiles, prevDisc, curDisc] = await Promise.all([
      this.calcFiles.findAll({ where: { submittalId: previousId }, order: [['id', 'ASC']] }),
      this.calcFiles.findAll({ where: { submittalId }, order: [['id', 'ASC']] }),
      this.discrepancies.findAll({ where: { submittalId: previousId }, order: [['id', 'ASC']] }),
      this.discrepancies.findAll({ where: { submittalId }, order: [['id', 'ASC']] }),
    ]);
    // The links the upload recorded (discrepancy-identity.ts): a kept item continues one of an earlier
    // submittal; a closed one was resolved by this revision; an opened one continues nothing.
    const ancestors = await this.discrepancies.findAll({
      where: {
        [Op.or]: [
          { id: { [Op.in]: curDisc.flatMap((d) => (d.carriedFromId === null ? [] : [d.carriedFromId])) } },
          { supersededBySubmittalId: submittalId, status: 'resolved' },
        ],
      },
      order: [['id', 'ASC']],
    });
    const byId = new Map([...prevDisc, ...ancestors].map((d) => [d.id, d]));
    const kept = curDisc.flatMap((d) => {
      const previous = d.carriedFromId === null ? undefined : byId.get(d.carriedFromId);
      return previous ? [{ previous: brief(previous), current: brief(d) }] : [];
    });
    return {
      submittalId,
      previousSubmittalId: previousId,
      files: pairFiles(prevFiles, curFiles),
      closed: [...byId.values()]
        .filter((d) => d.supersededBySubmittalId === submittalId && d.status === 'resolved')
        .sort((a, b) => a.id - b.id)
        .map(brief),
      kept,
      opened: curDisc.filter((d) => d.carriedFromId === null).map(brief),
    };
  }
}
