import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** A message received by the SMTP fake (demo and tests). */
@Table({ tableName: 'mailbox_messages', createdAt: 'receivedAt', updatedAt: false })
export class MailboxMessage extends Model {
  @Column({ type: DataType.STRING, allowNull: false }) declare from: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare to: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare subject: string;
  @Column({ type: DataType.TEXT, allowNull: false }) declare text: string;
  @Column({ type: DataType.TEXT, allowNull: false }) declare raw: string;
  declare receivedAt: Date;
}
