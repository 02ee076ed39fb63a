import { Column, DataType, Model, Table } from 'sequelize-typescript';
import type { NotificationKind } from '../notification-kinds.js';

/** A user's choice for one kind (migration 0005); no row means both on. */
@Table({ tableName: 'notification_settings', createdAt: false })
export class NotificationSetting extends Model {
  @Column({ type: DataType.INTEGER, primaryKey: true }) declare userId: number;
  @Column({ type: DataType.STRING, primaryKey: true }) declare kind: NotificationKind;
  @Column({ type: DataType.BOOLEAN, allowNull: false }) declare inApp: boolean;
  @Column({ type: DataType.BOOLEAN, allowNull: false }) declare mail: boolean;
}
