import { AGENCY_KINDS, type AgencyKind } from '@tallyloom/core';
import { BelongsToMany, Column, DataType, Model, Table } from 'sequelize-typescript';
import { Chapter } from '../../chapters/models/chapter.model';
import type { Relation } from '../../common/models/relation';
import { AgencyChapter } from './agency-chapter.model';

/** An organisation that receives blankets, served by one or more chapters. */
@Table({ tableName: 'partner_agencies', underscored: true })
export class PartnerAgency extends Model {
  declare id: number;

  @Column({ type: DataType.STRING(160), allowNull: false })
  declare name: string;

  @Column({ type: DataType.ENUM(...AGENCY_KINDS), allowNull: false })
  declare kind: AgencyKind;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true })
  declare active: boolean;

  @BelongsToMany(() => Chapter, () => AgencyChapter)
  declare chapters?: Relation<Chapter>[];
}
