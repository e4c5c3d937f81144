import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { PartnerAgency } from '../../agencies/models/partner-agency.model';
import { BlanketSize } from '../../blanket-sizes/models/blanket-size.model';
import { TallyRevision } from './tally-revision.model';

/** Blankets handed out in the month, by size and partner agency. */
@Table({ tableName: 'tally_blankets_given', underscored: true, timestamps: false })
export class TallyBlanketsGiven extends Model {
  @ForeignKey(() => TallyRevision)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare revisionId: number;

  @ForeignKey(() => BlanketSize)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare blanketSizeId: number;

  @ForeignKey(() => PartnerAgency)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare partnerAgencyId: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare count: number;
}
