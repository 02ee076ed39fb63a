import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';
import { Project } from './project.model.js';

@Table({ tableName: 'project_members', updatedAt: false })
export class ProjectMember extends Model {
  @ForeignKey(() => Project) @Column({ type: DataType.INTEGER, allowNull: false }) declare projectId: number;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: false }) declare userId: number;
  @BelongsTo(() => User) declare user?: User;
}
