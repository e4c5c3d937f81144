import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Relation } from '../../common/models/relation';
import { Region } from '../../regions/models/region.model';

@Table({ tableName: 'campaigns', underscored: true })
export class Campaign extends Model {
  declare id: number;

  /** Upper-case code as written on parcel labels. */
  @Column({ type: DataType.STRING(24), allowNull: false })
  declare code: string;

  @Column({ type: DataType.STRING(120), allowNull: false })
  declare name: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare goalPanels: number;

  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare startsOn: string;

  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare endsOn: string;

  @ForeignKey(() => Region)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare regionId: number | null;

  @BelongsTo(() => Region)
  declare region?: Relation<Region> | null;
}
