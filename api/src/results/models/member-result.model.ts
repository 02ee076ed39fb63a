import { JsonColumn } from '../../database/json-column.js';
import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { CodeProfile, MemberResult as EngineMemberResult } from 'ligament';
import { CalcFile } from '../../calc-files/models/calc-file.model.js';
import { Submittal } from '../../submittals/models/submittal.model.js';

/** Per direction: the governing chain, the least chains and An, as recomputed. */
export interface StoredDirection {
  direction: string;
  governing: { holes: string[]; netWidth: number; netArea: number } | null;
  leastChains: { holes: string[]; netWidth: number; netArea: number }[];
  An: number;
}

@Table({ tableName: 'member_results', updatedAt: false })
export class MemberResult extends Model {
  @ForeignKey(() => Submittal)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare submittalId: number;
  @ForeignKey(() => CalcFile)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare calcFileId: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare memberId: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare engineVersion: string;
  @JsonColumn() declare profile: CodeProfile;
  /** sha256 of the canonical member input: equal hashes mean the same inputs. */
  @Column({ type: DataType.STRING, allowNull: false }) declare inputsHash: string;
  @Column({ type: DataType.FLOAT, allowNull: false }) declare Ag: number;
  @Column({ type: DataType.FLOAT, allowNull: false }) declare An: number;
  @Column({ type: DataType.FLOAT, allowNull: false }) declare Ae: number;
  @Column({ type: DataType.FLOAT, allowNull: false }) declare U: number;
  @Column({ type: DataType.FLOAT, allowNull: false }) declare yielding: number;
  @Column({ type: DataType.FLOAT, allowNull: false }) declare rupture: number;
  @Column({ type: DataType.FLOAT, allowNull: false }) declare available: number;
  @Column({ type: DataType.STRING, allowNull: false }) declare governingDirection: string;
  @JsonColumn() declare directions: StoredDirection[];
  @JsonColumn() declare result: EngineMemberResult;
}
