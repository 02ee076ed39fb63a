import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';

/** Why a session ended (`sessions.endReason`). */
export type SessionEndReason = 'signed-out' | 'refresh-reused' | 'deactivated' | 'expired';

/** One sign-in in a browser: what the refresh cookie keeps alive and every access token names (`sid`). */
@Table({ tableName: 'sessions', updatedAt: false })
export class Session extends Model {
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: false }) declare userId: number;
  @Column({ type: DataType.STRING, allowNull: true }) declare userAgent: string | null;
  /** The absolute end: no refresh carries a session past it. */
  @Column({ type: DataType.DATE, allowNull: false }) declare expiresAt: Date;
  @Column({ type: DataType.DATE, allowNull: true }) declare lastRefreshedAt: Date | null;
  @Column({ type: DataType.DATE, allowNull: true }) declare endedAt: Date | null;
  @Column({ type: DataType.STRING, allowNull: true }) declare endReason: SessionEndReason | null;
}
