import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Session } from './session.model.js';

/** A refresh token of a session: sha256 only, used once, then replaced by its successor. */
@Table({ tableName: 'refresh_tokens', updatedAt: false })
export class RefreshToken extends Model {
  @ForeignKey(() => Session) @Column({ type: DataType.INTEGER, allowNull: false }) declare sessionId: number;
  @Column({ type: DataType.STRING, allowNull: false, unique: true }) declare tokenHash: string;
  @Column({ type: DataType.DATE, allowNull: false }) declare expiresAt: Date;
  @Column({ type: DataType.DATE, allowNull: true }) declare usedAt: Date | null;
  @ForeignKey(() => RefreshToken)
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare replacedById: number | null;
}
