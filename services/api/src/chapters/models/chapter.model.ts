import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Relation } from '../../common/models/relation';
import { Region } from '../../regions/models/region.model';

@Table({ tableName: 'chapters', underscored: true })
export class Chapter extends Model {
  declare id: number;

  @ForeignKey(() => Region)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare regionId: number;

  @BelongsTo(() => Region)
  declare region?: Relation<Region>;

  @Column({ type: DataType.STRING(80), allowNull: false })
  declare name: string;

  @Column({ type: DataType.TINYINT.UNSIGNED, allowNull: false })
  declare reportingDueDay: number;

  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare activeFrom: string;

  @Column({ type: DataType.DATEONLY, allowNull: true })
  declare activeTo: string | null;
}
