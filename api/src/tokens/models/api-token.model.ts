import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Project } from '../../projects/models/project.model.js';
import { User } from '../../users/models/user.model.js';

@Table({ tableName: 'api_tokens', updatedAt: false })
export class ApiToken extends Model {
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: false }) declare userId: number;
  @ForeignKey(() => Project) @Column({ type: DataType.INTEGER, allowNull: false }) declare projectId: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare name: string;
  /** sha256 (hex) of the whole token. */
  @Column({ type: DataType.STRING, allowNull: false, unique: true }) declare tokenHash: string;
  /** First characters of the token, to tell tokens apart in a list. */
  @Column({ type: DataType.STRING, allowNull: false }) declare prefix: string;
  @Column({ type: DataType.DATE, allowNull: true }) declare lastUsedAt: Date | null;
  @Column({ type: DataType.DATE, allowNull: true }) declare revokedAt: Date | null;
}
