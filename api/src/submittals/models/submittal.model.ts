import { JsonColumn } from '../../database/json-column.js';
import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Project } from '../../projects/models/project.model.js';
import { User } from '../../users/models/user.model.js';
import type { SubmittalSummary } from '../submittal-summary.js';

export type StampAction =
  'no-exceptions-taken' | 'make-corrections-noted' | 'revise-and-resubmit' | 'rejected';
export const STAMP_ACTIONS: readonly StampAction[] = [
  'no-exceptions-taken',
  'make-corrections-noted',
  'revise-and-resubmit',
  'rejected',
];

@Table({ tableName: 'submittals' })
export class Submittal extends Model {
  @ForeignKey(() => Project) @Column({ type: DataType.INTEGER, allowNull: false }) declare projectId: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare title: string;
  @ForeignKey(() => Submittal) @Column({ type: DataType.INTEGER, allowNull: true }) declare revisionOfId:
    number | null;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: false }) declare submittedById: number;
  @BelongsTo(() => User, 'submittedById') declare submittedBy?: User;
  @Column({ type: DataType.INTEGER, allowNull: true }) declare viaTokenId: number | null;
  @Column({ type: DataType.STRING, allowNull: false }) declare engineVersion: string;
  @JsonColumn() declare summary: SubmittalSummary;
  @Column({ type: DataType.STRING, allowNull: true }) declare stampAction: StampAction | null;
  @Column({ type: DataType.TEXT, allowNull: true }) declare stampComment: string | null;
  @Column({ type: DataType.TEXT, allowNull: true }) declare stampOverrideReason: string | null;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: true }) declare stampedById:
    number | null;
  @BelongsTo(() => User, 'stampedById') declare stampedBy?: User;
  @Column({ type: DataType.DATE, allowNull: true }) declare stampedAt: Date | null;
  /** Raised by the stamp: the stamp is a compare-and-set on (unstamped, version) (migration 0004). */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 0 }) declare version: number;
  /** Whether the items of the submittal it revises have been carried across (migration 0005). */
  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false }) declare reconciled: boolean;
}
