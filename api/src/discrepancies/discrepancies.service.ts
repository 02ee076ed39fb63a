import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Inject,
  Injectable,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser } from '../auth/auth-user.js';
import { Role } from '../auth/role.enum.js';
import { appConfig } from '../config/index.js';
import { HotReadsService, type SqlValue } from '../database/hot-reads.service.js';
import { EventsService } from '../events/events.service.js';
import { MailService } from '../mail/mail.service.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { User } from '../users/models/user.model.js';
import { OPEN_STATUSES, STATUS_MOVES, type DiscrepancyStatus } from './discrepancy-status.js';
import type {
  BulkResultDto,
  BulkTransitionDto,
  CommentViewDto,
  CreateCommentDto,
  DiscrepancyDetailDto,
  DiscrepancyDto,
  ListDiscrepanciesQuery,
  TransitionDto,
} from './dto/discrepancy.dto.js';
import { DiscrepancyComment } from './models/discrepancy-comment.model.js';
import { Discrepancy } from './models/discrepancy.model.js';

/** Must match the expression index of migration 0003 character for character. */
const SEVERITY_RANK_SQL = "CASE severity WHEN 'error' THEN 0 WHEN 'warning' THEN 1 ELSE 2 END";
/** Stored dates are `YYYY-MM-DD HH:MM:SS.SSS +00:00` (Sequelize, always UTC): ISO 8601 in SQL. */
const iso = (column: string) =>
  `CASE WHEN ${column} IS NULL THEN NULL ELSE replace(substr(${column}, 1, 23), ' ', 'T') || 'Z' END`;
/**
 * The stored comma-joined chain as a JSON array of strings, as `chain.split(',')` would give (hole
 * ids are identifiers by the calc schema; backslashes and quotes are escaped all the same).
 */
const CHAIN_JSON = `CASE WHEN chain IS NULL OR chain = '' THEN json_array() ELSE json('["' || replace(replace(replace(chain, '\\', '\\\\'), '"', '\\"'), ',', '","') || '"]') END`;
/** One list item as JSON text, the fields of DiscrepancyDto in its order. */
const ITEM_JSON = `json_object(${[
  ...[
    'id',
    'projectId',
    'submittalId',
    'calcFileId',
    'fileName',
    'memberId',
    'code',
    'name',
    'class',
    'severity',
    'direction',
    'chain',
    'claimed',
    'recomputed',
    'units',
    'quantity',
    'message',
    'pointer',
    'status',
  ].map((c) => `'${c}', ${c === 'chain' ? CHAIN_JSON : c}`),
  ...['acknowledgedAt', 'createdAt', 'updatedAt'].map((c) => `'${c}', ${iso(c)}`),
].join(', ')})`;
const ITEMS_OPEN = Buffer.from('{"items":[');
const NOTHING = Buffer.alloc(0);
/** Filters the tally table of migration 0003 can count; the others need the rows. */
const TALLIED = new Set(['projectId', 'submittalId', 'class', 'severity', 'status']);

/** Why a move is refused, or null when the actor may make it. */
export function refusal(
  d: { status: DiscrepancyStatus },
  dto: { to: DiscrepancyStatus; note?: string; revisionSubmittalId?: number },
  role: Role,
): { status: 403 | 409 | 400; message: string } | null {
  const moves = STATUS_MOVES.filter((m) => m.to === dto.to);
  const mine = moves.find((m) => m.role === role);
  if (!mine) {
    const who = [...new Set(moves.map((m) => m.role))].join(' or ');
    return { status: 403, message: `Only a ${who} may move a discrepancy to ${dto.to}.` };
  }
  if (!mine.from.includes(d.status)) {
    return {
      status: 409,
      message: `A discrepancy that is ${d.status} cannot be moved to ${dto.to} (allowed from: ${mine.from.join(', ')}).`,
    };
  }
  if (mine.requires === 'note-or-revision' && !dto.note && dto.revisionSubmittalId === undefined) {
    return { status: 400, message: 'An answer needs a note or a revisionSubmittalId.' };
  }
  if (mine.requires === 'reason' && !dto.note) {
    return { status: 400, message: `Moving to ${dto.to} needs a reason in "note".` };
  }
  return null;
}

function throwRefusal(r: { status: 403 | 409 | 400; message: string }): never {
  if (r.status === 403) throw new ForbiddenException(r.message);
  if (r.status === 409) throw new ConflictException(r.message);
  throw new BadRequestException(r.message);
}

@Injectable()
export class DiscrepanciesService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(DiscrepancyComment) private readonly comments: typeof DiscrepancyComment,
    @InjectModel(Submittal) private readonly submittals: typeof Submittal,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    private readonly events: EventsService,
    private readonly mail: MailService,
    private readonly reads: HotReadsService,
  ) {}

  /**
   * The list is the hottest route, so it is one prepared statement on the read connection: SQLite
   * reads the page in index order, builds every item as JSON and sums the total from the tally table
   * (counting rows only when a member or code filter is set). The items come back as UTF-8 bytes and
   * go out as they are, wrapped into the page's JSON: no JavaScript string is made of them. Sort
   * columns come from the DTO's whitelist; every value is bound.
   */
  async list(projectId: number, q: ListDiscrepanciesQuery): Promise<Buffer> {
    const filters: { column: string; values: SqlValue[] }[] = [{ column: 'projectId', values: [projectId] }];
    if (q.submittalId !== undefined) filters.push({ column: 'submittalId', values: [q.submittalId] });
    if (q.class) filters.push({ column: 'class', values: [...new Set(q.class)] });
    if (q.severity) filters.push({ column: 'severity', values: [...new Set(q.severity)] });
    if (q.status) {
      const statuses = new Set(q.status.flatMap((s) => (s === 'open' ? [...OPEN_STATUSES] : [s])));
      filters.push({ column: 'status', values: [...statuses] });
    }
    if (q.memberId) filters.push({ column: 'memberId', values: [q.memberId] });
    if (q.code) filters.push({ column: 'code', values: [q.code] });
    const where = filters
      .map(({ column, values }) =>
        values.length === 1 ? `${column} = ?` : `${column} IN (${values.map(() => '?').join(', ')})`,
      )
      .join(' AND ');
    const params = filters.flatMap((f) => f.values);
    const count = filters.every((f) => TALLIED.has(f.column))
      ? `SELECT coalesce(sum(n), 0) FROM discrepancy_tallies WHERE ${where}`
      : `SELECT count(*) FROM discrepancies WHERE ${where}`;
    const direction = q.order === 'desc' ? 'DESC' : 'ASC';
    const key = q.sort === 'severity' ? SEVERITY_RANK_SQL : q.sort;
    const row = await this.reads.get<{ items: Buffer | null; total: number }>(
      `WITH page AS (
         SELECT ${ITEM_JSON} AS item, ${key} AS k, id FROM discrepancies WHERE ${where}
         ORDER BY ${key} ${direction}, id ASC LIMIT ? OFFSET ?)
       SELECT CAST((SELECT group_concat(item, ',' ORDER BY k ${direction}, id ASC) FROM page) AS BLOB) AS items,
              (${count}) AS total`,
      [...params, q.pageSize, (q.page - 1) * q.pageSize, ...params],
    );
    return Buffer.concat([
      ITEMS_OPEN,
      row?.items ?? NOTHING,
      Buffer.from(`],"total":${Number(row?.total ?? 0)},"page":${q.page},"pageSize":${q.pageSize}}`),
    ]);
  }

  async detail(id: number, actor: AuthUser): Promise<DiscrepancyDetailDto> {
    const d = await this.find(id);
    const [submittal, history, comments] = await Promise.all([
      this.submittals.findByPk(d.submittalId, {
        include: [{ model: User, as: 'submittedBy', attributes: ['name'] }],
      }),
      this.events.list({ discrepancyId: id }, 1, 500),
      this.comments.findAll({
        where: { discrepancyId: id },
        include: [{ model: User, attributes: ['name', 'role'] }],
        order: [['id', 'ASC']],
      }),
    ]);
    const allowedMoves = actor.token
      ? []
      : [
          ...new Set(
            STATUS_MOVES.filter((m) => refusal(d, { to: m.to, note: 'x' }, actor.role) === null).map(
              (m) => m.to,
            ),
          ),
        ];
    return {
      ...this.view(d),
      raisedBy: submittal?.submittedBy?.name ?? '',
      submittalTitle: submittal?.title ?? '',
      history: history.items,
      comments: comments.map((c) => this.commentView(c)),
      allowedMoves,
      canAcknowledge: !actor.token && actor.role === Role.OwnerRep && !d.acknowledgedAt,
    };
  }

  /**
   * One status move. 403 wrong role, 409 not from this status, 400 missing note, 422 bad revision
   * link. The move is a compare-and-set on the status and version that were read: when someone else
   * moved the discrepancy in between, 409 with its current status and version, and nothing changes.
   */
  async move(id: number, dto: TransitionDto, actor: AuthUser): Promise<DiscrepancyDetailDto> {
    const d = await this.find(id);
    const refused = refusal(d, dto, actor.role);
    if (refused) throwRefusal(refused);
    if (dto.revisionSubmittalId !== undefined) await this.checkRevision(d, dto.revisionSubmittalId);
    await this.sequelize.transaction(async (transaction) => {
      const lost = await this.apply(d, dto.to, dto.note, dto.revisionSubmittalId, actor, transaction);
      if (lost) {
        const message = `Discrepancy ${id} was moved by someone else meanwhile: it is now ${lost.status} (version ${lost.version}); it was not moved to ${dto.to}.`;
        throw new ConflictException({
          message,
          details: [{ id, status: lost.status, version: lost.version, message }],
        });
      }
    });
    return this.detail(id, actor);
  }

  /** Checker bulk move: all or nothing; any refusal answers with every refused id and changes none. */
  async bulkMove(projectId: number, dto: BulkTransitionDto, actor: AuthUser): Promise<BulkResultDto> {
    const ids = [...new Set(dto.ids)];
    const rows = await this.discrepancies.findAll({ where: { id: { [Op.in]: ids } } });
    const byId = new Map(rows.map((r) => [r.id, r]));
    const problems: { id: number; status: number; message: string }[] = [];
    for (const id of ids) {
      const d = byId.get(id);
      if (!d || d.projectId !== projectId) {
        problems.push({ id, status: 404, message: `No discrepancy ${id} in project ${projectId}.` });
        continue;
      }
      const r = refusal(d, dto, actor.role);
      if (r) problems.push({ id, ...r });
    }
    if (problems.some((p) => p.status === 403))
      throw new ForbiddenException({ message: 'Only a checker may make these moves.', details: problems });
    if (problems.length > 0) {
      throw new ConflictException({
        message: `${problems.length} of ${ids.length} discrepancies cannot be moved to ${dto.to}; none were moved.`,
        details: problems,
      });
    }
    await this.sequelize.transaction(async (transaction) => {
      const lost: { id: number; status: string; version: number; message: string }[] = [];
      for (const id of ids) {
        const now = await this.apply(
          byId.get(id) as Discrepancy,
          dto.to,
          dto.note,
          undefined,
          actor,
          transaction,
          true,
        );
        if (now)
          lost.push({
            id,
            status: now.status,
            version: now.version,
            message: `moved by someone else meanwhile: now ${now.status} (version ${now.version})`,
          });
      }
      // All or nothing: throwing rolls back the moves already made in this transaction.
      if (lost.length > 0)
        throw new ConflictException({
          message: `${lost.length} of ${ids.length} discrepancies were moved by someone else meanwhile; none were moved.`,
          details: lost,
        });
    });
    const after = await this.discrepancies.findAll({
      where: { id: { [Op.in]: ids } },
      order: [['id', 'ASC']],
      raw: true,
    });
    return { moved: ids.length, items: after.map((d) => this.view(d)) };
  }

  async comment(id: number, dto: CreateCommentDto, actor: AuthUser): Promise<CommentViewDto> {
    const d = await this.find(id);
    const created = await this.sequelize.transaction(async (transaction) => {
      const c = await this.comments.create(
        { discrepancyId: id, authorId: actor.id, body: dto.body },
        { transaction },
      );
      await this.events.record(
        {
          type: 'discrepancy.commented',
          actorId: actor.id,
          projectId: d.projectId,
          submittalId: d.submittalId,
          discrepancyId: id,
          data: { commentId: c.id },
        },
        transaction,
      );
      return c;
    });
    const c = await this.comments.findByPk(created.id, {
      include: [{ model: User, attributes: ['name', 'role'] }],
    });
    return this.commentView(c as DiscrepancyComment);
  }

  /** The owner's rep's one action: note that they have seen it. Idempotent. */
  async acknowledge(id: number, actor: AuthUser): Promise<DiscrepancyDetailDto> {
    const d = await this.find(id);
    if (!d.acknowledgedAt) {
      await this.sequelize.transaction(async (transaction) => {
        // Only the first of two simultaneous acknowledgements records one; the other has nothing to do.
        const [changed] = await this.discrepancies.update(
          { acknowledgedAt: new Date(), acknowledgedById: actor.id },
          { where: { id, acknowledgedAt: null }, transaction },
        );
        if (changed !== 1) return;
        await this.events.record(
          {
            type: 'discrepancy.acknowledged',
            actorId: actor.id,
            projectId: d.projectId,
            submittalId: d.submittalId,
            discrepancyId: id,
            data: {},
          },
          transaction,
        );
      });
    }
    return this.detail(id, actor);
  }

  /**
   * Moves `d` from the status and version it was read with, records the event and queues the mail.
   * Returns null when moved; when the row changed since it was read, moves nothing and returns its
   * current status and version (the caller answers 409 and the transaction rolls back).
   */
  private async apply(
    d: Discrepancy,
    to: DiscrepancyStatus,
    note: string | undefined,
    revisionSubmittalId: number | undefined,
    actor: AuthUser,
    transaction: Transaction,
    bulk = false,
  ): Promise<{ status: DiscrepancyStatus; version: number } | null> {
    const from = d.status;
    const [changed] = await this.discrepancies.update(
      { status: to, version: d.version + 1 },
      { where: { id: d.id, status: from, version: d.version }, transaction },
    );
    if (changed !== 1) {
      const now = await this.discrepancies.findByPk(d.id, { attributes: ['status', 'version'], transaction });
      return { status: now?.status ?? from, version: now?.version ?? d.version };
    }
    await this.events.record(
      {
        type: `discrepancy.${to}`,
        actorId: actor.id,
        projectId: d.projectId,
        submittalId: d.submittalId,
        discrepancyId: d.id,
        data: { from, to, note: note ?? null, revisionSubmittalId: revisionSubmittalId ?? null, bulk },
      },
      transaction,
    );
    if (to === 'answered') {
      const checkers = await this.members.findAll({
        where: { projectId: d.projectId },
        include: [{ model: User, where: { role: Role.Checker, active: true }, attributes: ['email'] }],
        transaction,
      });
      await this.mail.enqueue(
        checkers.flatMap((m) =>
          m.user
            ? [
                {
                  kind: 'discrepancy-answered' as const,
                  to: m.user.email,
                  subject: `Discrepancy answered: ${d.code} on ${d.memberId ?? d.fileName}`,
                  text: [
                    `${actor.name} answered ${d.code} (${d.name}) on ${d.memberId ?? d.fileName}:`,
                    note ?? '',
                    revisionSubmittalId
                      ? `Revision: ${this.app.publicUrl}/submittals/${revisionSubmittalId}`
                      : '',
                    `${this.app.publicUrl}/discrepancies/${d.id}`,
                  ]
                    .filter((line) => line !== '')
                    .join('\n'),
                },
              ]
            : [],
        ),
        transaction,
      );
    }
    return null;
  }

  private async checkRevision(d: Discrepancy, revisionSubmittalId: number): Promise<void> {
    const revision = await this.submittals.findByPk(revisionSubmittalId, {
      attributes: ['id', 'projectId', 'revisionOfId'],
    });
    if (!revision || revision.projectId !== d.projectId || revision.revisionOfId !== d.submittalId) {
      throw new UnprocessableEntityException({
        message: `Submittal ${revisionSubmittalId} is not a revision of submittal ${d.submittalId}.`,
        details: [
          {
            field: 'revisionSubmittalId',
            rule: 'revision-of',
            message: 'link a submittal uploaded with revisionOf = this discrepancy’s submittal',
          },
        ],
      });
    }
  }

  private async find(id: number): Promise<Discrepancy> {
    const d = await this.discrepancies.findByPk(id);
    if (!d) throw new NotFoundException(`No discrepancy ${id}.`);
    return d;
  }

  private commentView(c: DiscrepancyComment): CommentViewDto {
    return {
      id: c.id,
      body: c.body,
      author: c.author?.name ?? '',
      authorRole: c.author?.role ?? '',
      at: new Date(c.createdAt).toISOString(),
    };
  }

  view(d: Discrepancy): DiscrepancyDto {
    return {
      id: d.id,
      projectId: d.projectId,
      submittalId: d.submittalId,
      calcFileId: d.calcFileId,
      fileName: d.fileName,
      memberId: d.memberId,
      code: d.code,
      name: d.name,
      class: d.class,
      severity: d.severity,
      direction: d.direction,
      chain: d.chain ? d.chain.split(',') : [],
      claimed: d.claimed,
      recomputed: d.recomputed,
      units: d.units,
      quantity: d.quantity,
      message: d.message,
      pointer: d.pointer,
      status: d.status,
      acknowledgedAt: d.acknowledgedAt ? new Date(d.acknowledgedAt).toISOString() : null,
      createdAt: new Date(d.createdAt).toISOString(),
      updatedAt: new Date(d.updatedAt).toISOString(),
    };
  }
}
