import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Organisation } from '../../organisations/models/organisation.model.js';

@Table({ tableName: 'projects' })
export class Project extends Model {
  @Column({ type: DataType.STRING, allowNull: false }) declare name: string;
  @Column({ type: DataType.STRING, allowNull: true }) declare reference: string | null;
  @Column({ type: DataType.TEXT, allowNull: true }) declare description: string | null;
  @ForeignKey(() => Organisation)
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare ownerOrganisationId: number | null;
  @BelongsTo(() => Organisation) declare ownerOrganisation?: Organisation;
}
