import { JsonColumn } from '../../database/json-column.js';
import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { CalcDocument } from 'ligament';
import { Submittal } from '../../submittals/models/submittal.model.js';

/** A calc file as uploaded: immutable (no updatedAt; nothing ever updates it). */
@Table({ tableName: 'calc_files', updatedAt: false })
export class CalcFile extends Model {
  @ForeignKey(() => Submittal)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare submittalId: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare fileName: string;
  @Column({ type: DataType.INTEGER, allowNull: false }) declare size: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare sha256: string;
  /** The original bytes, exactly as received. */
  @Column({ type: DataType.BLOB, allowNull: false }) declare content: Buffer;
  /** The normalised document the loader produced. */
  @JsonColumn() declare document: CalcDocument;
  @JsonColumn() declare memberIds: string[];
}
