import { Injectable, Logger, OnApplicationBootstrap } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { EventsService } from '../events/events.service.js';
import { Submittal } from '../submittals/models/submittal.model.js';
import {
  carriedStatus,
  discrepancyIdentity,
  matchFiles,
  reconcile,
  stablePointer,
  type FileRef,
} from './discrepancy-identity.js';
import type { DiscrepancyStatus } from './discrepancy-status.js';
import { Discrepancy } from './models/discrepancy.model.js';

/** A file of the revision being stored: its new id, name, member ids and bytes. */
export interface RevisionFile extends FileRef {
  readonly calcFileId: number;
  readonly content: Buffer;
}

/** A discrepancy row of the revision before it is inserted (the fields carrying across may be set). */
// A type, not an interface: Sequelize's bulkCreate takes it as a plain record.
export type NewDiscrepancyRow = {
  id?: number;
  calcFileId: number;
  fileName: string;
  memberId: string | null;
  code: string;
  direction: string | null;
  pointer: string;
  claimed: number | null;
  recomputed: number | null;
  status: DiscrepancyStatus;
  carriedFromId?: number | null;
  firstRaisedAt?: Date;
  assigneeId?: number | null;
  dueDate?: string | null;
  acknowledgedAt?: Date | null;
  acknowledgedById?: number | null;
};

/** What carrying a revision across did; kept in the `submittal.revised` event. */
export interface CarrySummary {
  carried: number;
  resolved: number;
  reRaised: number;
  /** Items of files the revision does not hold: they stay current in their own submittal. */
  notRevised: number;
}

interface CarryPlan {
  readonly submittalId: number;
  readonly projectId: number;
  readonly carried: readonly {
    row: NewDiscrepancyRow;
    previous: Discrepancy;
    reRaised: string | null;
  }[];
  readonly resolved: readonly Discrepancy[];
  readonly notRevised: number;
}

function parseJson(content: Buffer): unknown {
  try {
    return JSON.parse(content.toString('utf8'));
  } catch {
    return null;
  }
}

/**
 * Carries discrepancies across revisions (identity: discrepancy-identity.ts). When a submittal
 * revises another, each current item of the revised submittal and of its own predecessors is
 * either carried on by the revision (the revision's item continues it: status, assignee, due date,
 * acknowledgement and first-raised date; the old one is superseded), resolved (the revision
 * re-checked its file and no longer raises it: status resolved, "resolved by #N"), or left alone
 * (its file is not in the revision). Runs inside the upload's transaction.
 */
@Injectable()
export class DiscrepancyRevisionsService implements OnApplicationBootstrap {
  private readonly logger = new Logger(DiscrepancyRevisionsService.name);

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(Submittal) private readonly submittals: typeof Submittal,
    @InjectModel(CalcFile) private readonly calcFiles: typeof CalcFile,
    private readonly events: EventsService,
  ) {}

  /** Revisions stored before migration 0005 are carried across once, oldest first. */
  async onApplicationBootstrap(): Promise<void> {
    const pending = await this.submittals.findAll({
      where: { reconciled: false, revisionOfId: { [Op.ne]: null } },
      attributes: ['id', 'projectId', 'revisionOfId'],
      order: [['id', 'ASC']],
    });
    for (const s of pending) {
      await this.sequelize.transaction(async (transaction) => {
        const rows = await this.discrepancies.findAll({
          where: { submittalId: s.id },
          order: [['id', 'ASC']],
          transaction,
        });
        const files = await this.calcFiles.findAll({ where: { submittalId: s.id }, transaction });
        const before = new Map(rows.map((r) => [r.id, { status: r.status, version: r.version }]));
        const plan = await this.plan(
          { submittalId: s.id, projectId: s.projectId, revisionOfId: s.revisionOfId as number },
          rows,
          files.map((f) => ({
            calcFileId: f.id,
            fileName: f.fileName,
            memberIds: f.memberIds,
            content: f.content,
          })),
          transaction,
        );
        // Already stored and perhaps worked on: only an untouched item takes the status it carries.
        for (const c of plan.carried) {
          const row = c.row as Discrepancy;
          const untouched = before.get(row.id)?.version === 0 && before.get(row.id)?.status === 'raised';
          await this.discrepancies.update(
            {
              carriedFromId: c.previous.id,
              firstRaisedAt: c.previous.firstRaisedAt,
              ...(untouched
                ? {
                    status: row.status,
                    assigneeId: row.assigneeId,
                    dueDate: row.dueDate,
                    acknowledgedAt: row.acknowledgedAt,
                    acknowledgedById: row.acknowledgedById,
                  }
                : {}),
            },
            { where: { id: row.id }, transaction },
          );
        }
        await this.apply(plan, null, transaction);
        await this.submittals.update({ reconciled: true }, { where: { id: s.id }, transaction });
      });
    }
    if (pending.length > 0) this.logger.log(`Carried ${pending.length} stored revision(s) across.`);
  }

  /**
   * Decides what the revision carries on, resolves or leaves, and sets the carried fields of the
   * revision's rows (before they are inserted). Nothing is written; `apply` writes it.
   */
  async plan(
    revision: { submittalId: number; projectId: number; revisionOfId: number },
    rows: NewDiscrepancyRow[],
    files: readonly RevisionFile[],
    transaction: Transaction,
  ): Promise<CarryPlan> {
    const lineage = await this.lineage(revision.revisionOfId, transaction);
    const candidates = await this.discrepancies.findAll({
      where: { submittalId: { [Op.in]: lineage }, supersededBySubmittalId: null },
      order: [['id', 'ASC']],
      transaction,
    });
    // The revised submittal's own files first, so a name pairs with its latest version.
    const candidateFileIds = [...new Set(candidates.map((d) => d.calcFileId))];
    const previousFiles = await this.calcFiles.findAll({
      where: {
        [Op.or]: [{ submittalId: revision.revisionOfId }, { id: { [Op.in]: candidateFileIds } }],
      },
      attributes: ['id', 'submittalId', 'fileName', 'memberIds', 'content'],
      order: [['id', 'ASC']],
      transaction,
    });
    previousFiles.sort(
      (a, b) =>
        Number(b.submittalId === revision.revisionOfId) - Number(a.submittalId === revision.revisionOfId) ||
        b.submittalId - a.submittalId ||
        a.id - b.id,
    );
    const pairs = matchFiles(previousFiles, files);
    const fileKeyOf = new Map(files.map((f) => [f.calcFileId, pairs.get(f)?.fileName ?? f.fileName]));
    const revisedFiles = new Set([...pairs.values()].map((p) => p.id));

    const documents = new Map<number, unknown>();
    const documentOf = (id: number, content: () => Buffer | undefined) => {
      if (!documents.has(id)) {
        const bytes = content();
        documents.set(id, bytes ? parseJson(bytes) : null);
      }
      return documents.get(id);
    };
    const previousById = new Map(previousFiles.map((f) => [f.id, f]));
    const filesById = new Map(files.map((f) => [f.calcFileId, f]));

    const outcome = reconcile(
      candidates.map((d) => ({
        id: d.id,
        calcFileId: d.calcFileId,
        identity: discrepancyIdentity({
          fileKey: previousById.get(d.calcFileId)?.fileName ?? d.fileName,
          memberId: d.memberId,
          code: d.code,
          direction: d.direction,
          stablePointer: stablePointer(
            d.pointer,
            documentOf(d.calcFileId, () => previousById.get(d.calcFileId)?.content),
          ),
        }),
      })),
      rows.map((r) => ({
        identity: discrepancyIdentity({
          fileKey: fileKeyOf.get(r.calcFileId) ?? r.fileName,
          memberId: r.memberId,
          code: r.code,
          direction: r.direction,
          stablePointer: stablePointer(
            r.pointer,
            documentOf(-r.calcFileId, () => filesById.get(r.calcFileId)?.content),
          ),
        }),
      })),
      revisedFiles,
    );

    const byId = new Map(candidates.map((d) => [d.id, d]));
    const carried = outcome.carried.map(([index, previousId]) => {
      const row = rows[index] as NewDiscrepancyRow;
      const previous = byId.get(previousId) as Discrepancy;
      const next = carriedStatus(previous, row);
      row.status = next.status;
      row.carriedFromId = previous.id;
      row.firstRaisedAt = previous.firstRaisedAt;
      row.assigneeId = previous.assigneeId;
      row.dueDate = previous.dueDate;
      if (next.reRaised === null) {
        row.acknowledgedAt = previous.acknowledgedAt;
        row.acknowledgedById = previous.acknowledgedById;
      }
      return { row, previous, reRaised: next.reRaised };
    });
    return {
      submittalId: revision.submittalId,
      projectId: revision.projectId,
      carried,
      resolved: outcome.resolved.map((id) => byId.get(id) as Discrepancy),
      notRevised: outcome.untouched.length,
    };
  }

  /**
   * Writes a plan once the revision's rows are in: supersedes the carried items, resolves the
   * fixed ones (compare-and-set on their version: an item moved meanwhile is left as it is, and
   * stays current) and records an event for each. `actorId` is null: Ligament does it.
   */
  async apply(plan: CarryPlan, actorId: number | null, transaction: Transaction): Promise<CarrySummary> {
    const reason = `resolved by #${plan.submittalId}`;
    let resolved = 0;
    for (const d of plan.resolved) {
      const [changed] = await this.discrepancies.update(
        { status: 'resolved', supersededBySubmittalId: plan.submittalId, version: d.version + 1 },
        { where: { id: d.id, version: d.version, supersededBySubmittalId: null }, transaction },
      );
      if (changed !== 1) continue;
      resolved++;
      await this.events.record(
        {
          type: 'discrepancy.resolved',
          actorId,
          projectId: plan.projectId,
          submittalId: d.submittalId,
          discrepancyId: d.id,
          data: { from: d.status, to: 'resolved', reason, revisionSubmittalId: plan.submittalId },
        },
        transaction,
      );
    }
    for (const c of plan.carried) {
      await this.discrepancies.update(
        { supersededBySubmittalId: plan.submittalId },
        { where: { id: c.previous.id }, transaction },
      );
      await this.events.record(
        {
          type: 'discrepancy.carried',
          actorId,
          projectId: plan.projectId,
          submittalId: plan.submittalId,
          discrepancyId: c.row.id ?? null,
          data: {
            fromDiscrepancyId: c.previous.id,
            fromSubmittalId: c.previous.submittalId,
            from: c.previous.status,
            to: c.row.status,
            reason: c.reRaised,
            revisionSubmittalId: plan.submittalId,
          },
        },
        transaction,
      );
    }
    return {
      carried: plan.carried.length,
      resolved,
      reRaised: plan.carried.filter((c) => c.reRaised !== null).length,
      notRevised: plan.notRevised,
    };
  }

  /** The submittal and those it revises in turn, newest first. */
  private async lineage(submittalId: number, transaction: Transaction): Promise<number[]> {
    const ids: number[] = [];
    let next: number | null = submittalId;
    while (next !== null && !ids.includes(next)) {
      ids.push(next);
      const s: Submittal | null = await this.submittals.findByPk(next, {
        attributes: ['id', 'revisionOfId'],
        transaction,
      });
      next = s?.revisionOfId ?? null;
    }
    return ids;
  }
}
