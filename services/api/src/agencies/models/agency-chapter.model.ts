import { Column, DataType, ForeignKey, Model, PrimaryKey, Table } from 'sequelize-typescript';
import { Chapter } from '../../chapters/models/chapter.model';
import { PartnerAgency } from './partner-agency.model';

/** Which chapters serve which partner agency. */
@Table({ tableName: 'agency_chapters', underscored: true, timestamps: false })
export class AgencyChapter extends Model {
  @PrimaryKey
  @ForeignKey(() => PartnerAgency)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare agencyId: number;

  @PrimaryKey
  @ForeignKey(() => Chapter)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare chapterId: number;
}
