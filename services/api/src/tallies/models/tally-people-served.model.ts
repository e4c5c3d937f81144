import { PEOPLE_GROUPS, type PeopleGroup } from '@tallyloom/core';
import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { PartnerAgency } from '../../agencies/models/partner-agency.model';
import { TallyRevision } from './tally-revision.model';

/** People a partner agency served with the month's blankets, by group. */
@Table({ tableName: 'tally_people_served', underscored: true, timestamps: false })
export class TallyPeopleServed extends Model {
  @ForeignKey(() => TallyRevision)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare revisionId: number;

  @ForeignKey(() => PartnerAgency)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare partnerAgencyId: number;

  @Column({ type: DataType.ENUM(...PEOPLE_GROUPS), primaryKey: true })
  declare peopleGroup: PeopleGroup;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare count: number;
}
