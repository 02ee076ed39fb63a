import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Dimension, FindingClass, Severity, UnitSystem } from 'ligament';
import { CalcFile } from '../../calc-files/models/calc-file.model.js';
import { Project } from '../../projects/models/project.model.js';
import { Submittal } from '../../submittals/models/submittal.model.js';
import { User } from '../../users/models/user.model.js';
import type { DiscrepancyStatus } from '../discrepancy-status.js';

@Table({ tableName: 'discrepancies' })
export class Discrepancy extends Model {
  @ForeignKey(() => Project) @Column({ type: DataType.INTEGER, allowNull: false }) declare projectId: number;
  @ForeignKey(() => Submittal)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare submittalId: number;
  @ForeignKey(() => CalcFile)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare calcFileId: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare fileName: string;
  @Column({ type: DataType.STRING, allowNull: true }) declare memberId: string | null;
  @Column({ type: DataType.STRING, allowNull: false }) declare code: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare name: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare class: FindingClass;
  @Column({ type: DataType.STRING, allowNull: false }) declare severity: Severity;
  @Column({ type: DataType.STRING, allowNull: true }) declare direction: string | null;
  /** Hole ids of the chain (or of the holes concerned), comma-separated; null when none. */
  @Column({ type: DataType.STRING, allowNull: true }) declare chain: string | null;
  @Column({ type: DataType.FLOAT, allowNull: true }) declare claimed: number | null;
  @Column({ type: DataType.FLOAT, allowNull: true }) declare recomputed: number | null;
  /** Unit system of the calc file: claimed and recomputed are in its units (migration 0007). */
  @Column({ type: DataType.STRING, allowNull: true }) declare units: UnitSystem | null;
  /** What claimed and recomputed measure (engine findingQuantity); null when the finding has no numbers. */
  @Column({ type: DataType.STRING, allowNull: true }) declare quantity: Dimension | null;
  @Column({ type: DataType.TEXT, allowNull: false }) declare message: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare pointer: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare status: DiscrepancyStatus;
  /** Raised by every move: the compare-and-set of a move checks status and version (migration 0004). */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 0 }) declare version: number;
  @Column({ type: DataType.DATE, allowNull: true }) declare acknowledgedAt: Date | null;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: true }) declare acknowledgedById:
    number | null;
  /** The item of the revised submittal this one continues (migration 0005; see discrepancy-identity.ts). */
  @Column({ type: DataType.INTEGER, allowNull: true }) declare carriedFromId: number | null;
  /** The revision that re-checked this item (carried it on or resolved it); null while current. */
  @Column({ type: DataType.INTEGER, allowNull: true }) declare supersededBySubmittalId: number | null;
  /** When the first submittal of its lineage raised it: a carried item is as old as its first raise. */
  @Column({ type: DataType.DATE, allowNull: false, defaultValue: DataType.NOW }) declare firstRaisedAt: Date;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: true }) declare assigneeId:
    number | null;
  @BelongsTo(() => User, 'assigneeId') declare assignee?: User;
  /** YYYY-MM-DD, a calendar day with no time zone. */
  @Column({ type: DataType.STRING, allowNull: true }) declare dueDate: string | null;
}
