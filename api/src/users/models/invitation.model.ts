import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Organisation } from '../../organisations/models/organisation.model.js';
import { User } from './user.model.js';
import type { Role } from '../../auth/role.enum.js';

@Table({ tableName: 'invitations', updatedAt: false })
export class Invitation extends Model {
  @Column({ type: DataType.STRING, allowNull: false }) declare email: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare name: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare role: Role;
  @ForeignKey(() => Organisation)
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare organisationId: number | null;
  /** sha256 of the one-time token; the token itself is only ever in the mail. */
  @Column({ type: DataType.STRING, allowNull: false, unique: true }) declare tokenHash: string;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: false }) declare invitedById: number;
  @Column({ type: DataType.DATE, allowNull: false }) declare expiresAt: Date;
  @Column({ type: DataType.DATE, allowNull: true }) declare acceptedAt: Date | null;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: true }) declare userId: number | null;
  /** Withdrawn by an admin: the link is dead. */
  @Column({ type: DataType.DATE, allowNull: true }) declare revokedAt: Date | null;
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare revokedById: number | null;
  /** Sent again with a new link (that invitation's id): this one's link is dead. */
  @ForeignKey(() => Invitation)
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare replacedById: number | null;
}
