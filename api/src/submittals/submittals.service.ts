import {
  BadRequestException,
  ConflictException,
  Inject,
  Injectable,
  NotFoundException,
  PayloadTooLargeException,
  UnprocessableEntityException,
} from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { CAUTION } from 'ligament';
import { Op, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser } from '../auth/auth-user.js';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { appConfig, uploadsConfig } from '../config/index.js';
import { OPEN_STATUSES } from '../discrepancies/discrepancy-status.js';
import {
  DiscrepancyRevisionsService,
  type NewDiscrepancyRow,
} from '../discrepancies/discrepancy-revisions.service.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { EventsService } from '../events/events.service.js';
import { MailService } from '../mail/mail.service.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { MemberResult } from '../results/models/member-result.model.js';
import { discrepancyRow, memberResultRow } from '../results/result-rows.js';
import { User } from '../users/models/user.model.js';
import { type IncomingFile } from './check-files.js';
import { RecomputePool } from './recompute-pool.service.js';
import type {
  CreateSubmittalDto,
  StampSubmittalDto,
  SubmittalDto,
  UploadResultDto,
} from './dto/submittal.dto.js';
import { Submittal } from './models/submittal.model.js';
import { summarise, type LocatedFinding } from './submittal-summary.js';

const STAMP_WORDS: Record<string, string> = {
  'no-exceptions-taken': 'No exceptions taken',
  'make-corrections-noted': 'Make corrections noted',
  'revise-and-resubmit': 'Revise and resubmit',
  rejected: 'Rejected',
};

export function stampWords(action: string): string {
  return STAMP_WORDS[action] ?? action;
}

@Injectable()
export class SubmittalsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Submittal) private readonly submittals: typeof Submittal,
    @InjectModel(CalcFile) private readonly calcFiles: typeof CalcFile,
    @InjectModel(MemberResult) private readonly results: typeof MemberResult,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(Project) private readonly projects: typeof Project,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    @Inject(uploadsConfig.KEY) private readonly limits: ConfigType<typeof uploadsConfig>,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    private readonly events: EventsService,
    private readonly pool: RecomputePool,
    private readonly mail: MailService,
    private readonly carry: DiscrepancyRevisionsService,
  ) {}

  webPath(id: number): string {
    return `/submittals/${id}`;
  }

  /**
   * Validates and recomputes every file, then stores the submittal, its files, member results,
   * discrepancies, events and mail in ONE transaction. Any invalid file: 422 with every CalcError of
   * every file, and nothing is stored.
   */
  async upload(
    projectId: number,
    dto: CreateSubmittalDto,
    files: readonly IncomingFile[],
    actor: AuthUser,
  ): Promise<UploadResultDto> {
    if (files.length === 0)
      throw new BadRequestException('Attach at least one calc file in the "files" field.');
    const total = files.reduce((sum, f) => sum + f.content.length, 0);
    if (total > this.limits.maxTotalBytes) {
      throw new PayloadTooLargeException(
        `The files total ${total} bytes; the limit is ${this.limits.maxTotalBytes} bytes per submittal.`,
      );
    }
    if (dto.revisionOf !== undefined) {
      const original = await this.submittals.findByPk(dto.revisionOf, { attributes: ['id', 'projectId'] });
      if (!original || original.projectId !== projectId) {
        throw new UnprocessableEntityException({
          message: `revisionOf ${dto.revisionOf} is not a submittal of project ${projectId}.`,
          details: [
            {
              field: 'revisionOf',
              rule: 'same-project',
              message: 'a revision must answer a submittal of the same project',
            },
          ],
        });
      }
    }
    const outcome = await this.pool.check(files, this.limits);
    if (!outcome.ok) {
      throw new UnprocessableEntityException({
        message: `${outcome.invalidFiles} of ${files.length} file(s) are invalid (${outcome.errors.length} error(s)); nothing was stored.`,
        details: outcome.errors,
      });
    }
    const located: LocatedFinding[] = outcome.files.flatMap((f) =>
      f.audit.members.flatMap((m) => m.findings.map((finding) => ({ fileName: f.name, finding }))),
    );
    const memberCount = outcome.files.reduce((n, f) => n + f.audit.members.length, 0);
    const summary = summarise(outcome.files.length, memberCount, located);
    const engineVersion = outcome.files[0]?.audit.engineVersion ?? 'unknown';
    const recipients = await this.recipients(projectId);
    const project = await this.projects.findByPk(projectId);

    const submittal = await this.sequelize.transaction(async (transaction) => {
      const s = await this.submittals.create(
        {
          projectId,
          title: dto.title,
          revisionOfId: dto.revisionOf ?? null,
          submittedById: actor.id,
          viaTokenId: actor.token?.id ?? null,
          engineVersion,
          summary,
          reconciled: true,
        },
        { transaction },
      );
      // The transaction holds the write lock (BEGIN IMMEDIATE), so ids after MAX(id) are ours: the
      // files go in with one bulk insert and results and discrepancies can point at them.
      const firstFileId = ((await this.calcFiles.max<number, CalcFile>('id', { transaction })) ?? 0) + 1;
      const fileRows = outcome.files.map((file, i) => ({
        id: firstFileId + i,
        submittalId: s.id,
        fileName: file.name,
        size: file.content.length,
        sha256: file.sha256,
        content: file.content,
        document: file.document,
        memberIds: file.document.members.map((m) => m.input.id),
      }));
      await this.calcFiles.bulkCreate(fileRows, { transaction });
      const resultRows: ReturnType<typeof memberResultRow>[] = [];
      const now = new Date();
      const discrepancyRows: (ReturnType<typeof discrepancyRow> & NewDiscrepancyRow)[] = [];
      outcome.files.forEach((file, i) => {
        const calcFileId = firstFileId + i;
        for (const member of file.audit.members) {
          resultRows.push(
            memberResultRow({ submittalId: s.id, calcFileId }, file.document, file.audit, member),
          );
          for (const finding of member.findings) {
            discrepancyRows.push({
              ...discrepancyRow(
                { projectId, submittalId: s.id, calcFileId, fileName: file.name },
                finding,
                file.document.profile.units,
              ),
              firstRaisedAt: now,
            });
          }
        }
      });
      await this.results.bulkCreate(resultRows, { transaction });
      // Ids after MAX(id) are ours too, so a carried item's event can name the row it continues.
      const firstDiscrepancyId =
        ((await this.discrepancies.max<number, Discrepancy>('id', { transaction })) ?? 0) + 1;
      discrepancyRows.forEach((row, i) => {
        row.id = firstDiscrepancyId + i;
      });
      const plan =
        dto.revisionOf === undefined
          ? null
          : await this.carry.plan(
              { submittalId: s.id, projectId, revisionOfId: dto.revisionOf },
              discrepancyRows,
              fileRows.map((f) => ({
                calcFileId: f.id,
                fileName: f.fileName,
                memberIds: f.memberIds,
                content: f.content,
              })),
              transaction,
            );
      await this.discrepancies.bulkCreate(discrepancyRows, { transaction });
      const carried = plan ? await this.carry.apply(plan, null, transaction) : null;
      await this.events.record(
        {
          type: dto.revisionOf ? 'submittal.revised' : 'submittal.checked',
          actorId: actor.id,
          projectId,
          submittalId: s.id,
          data: {
            title: dto.title,
            revisionOf: dto.revisionOf ?? null,
            engineVersion,
            viaApiToken: Boolean(actor.token),
            ...summary.bySeverity,
            ...(carried ?? {}),
          },
        },
        transaction,
      );
      const url = `${this.app.publicUrl}${this.webPath(s.id)}`;
      await this.mail.enqueue(
        recipients.map((to) => ({
          kind: 'submittal-checked' as const,
          to,
          subject: `Submittal checked: ${dto.title} (${summary.bySeverity.error} errors, ${summary.bySeverity.warning} warnings)`,
          text: [
            `${actor.name} submitted "${dto.title}" to ${project?.name ?? `project ${projectId}`}.`,
            `Recomputed with engine ${engineVersion}: ${summary.files} file(s), ${summary.members} member(s), ${summary.findings} finding(s).`,
            summary.worst ? `Worst: ${summary.worst.code} ${summary.worst.message}` : 'No findings.',
            url,
            '',
            CAUTION,
          ].join('\n'),
        })),
        transaction,
      );
      return s;
    });
    return {
      submittalId: submittal.id,
      projectId,
      title: submittal.title,
      revisionOfId: submittal.revisionOfId,
      engineVersion,
      summary,
      webPath: this.webPath(submittal.id),
      webUrl: `${this.app.publicUrl}${this.webPath(submittal.id)}`,
    };
  }

  async list(projectId: number): Promise<SubmittalDto[]> {
    const rows = await this.submittals.findAll({
      where: { projectId },
      include: [
        { model: User, as: 'submittedBy', attributes: ['name'] },
        { model: User, as: 'stampedBy', attributes: ['name'] },
      ],
      order: [['id', 'DESC']],
    });
    return Promise.all(rows.map((s) => this.view(s)));
  }

  async get(id: number): Promise<SubmittalDto> {
    return this.view(await this.find(id));
  }

  async find(id: number): Promise<Submittal> {
    const s = await this.submittals.findByPk(id, {
      include: [
        { model: User, as: 'submittedBy', attributes: ['name'] },
        { model: User, as: 'stampedBy', attributes: ['name'] },
      ],
    });
    if (!s) throw new NotFoundException(`No submittal ${id}.`);
    return s;
  }

  /** Current error-severity discrepancies of the submittal still in an open status. */
  openErrors(submittalId: number, transaction?: Transaction): Promise<Discrepancy[]> {
    return this.discrepancies.findAll({
      where: {
        submittalId,
        severity: 'error',
        status: { [Op.in]: [...OPEN_STATUSES] },
        supersededBySubmittalId: null,
      },
      order: [['id', 'ASC']],
      transaction,
    });
  }

  /**
   * The checker's review action. Refused (409) once stamped, and while error-severity discrepancies
   * are open unless an override reason is given (the reason is kept with the stamp and the event).
   * The stamp is a compare-and-set on (not stamped, version) inside the write, and the open errors
   * are counted in that same write: of two simultaneous stamps exactly one is applied (and mailed);
   * the other gets 409 with the stamp that won.
   */
  async stamp(id: number, dto: StampSubmittalDto, actor: AuthUser): Promise<SubmittalDto> {
    const submittal = await this.find(id);
    if (submittal.stampAction) throw this.alreadyStamped(submittal);
    const recipients = await this.recipients(submittal.projectId);
    await this.sequelize.transaction(async (transaction) => {
      const open = await this.openErrors(id, transaction);
      if (open.length > 0 && !dto.overrideReason) {
        throw new ConflictException({
          message: `${open.length} error-severity discrepancy(ies) are still open; resolve them or stamp with an overrideReason.`,
          details: open.map((d) => ({
            id: d.id,
            code: d.code,
            memberId: d.memberId,
            status: d.status,
            message: d.message,
          })),
        });
      }
      const [changed] = await this.submittals.update(
        {
          stampAction: dto.action,
          stampComment: dto.comment,
          stampOverrideReason: open.length > 0 ? (dto.overrideReason ?? null) : null,
          stampedById: actor.id,
          stampedAt: new Date(),
          version: submittal.version + 1,
        },
        { where: { id, stampAction: null, version: submittal.version }, transaction },
      );
      if (changed !== 1) {
        const now = await this.submittals.findByPk(id, {
          include: [{ model: User, as: 'stampedBy', attributes: ['name'] }],
          transaction,
        });
        throw this.alreadyStamped(now ?? submittal);
      }
      await this.events.record(
        {
          type: 'submittal.stamped',
          actorId: actor.id,
          projectId: submittal.projectId,
          submittalId: id,
          data: {
            action: dto.action,
            comment: dto.comment,
            overrideReason: open.length > 0 ? dto.overrideReason : null,
            openErrors: open.length,
          },
        },
        transaction,
      );
      await this.mail.enqueue(
        recipients.map((to) => ({
          kind: 'submittal-stamped' as const,
          to,
          subject: `Submittal stamped: ${submittal.title} — ${stampWords(dto.action)}`,
          text: [
            `${actor.name} stamped "${submittal.title}": ${stampWords(dto.action)}.`,
            dto.comment,
            ...(open.length > 0
              ? [`Stamped over ${open.length} open error(s): ${dto.overrideReason ?? ''}`]
              : []),
            `${this.app.publicUrl}${this.webPath(id)}`,
            '',
            CAUTION,
          ].join('\n'),
        })),
        transaction,
      );
    });
    return this.get(id);
  }

  /** 409 for a stamp on a stamped submittal, with the stamp that is on it. */
  private alreadyStamped(s: Submittal): ConflictException {
    const words = s.stampAction ? stampWords(s.stampAction) : 'changed';
    const by = s.stampedBy?.name ? ` by ${s.stampedBy.name}` : '';
    const message = `Submittal ${s.id} is already stamped "${words}"${by}; this stamp was not applied.`;
    return new ConflictException({
      message,
      details: [{ id: s.id, status: 'stamped', action: s.stampAction, version: s.version, message }],
    });
  }

  /** E-mail addresses of the project's active members. */
  async recipients(projectId: number): Promise<string[]> {
    const rows = await this.members.findAll({
      where: { projectId },
      include: [{ model: User, attributes: ['email', 'active'] }],
    });
    return rows.flatMap((m) => (m.user && m.user.active ? [m.user.email] : []));
  }

  private async view(s: Submittal): Promise<SubmittalDto> {
    const [openDiscrepancies, revisions] = await Promise.all([
      this.discrepancies.count({
        where: { submittalId: s.id, status: { [Op.in]: [...OPEN_STATUSES] }, supersededBySubmittalId: null },
      }),
      this.submittals.findAll({ where: { revisionOfId: s.id }, attributes: ['id'], order: [['id', 'ASC']] }),
    ]);
    return {
      id: s.id,
      projectId: s.projectId,
      title: s.title,
      revisionOfId: s.revisionOfId,
      revisedBy: revisions.map((r) => r.id),
      submittedBy: s.submittedBy?.name ?? '',
      viaApiToken: s.viaTokenId !== null,
      engineVersion: s.engineVersion,
      status: s.stampAction ? 'stamped' : 'checked',
      summary: s.summary,
      openDiscrepancies,
      stamp:
        s.stampAction && s.stampedAt
          ? {
              action: s.stampAction,
              comment: s.stampComment ?? '',
              overrideReason: s.stampOverrideReason,
              stampedBy: s.stampedBy?.name ?? '',
              stampedAt: new Date(s.stampedAt).toISOString(),
            }
          : null,
      webPath: this.webPath(s.id),
      createdAt: new Date(s.createdAt).toISOString(),
    };
  }
}
