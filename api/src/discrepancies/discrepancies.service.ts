import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser } from '../auth/auth-user.js';
import { Role } from '../auth/role.enum.js';
import { csvDocument } from '../common/csv.js';
import { HotReadsService, type SqlValue } from '../database/hot-reads.service.js';
import { EventsService } from '../events/events.service.js';
import { KIND_OF_MOVE } from '../notifications/notification-kinds.js';
import { NotificationsService, type Recipient } from '../notifications/notifications.service.js';
import { ProjectMember } from '../projects/models/project-member.model.js';
import { Project } from '../projects/models/project.model.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import { User } from '../users/models/user.model.js';
import {
  OPEN_STATUSES,
  STATUS_MOVES,
  type DiscrepancyStatus,
  type StatusMove,
} from './discrepancy-status.js';
import type {
  AssignDto,
  BulkResultDto,
  BulkTransitionDto,
  CommentViewDto,
  CreateCommentDto,
  DiscrepancyDetailDto,
  DiscrepancyDto,
  LineageItemDto,
  ListDiscrepanciesQuery,
  TransitionDto,
} from './dto/discrepancy.dto.js';
import { DiscrepancyComment } from './models/discrepancy-comment.model.js';
import { Discrepancy } from './models/discrepancy.model.js';
import { quantityCells } from './quantity.js';

/** Must match the expression index of migration 0005 character for character. */
const SEVERITY_RANK_SQL = "CASE severity WHEN 'error' THEN 0 WHEN 'warning' THEN 1 ELSE 2 END";
/** Stored dates are `YYYY-MM-DD HH:MM:SS.SSS +00:00` (Sequelize, always UTC): ISO 8601 in SQL. */
const iso = (column: string) =>
  `CASE WHEN ${column} IS NULL THEN NULL ELSE replace(substr(${column}, 1, 23), ' ', 'T') || 'Z' END`;
/**
 * The stored comma-joined chain as a JSON array of strings, as `chain.split(',')` would give (hole
 * ids are identifiers by the calc schema; backslashes and quotes are escaped all the same).
 */
const CHAIN_JSON = `CASE WHEN chain IS NULL OR chain = '' THEN json_array() ELSE json('["' || replace(replace(replace(chain, '\\', '\\\\'), '"', '\\"'), ',', '","') || '"]') END`;
/**
 * A REAL as JSON with 17 significant digits: SQLite's own JSON keeps 15, so a client would read
 * another number than the detail (JavaScript's shortest form) gives; 17 always reads back the same.
 */
const exactNumber = (column: string) =>
  `CASE WHEN ${column} IS NULL THEN NULL ELSE json(printf('%!.17g', ${column})) END`;
const ASSIGNEE_JSON = `json(CASE WHEN assigneeId IS NULL THEN 'null' ELSE json_object('id', assigneeId, 'name', (SELECT name FROM users WHERE users.id = assigneeId)) END)`;
const CURRENT_JSON = `json(CASE WHEN supersededBySubmittalId IS NULL THEN 'true' ELSE 'false' END)`;
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
    'version',
  ].map(
    (c) =>
      `'${c}', ${c === 'chain' ? CHAIN_JSON : c === 'claimed' || c === 'recomputed' ? exactNumber(c) : c}`,
  ),
  `'acknowledgedAt', ${iso('acknowledgedAt')}`,
  `'current', ${CURRENT_JSON}`,
  `'supersededBySubmittalId', supersededBySubmittalId`,
  `'carriedFromId', carriedFromId`,
  `'assignee', ${ASSIGNEE_JSON}`,
  `'dueDate', dueDate`,
  ...['firstRaisedAt', 'createdAt', 'updatedAt'].map((c) => `'${c}', ${iso(c)}`),
].join(', ')})`;
const ITEMS_OPEN = Buffer.from('{"items":[');
const NOTHING = Buffer.alloc(0);
/** The most rows one CSV export holds. */
const CSV_LIMIT = 100_000;

/** A list filter: its SQL on the rows, and on the tally table of migration 0005 when it can count it. */
interface Filter {
  readonly rows: string;
  readonly tally: string | null;
  readonly values: readonly SqlValue[];
}

/** LIKE with the user's text taken literally. */
const likeText = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/**
 * The list's WHERE, shared by the page and the CSV export; every value is bound. `t` prefixes the
 * columns of the discrepancies table when the query joins others.
 */
function listFilters(projectId: number, q: ListDiscrepanciesQuery, t = ''): Filter[] {
  const inList = (column: string, values: readonly SqlValue[]): Filter => {
    const test = values.length === 1 ? ' = ?' : ` IN (${values.map(() => '?').join(', ')})`;
    return { rows: `${t}${column}${test}`, tally: `${column}${test}`, values };
  };
  const only = (sql: string, values: readonly SqlValue[]): Filter => ({ rows: sql, tally: null, values });
  const filters: Filter[] = [inList('projectId', [projectId])];
  if (q.submittalId !== undefined) filters.push(inList('submittalId', [q.submittalId]));
  if (!q.includeSuperseded)
    filters.push({ rows: `${t}supersededBySubmittalId IS NULL`, tally: 'current = 1', values: [] });
  if (q.class) filters.push(inList('class', [...new Set(q.class)]));
  if (q.severity) filters.push(inList('severity', [...new Set(q.severity)]));
  if (q.status) {
    const statuses = new Set(q.status.flatMap((s) => (s === 'open' ? [...OPEN_STATUSES] : [s])));
    filters.push(inList('status', [...statuses]));
  }
  if (q.memberId) filters.push(only(`${t}memberId = ?`, [q.memberId]));
  if (q.code) filters.push(only(`${t}code = ?`, [q.code]));
  if (q.assigneeId !== undefined) filters.push(only(`${t}assigneeId = ?`, [q.assigneeId]));
  const text = q.q?.trim();
  if (text) {
    const like = likeText(text);
    const columns = ['message', 'memberId', 'fileName', 'code', 'name', 'pointer'];
    const id = /^#?(\d{1,9})$/.exec(text)?.[1];
    filters.push(
      only(
        `(${columns.map((c) => `${t}${c} LIKE ? ESCAPE '\\'`).join(' OR ')}${id ? ` OR ${t}id = ?` : ''})`,
        [...columns.map(() => like), ...(id ? [Number(id)] : [])],
      ),
    );
  }
  return filters;
}

/** Why a move is refused, or null when the actor may make it. */
export function refusal(
  d: { status: DiscrepancyStatus; supersededBySubmittalId?: number | null },
  dto: { to: DiscrepancyStatus; note?: string; revisionSubmittalId?: number },
  role: Role,
  options: { bulk?: boolean } = {},
): { status: 403 | 409 | 400; message: string } | null {
  const moves = STATUS_MOVES.filter((m) => m.to === dto.to);
  const mine = moves.filter((m) => m.role === role);
  if (mine.length === 0) {
    const who = [...new Set(moves.map((m) => m.role))].join(' or ');
    return { status: 403, message: `Only a ${who} may move a discrepancy to ${dto.to}.` };
  }
  if (d.supersededBySubmittalId !== null && d.supersededBySubmittalId !== undefined) {
    return {
      status: 409,
      message: `This discrepancy was superseded by submittal #${d.supersededBySubmittalId}; work on its current item instead.`,
    };
  }
  const move = mine.find((m) => m.from.includes(d.status) && (!options.bulk || m.bulk));
  if (!move) {
    const reopen = options.bulk && mine.some((m) => m.from.includes(d.status));
    return {
      status: 409,
      message: reopen
        ? `A discrepancy that is ${d.status} is reopened one at a time, with its own note.`
        : `A discrepancy that is ${d.status} cannot be moved to ${dto.to} (allowed from: ${mine
            .filter((m) => !options.bulk || m.bulk)
            .flatMap((m) => m.from)
            .join(', ')}).`,
    };
  }
  if (move.requires === 'note-or-revision' && !dto.note && dto.revisionSubmittalId === undefined) {
    return { status: 400, message: 'An answer needs a note or a linked revision.' };
  }
  if (move.requires === 'reason' && !dto.note) {
    return {
      status: 400,
      message: `${move.action === 'reopen' ? 'Reopening' : `Moving to ${dto.to}`} needs a reason in "note".`,
    };
  }
  return null;
}

function throwRefusal(r: { status: 403 | 409 | 400; message: string }): never {
  if (r.status === 403) throw new ForbiddenException(r.message);
  if (r.status === 409) throw new ConflictException(r.message);
  throw new BadRequestException(r.message);
}

const statusWord = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** "12 changed meanwhile": the loser of a compare-and-set learns the state that won. */
function changedMeanwhile(
  id: number,
  now: { status: string; version: number },
  attempted: string,
): ConflictException {
  const message = `Someone else changed discrepancy #${id} first: it is now ${statusWord(now.status)}. ${attempted}`;
  return new ConflictException({
    message,
    details: [{ id, status: now.status, version: now.version, message }],
  });
}

@Injectable()
export class DiscrepanciesService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(DiscrepancyComment) private readonly comments: typeof DiscrepancyComment,
    @InjectModel(Submittal) private readonly submittals: typeof Submittal,
    @InjectModel(Project) private readonly projects: typeof Project,
    @InjectModel(ProjectMember) private readonly members: typeof ProjectMember,
    private readonly events: EventsService,
    private readonly notifications: NotificationsService,
    private readonly reads: HotReadsService,
  ) {}

  /**
   * The list is the hottest route, so it is one prepared statement on the read connection: SQLite
   * reads the page in index order, builds every item as JSON and sums the total from the tally table
   * (counting rows only when a member, code, assignee or text filter is set). The items come back as
   * UTF-8 bytes and go out as they are, wrapped into the page's JSON: no JavaScript string is made of
   * them. Sort columns come from the DTO's whitelist; every value is bound.
   */
  async list(projectId: number, q: ListDiscrepanciesQuery): Promise<Buffer> {
    const filters = listFilters(projectId, q);
    const where = filters.map((f) => f.rows).join(' AND ');
    const params = filters.flatMap((f) => f.values);
    const count = filters.every((f) => f.tally !== null)
      ? `SELECT coalesce(sum(n), 0) FROM discrepancy_tallies WHERE ${filters.map((f) => f.tally).join(' AND ')}`
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

  /**
   * Every discrepancy the list's filters match, in the list's order, as CSV behind a UTF-8 BOM:
   * the claimed and recomputed numbers as stored, with the quantity, its unit and the file's unit
   * system in columns of their own.
   */
  async csv(projectId: number, q: ListDiscrepanciesQuery): Promise<string> {
    const filters = listFilters(projectId, q, 'd.');
    const where = filters.map((f) => f.rows);
    const direction = q.order === 'desc' ? 'DESC' : 'ASC';
    const key = q.sort === 'severity' ? SEVERITY_RANK_SQL.replace('severity', 'd.severity') : `d.${q.sort}`;
    const rows = await this.reads.all<{
      id: number;
      submittalId: number;
      submittalTitle: string;
      supersededBySubmittalId: number | null;
      carriedFromId: number | null;
      fileName: string;
      memberId: string | null;
      code: string;
      name: string;
      class: string;
      severity: string;
      status: string;
      assignee: string | null;
      dueDate: string | null;
      direction: string | null;
      chain: string | null;
      claimed: number | null;
      recomputed: number | null;
      units: string | null;
      pointer: string;
      message: string;
      firstRaisedAt: string;
      updatedAt: string;
    }>(
      `SELECT d.id, d.submittalId, s.title AS submittalTitle, d.supersededBySubmittalId, d.carriedFromId,
              d.fileName, d.memberId, d.code, d.name, d.class, d.severity, d.status,
              u.name AS assignee, d.dueDate, d.direction, d.chain, d.claimed, d.recomputed,
              json_extract(f.document, '$.profile.units') AS units, d.pointer, d.message,
              ${iso('d.firstRaisedAt')} AS firstRaisedAt, ${iso('d.updatedAt')} AS updatedAt
       FROM discrepancies d
       JOIN submittals s ON s.id = d.submittalId
       JOIN calc_files f ON f.id = d.calcFileId
       LEFT JOIN users u ON u.id = d.assigneeId
       WHERE ${where.join(' AND ')}
       ORDER BY ${key} ${direction}, d.id ASC LIMIT ${CSV_LIMIT}`,
      filters.flatMap((f) => f.values),
    );
    const header = [
      'discrepancy',
      'submittal',
      'submittal_title',
      'current',
      'superseded_by_submittal',
      'carried_from',
      'file',
      'member',
      'code',
      'name',
      'class',
      'severity',
      'status',
      'assignee',
      'due_date',
      'load_from',
      'holes',
      'quantity',
      'claimed',
      'recomputed',
      'unit',
      'unit_system',
      'pointer',
      'message',
      'first_raised_at',
      'updated_at',
    ];
    return csvDocument(
      header,
      rows.map((d) => {
        return [
          d.id,
          d.submittalId,
          d.submittalTitle,
          d.supersededBySubmittalId === null ? 'yes' : 'no',
          d.supersededBySubmittalId,
          d.carriedFromId,
          d.fileName,
          d.memberId,
          d.code,
          d.name,
          d.class,
          d.severity,
          d.status,
          d.assignee,
          d.dueDate,
          d.direction,
          d.chain ? d.chain.split(',').join(' ') : '',
          ...quantityCells(d, d.units),
          d.units,
          d.pointer,
          d.message,
          d.firstRaisedAt,
          d.updatedAt,
        ];
      }),
    );
  }

  async detail(id: number, actor: AuthUser): Promise<DiscrepancyDetailDto> {
    const d = await this.find(id);
    const [lineage, successor] = await Promise.all([this.lineage(d), this.successor(d)]);
    const ids = lineage.map((x) => x.id);
    const submittalIds = [
      ...new Set([...lineage.map((x) => x.submittalId), ...(successor ? [successor.submittalId] : [])]),
    ];
    const [submittals, history, comments] = await Promise.all([
      this.submittals.findAll({
        where: { id: { [Op.in]: submittalIds } },
        attributes: ['id', 'title', 'submittedById'],
        include: [{ model: User, as: 'submittedBy', attributes: ['name'] }],
      }),
      this.events.list({ discrepancyId: { [Op.in]: ids } }, 1, 500),
      this.comments.findAll({
        where: { discrepancyId: { [Op.in]: ids } },
        include: [{ model: User, attributes: ['name', 'role'] }],
        order: [['id', 'ASC']],
      }),
    ]);
    const titles = new Map(submittals.map((s) => [s.id, s.title]));
    const item = (x: Discrepancy): LineageItemDto => ({
      id: x.id,
      submittalId: x.submittalId,
      submittalTitle: titles.get(x.submittalId) ?? '',
      status: x.status,
    });
    const current = d.supersededBySubmittalId === null;
    const worker = !actor.token && (actor.role === Role.Checker || actor.role === Role.Consultant);
    const moves = actor.token
      ? []
      : STATUS_MOVES.filter((m) => refusal(d, { to: m.to, note: 'x' }, actor.role) === null).filter(
          (m) => m.role === actor.role && m.from.includes(d.status),
        );
    return {
      ...this.view(d),
      raisedBy: submittals.find((s) => s.id === d.submittalId)?.submittedBy?.name ?? '',
      submittalTitle: titles.get(d.submittalId) ?? '',
      history: history.items,
      comments: comments.map((c) => this.commentView(c)),
      lineage: lineage.map(item),
      carriedInto: successor ? item(successor) : null,
      resolution: d.status === 'resolved' ? `resolved by #${d.supersededBySubmittalId}` : null,
      allowedMoves: [...new Set(moves.map((m) => m.to))],
      moves: moves.map((m) => ({ action: m.action, to: m.to, requires: m.requires })),
      canAcknowledge: !actor.token && actor.role === Role.OwnerRep && !d.acknowledgedAt && current,
      canAssign: !actor.token && actor.role === Role.Checker && current,
      canComment: worker && current,
    };
  }

  /**
   * One status move. 403 wrong role, 409 not from this status (or superseded), 400 missing note,
   * 422 bad revision link. The move is a compare-and-set on the status and version that were read:
   * when someone else changed the discrepancy in between, 409 with its current status and version,
   * and nothing changes.
   */
  async move(id: number, dto: TransitionDto, actor: AuthUser): Promise<DiscrepancyDetailDto> {
    const d = await this.find(id);
    // The mover saw an older version: say so before judging the move against a status they never saw.
    if (dto.version !== undefined && dto.version !== d.version)
      throw changedMeanwhile(id, d, `Your move to ${statusWord(dto.to)} was not made.`);
    const refused = refusal(d, dto, actor.role);
    if (refused?.status === 409)
      throw new ConflictException({
        message: refused.message,
        details: [{ id, status: d.status, version: d.version, message: refused.message }],
      });
    if (refused) throwRefusal(refused);
    const move = STATUS_MOVES.find(
      (m) => m.to === dto.to && m.role === actor.role && m.from.includes(d.status),
    );
    if (dto.revisionSubmittalId !== undefined) await this.checkRevision(d, dto.revisionSubmittalId);
    await this.sequelize.transaction(async (transaction) => {
      const lost = await this.apply(
        d,
        dto.to,
        move?.action ?? dto.to,
        dto.note,
        dto.revisionSubmittalId,
        actor,
        transaction,
      );
      if (lost) throw changedMeanwhile(id, lost, `Your move to ${statusWord(dto.to)} was not made.`);
      await this.notifyMove([d], move as StatusMove, dto.note, dto.revisionSubmittalId, actor, transaction);
    });
    return this.detail(id, actor);
  }

  /**
   * Checker bulk move: all or nothing; any refusal answers with every refused id and changes none.
   * Only the moves marked `bulk` in the status flow (accept, return, waive); reopening is one at a
   * time. Everyone concerned is told once about the whole batch.
   */
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
      const r = refusal(d, dto, actor.role, { bulk: true });
      if (r) problems.push({ id, status: r.status, message: r.message });
    }
    if (problems.some((p) => p.status === 403))
      throw new ForbiddenException({ message: 'Only a checker may make these moves.', details: problems });
    if (problems.length > 0) {
      throw new ConflictException({
        message: `${problems.length} of ${ids.length} discrepancies cannot be moved to ${dto.to}; none were moved.`,
        details: problems,
      });
    }
    const move = STATUS_MOVES.find((m) => m.to === dto.to && m.bulk) as StatusMove;
    await this.sequelize.transaction(async (transaction) => {
      const lost: { id: number; status: string; version: number; message: string }[] = [];
      for (const id of ids) {
        const now = await this.apply(
          byId.get(id) as Discrepancy,
          dto.to,
          move.action,
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
            message: `Someone else changed it first: it is now ${statusWord(now.status)}.`,
          });
      }
      // All or nothing: throwing rolls back the moves already made in this transaction.
      if (lost.length > 0)
        throw new ConflictException({
          message: `${lost.length} of ${ids.length} discrepancies were changed by someone else meanwhile; none were moved.`,
          details: lost,
        });
      await this.notifyMove(
        ids.map((id) => byId.get(id) as Discrepancy),
        move,
        dto.note,
        undefined,
        actor,
        transaction,
      );
    });
    const after = await this.discrepancies.findAll({
      where: { id: { [Op.in]: ids } },
      order: [['id', 'ASC']],
      include: [{ model: User, as: 'assignee', attributes: ['id', 'name'] }],
    });
    return { moved: ids.length, items: after.map((d) => this.view(d)) };
  }

  /**
   * Checker: who works on the item and by when. A compare-and-set on the version that was read, in
   * the write queue like a move: of two at once, one wins and the other gets 409 with the state
   * that won. The new assignee is told.
   */
  async assign(id: number, dto: AssignDto, actor: AuthUser): Promise<DiscrepancyDetailDto> {
    const d = await this.find(id);
    if (d.supersededBySubmittalId !== null)
      throw new ConflictException(
        `This discrepancy was superseded by submittal #${d.supersededBySubmittalId}; assign its current item instead.`,
      );
    if (dto.version !== undefined && dto.version !== d.version)
      throw changedMeanwhile(id, d, 'Your assignment was not saved; look at it again.');
    const assigneeId = dto.assigneeId === undefined ? d.assigneeId : dto.assigneeId;
    const dueDate = dto.dueDate === undefined ? d.dueDate : dto.dueDate;
    let assignee: Recipient | null = null;
    if (assigneeId !== null) {
      const member = await this.members.findOne({
        where: { projectId: d.projectId, userId: assigneeId },
        include: [
          { model: User, where: { active: true, role: { [Op.in]: [Role.Consultant, Role.Checker] } } },
        ],
      });
      if (!member?.user)
        throw new UnprocessableEntityException({
          message: `User ${assigneeId} cannot be assigned: only an active consultant or checker of this project can.`,
          details: [
            {
              field: 'assigneeId',
              rule: 'project-worker',
              message: 'assign a consultant or checker who is a member of the project',
            },
          ],
        });
      assignee = { id: member.user.id, email: member.user.email, name: member.user.name };
    }
    if (assigneeId === d.assigneeId && dueDate === d.dueDate) return this.detail(id, actor);
    await this.sequelize.transaction(async (transaction) => {
      const [changed] = await this.discrepancies.update(
        { assigneeId, dueDate, version: d.version + 1 },
        { where: { id, version: d.version, supersededBySubmittalId: null }, transaction },
      );
      if (changed !== 1) {
        const now = await this.discrepancies.findByPk(id, { attributes: ['status', 'version'], transaction });
        throw changedMeanwhile(
          id,
          { status: now?.status ?? d.status, version: now?.version ?? d.version },
          'Your assignment was not saved; look at it again.',
        );
      }
      await this.events.record(
        {
          type: 'discrepancy.assigned',
          actorId: actor.id,
          projectId: d.projectId,
          submittalId: d.submittalId,
          discrepancyId: id,
          data: {
            assigneeId,
            assigneeName: assignee?.name ?? null,
            dueDate,
            previousAssigneeId: d.assigneeId,
            previousDueDate: d.dueDate,
          },
        },
        transaction,
      );
      if (assignee) {
        const project = await this.projects.findByPk(d.projectId, { attributes: ['name'], transaction });
        const submittal = await this.submittals.findByPk(d.submittalId, {
          attributes: ['title'],
          transaction,
        });
        await this.notifications.notify(
          {
            kind: 'assigned',
            recipients: [assignee],
            actor,
            projectId: d.projectId,
            projectName: project?.name ?? `project ${d.projectId}`,
            submittalId: d.submittalId,
            discrepancyId: id,
            title:
              assigneeId === d.assigneeId
                ? `${actor.name} changed the due date of ${d.code} on ${d.memberId ?? d.fileName}`
                : `${actor.name} assigned ${d.code} on ${d.memberId ?? d.fileName} to you`,
            lines: [
              this.itemLine(d, submittal?.title),
              dueDate ? `Due: ${dueDate}.` : 'No due date.',
              `Status: ${statusWord(d.status)}.`,
            ],
            webPath: `/discrepancies/${id}`,
          },
          transaction,
        );
      }
    });
    return this.detail(id, actor);
  }

  async comment(id: number, dto: CreateCommentDto, actor: AuthUser): Promise<CommentViewDto> {
    const d = await this.find(id);
    if (d.supersededBySubmittalId !== null)
      throw new ConflictException(
        `This discrepancy was superseded by submittal #${d.supersededBySubmittalId}; comment on its current item.`,
      );
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
    if (d.supersededBySubmittalId !== null)
      throw new ConflictException(
        `This discrepancy was superseded by submittal #${d.supersededBySubmittalId}; acknowledge its current item.`,
      );
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
   * Moves `d` from the status and version it was read with and records the event. Returns null
   * when moved; when the row changed since it was read, moves nothing and returns its current
   * status and version (the caller answers 409 and the transaction rolls back).
   */
  private async apply(
    d: Discrepancy,
    to: DiscrepancyStatus,
    action: string,
    note: string | undefined,
    revisionSubmittalId: number | undefined,
    actor: AuthUser,
    transaction: Transaction,
    bulk = false,
  ): Promise<{ status: DiscrepancyStatus; version: number } | null> {
    const from = d.status;
    const [changed] = await this.discrepancies.update(
      { status: to, version: d.version + 1 },
      { where: { id: d.id, status: from, version: d.version, supersededBySubmittalId: null }, transaction },
    );
    if (changed !== 1) {
      const now = await this.discrepancies.findByPk(d.id, { attributes: ['status', 'version'], transaction });
      return { status: now?.status ?? from, version: now?.version ?? d.version };
    }
    await this.events.record(
      {
        type: action === 'reopen' ? 'discrepancy.reopened' : `discrepancy.${to}`,
        actorId: actor.id,
        projectId: d.projectId,
        submittalId: d.submittalId,
        discrepancyId: d.id,
        data: { from, to, note: note ?? null, revisionSubmittalId: revisionSubmittalId ?? null, bulk },
      },
      transaction,
    );
    return null;
  }

  /**
   * Tells the people a move concerns (notification-kinds.ts): the checkers of the project of an
   * answer, its consultants of a checker's decision. One notice per move, or one for a whole bulk move.
   */
  private async notifyMove(
    items: readonly Discrepancy[],
    move: StatusMove,
    note: string | undefined,
    revisionSubmittalId: number | undefined,
    actor: AuthUser,
    transaction: Transaction,
  ): Promise<void> {
    const kind = KIND_OF_MOVE[move.action];
    const first = items[0];
    if (!kind || !first) return;
    const audience = kind === 'answered' ? [Role.Checker] : [Role.Consultant];
    const recipients = await this.notifications.projectPeople(first.projectId, audience, transaction);
    const project = await this.projects.findByPk(first.projectId, { attributes: ['name'], transaction });
    const verb = {
      answer: 'answered',
      accept: 'accepted the answer to',
      return: 'returned',
      waive: 'waived',
      reopen: 'reopened',
    }[move.action];
    const noteLine = note
      ? `${move.action === 'answer' || move.action === 'accept' ? 'Note' : 'Reason'}: “${note}”`
      : '';
    if (items.length === 1) {
      const submittal = await this.submittals.findByPk(first.submittalId, {
        attributes: ['title'],
        transaction,
      });
      await this.notifications.notify(
        {
          kind,
          recipients,
          actor,
          projectId: first.projectId,
          projectName: project?.name ?? `project ${first.projectId}`,
          submittalId: first.submittalId,
          discrepancyId: first.id,
          title: `${actor.name} ${verb} ${first.code} on ${first.memberId ?? first.fileName}`,
          lines: [
            this.itemLine(first, submittal?.title),
            noteLine,
            revisionSubmittalId ? `Revision that answers it: #${revisionSubmittalId}.` : '',
            `It is now ${statusWord(move.to)}.`,
          ].filter((l) => l !== ''),
          webPath: `/discrepancies/${first.id}`,
        },
        transaction,
      );
      return;
    }
    const shown = items.slice(0, 20).map((d) => `#${d.id} ${d.code} on ${d.memberId ?? d.fileName}`);
    await this.notifications.notify(
      {
        kind,
        recipients,
        actor,
        projectId: first.projectId,
        projectName: project?.name ?? `project ${first.projectId}`,
        submittalId: null,
        discrepancyId: null,
        title: `${actor.name} ${verb} ${items.length} discrepancies`,
        lines: [
          ...shown,
          ...(items.length > shown.length ? [`and ${items.length - shown.length} more`] : []),
          noteLine,
          `They are now ${statusWord(move.to)}.`,
        ].filter((l) => l !== ''),
        webPath: `/discrepancies?projectId=${first.projectId}&status=${move.to}`,
      },
      transaction,
    );
  }

  /** "Discrepancy #12: overstated-net-area (error) in splice-plates.json, submittal #3 “Issue C”." */
  private itemLine(d: Discrepancy, submittalTitle: string | undefined): string {
    return `Discrepancy #${d.id}: ${d.name} (${d.severity}) in ${d.fileName}, submittal #${d.submittalId}${
      submittalTitle ? ` “${submittalTitle}”` : ''
    }.`;
  }

  /**
   * An answer may link a submittal uploaded as a revision of the item's submittal. The item must be
   * current: a revision that re-checked it has already carried it on or resolved it.
   */
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

  /** The item and those it continues, oldest first. */
  private async lineage(d: Discrepancy): Promise<Discrepancy[]> {
    const chain = [d];
    let at = d;
    while (at.carriedFromId !== null && chain.length < 1000) {
      const previous = await this.discrepancies.findByPk(at.carriedFromId);
      if (!previous) break;
      chain.unshift(previous);
      at = previous;
    }
    return chain;
  }

  private successor(d: Discrepancy): Promise<Discrepancy | null> {
    return this.discrepancies.findOne({ where: { carriedFromId: d.id } });
  }

  private async find(id: number): Promise<Discrepancy> {
    const d = await this.discrepancies.findByPk(id, {
      include: [{ model: User, as: 'assignee', attributes: ['id', 'name'] }],
    });
    if (!d) throw new NotFoundException(`No discrepancy ${id}.`);
    return d;
  }

  private commentView(c: DiscrepancyComment): CommentViewDto {
    return {
      id: c.id,
      discrepancyId: c.discrepancyId,
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
      version: d.version,
      acknowledgedAt: d.acknowledgedAt ? new Date(d.acknowledgedAt).toISOString() : null,
      current: d.supersededBySubmittalId === null,
      supersededBySubmittalId: d.supersededBySubmittalId,
      carriedFromId: d.carriedFromId,
      assignee: d.assignee ? { id: d.assignee.id, name: d.assignee.name } : null,
      dueDate: d.dueDate,
      firstRaisedAt: new Date(d.firstRaisedAt).toISOString(),
      createdAt: new Date(d.createdAt).toISOString(),
      updatedAt: new Date(d.updatedAt).toISOString(),
    };
  }
}
