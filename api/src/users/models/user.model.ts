import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Organisation } from '../../organisations/models/organisation.model.js';
import type { Role } from '../../auth/role.enum.js';

@Table({ tableName: 'users' })
export class User extends Model {
  @Column({ type: DataType.STRING, allowNull: false, unique: true }) declare email: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare name: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare role: Role;
  @ForeignKey(() => Organisation)
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare organisationId: number | null;
  @BelongsTo(() => Organisation) declare organisation?: Organisation;
  /** scrypt hash `scrypt$N$r$p$salt$hash`; null until an invitation is accepted. */
  @Column({ type: DataType.STRING, allowNull: true }) declare passwordHash: string | null;
  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true }) declare active: boolean;
}
