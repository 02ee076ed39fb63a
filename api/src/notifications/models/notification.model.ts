import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';
import type { NotificationKind } from '../notification-kinds.js';

/** One line of a user's in-app list (migration 0005). Never updated except `readAt`. */
@Table({ tableName: 'notifications', updatedAt: false })
export class Notification extends Model {
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: false }) declare userId: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare kind: NotificationKind;
  @Column({ type: DataType.INTEGER, allowNull: true }) declare projectId: number | null;
  @Column({ type: DataType.INTEGER, allowNull: true }) declare submittalId: number | null;
  @Column({ type: DataType.INTEGER, allowNull: true }) declare discrepancyId: number | null;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: true }) declare actorId: number | null;
  @BelongsTo(() => User, 'actorId') declare actor?: User;
  @Column({ type: DataType.STRING, allowNull: false }) declare title: string;
  @Column({ type: DataType.TEXT, allowNull: false }) declare body: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare webPath: string;
  @Column({ type: DataType.DATE, allowNull: true }) declare readAt: Date | null;
}
