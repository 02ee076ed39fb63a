import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';
import { Discrepancy } from './discrepancy.model.js';

@Table({ tableName: 'discrepancy_comments', updatedAt: false })
export class DiscrepancyComment extends Model {
  @ForeignKey(() => Discrepancy)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare discrepancyId: number;
  @ForeignKey(() => User) @Column({ type: DataType.INTEGER, allowNull: false }) declare authorId: number;
  @BelongsTo(() => User) declare author?: User;
  @Column({ type: DataType.TEXT, allowNull: false }) declare body: string;
}
