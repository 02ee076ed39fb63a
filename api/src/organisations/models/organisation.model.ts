import { Column, DataType, Model, Table } from 'sequelize-typescript';

export type OrganisationKind = 'consultant' | 'checker' | 'owner' | 'operator';

@Table({ tableName: 'organisations' })
export class Organisation extends Model {
  @Column({ type: DataType.STRING, allowNull: false, unique: true }) declare name: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare kind: OrganisationKind;
}
