import { Column, DataType, Model, Table } from 'sequelize-typescript';

export const MAIL_KINDS = [
  'invitation',
  'submittal-checked',
  'submittal-stamped',
  'discrepancy-answered',
  'discrepancy-returned',
  'discrepancy-accepted',
  'discrepancy-waived',
  'discrepancy-reopened',
  'discrepancy-assigned',
] as const;
export type MailKind = (typeof MAIL_KINDS)[number];
export type OutboxStatus = 'pending' | 'sent';

@Table({ tableName: 'mail_outbox' })
export class OutboxMessage extends Model {
  @Column({ type: DataType.STRING, allowNull: false }) declare kind: MailKind;
  @Column({ type: DataType.STRING, allowNull: false }) declare to: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare subject: string;
  @Column({ type: DataType.TEXT, allowNull: false }) declare text: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare status: OutboxStatus;
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 0 }) declare attempts: number;
  @Column({ type: DataType.TEXT, allowNull: true }) declare lastError: string | null;
  @Column({ type: DataType.DATE, allowNull: false }) declare nextAttemptAt: Date;
  @Column({ type: DataType.DATE, allowNull: true }) declare sentAt: Date | null;
}
