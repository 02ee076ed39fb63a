import { JsonColumn } from '../../database/json-column.js';
import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';

/** One entry of the append-only event log (UPDATE and DELETE are refused by triggers). */
@Table({ tableName: 'events', updatedAt: false })
export class Event extends Model {
  @Column({ type: DataType.STRING, allowNull: false }) declare type: string;
  @Column({ type: DataType.INTEGER, allowNull: true }) declare projectId: number | null;
  @Column({ type: DataType.INTEGER, allowNull: true }) declare submittalId: number | null;
  @Column({ type: DataType.INTEGER, allowNull: true }) declare discrepancyId: number | null;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: true }) declare actorId: number | null;
  @BelongsTo(() => User) declare actor?: User;
  @JsonColumn() declare data: Record<string, unknown>;
}
