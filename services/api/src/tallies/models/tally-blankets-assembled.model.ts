import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { BlanketSize } from '../../blanket-sizes/models/blanket-size.model';
import { TallyRevision } from './tally-revision.model';

/** Blankets sewn in the month, by size. */
@Table({ tableName: 'tally_blankets_assembled', underscored: true, timestamps: false })
export class TallyBlanketsAssembled extends Model {
  @ForeignKey(() => TallyRevision)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare revisionId: number;

  @ForeignKey(() => BlanketSize)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare blanketSizeId: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare count: number;
}
