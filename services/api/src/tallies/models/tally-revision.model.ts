import type { MassUnit, TallyRevisionState } from '@tallyloom/core';
import { Column, DataType, ForeignKey, HasMany, Model, Table } from 'sequelize-typescript';
import type { Relation } from '../../common/models/relation';
import { MonthlyTally } from './monthly-tally.model';
import { TallyBlanketsAssembled } from './tally-blankets-assembled.model';
import { TallyBlanketsGiven } from './tally-blankets-given.model';
import { TallyPeopleServed } from './tally-people-served.model';

const COUNT = { type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 };

/** The figures of one revision of a tally; an amendment is a new revision, the old one kept. */
@Table({ tableName: 'tally_revisions', underscored: true })
export class TallyRevision extends Model {
  declare id: number;

  @ForeignKey(() => MonthlyTally)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare tallyId: number;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false })
  declare revision: number;

  @Column({
    type: DataType.ENUM('draft', 'submitted', 'returned', 'approved', 'superseded'),
    allowNull: false,
    defaultValue: 'draft',
  })
  declare state: TallyRevisionState;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare amendmentReason: string | null;

  @Column(COUNT) declare panelsOpening: number;
  @Column(COUNT) declare panelsAccepted: number;
  @Column(COUNT) declare setAsideOffSize: number;
  @Column({ ...COUNT, field: 'set_aside_hard_care' }) declare setAsideHardCareYarn: number;
  @Column({ ...COUNT, field: 'set_aside_soiled' }) declare setAsideSoiledOrDamaged: number;
  @Column(COUNT) declare setAsideOther: number;
  @Column(COUNT) declare panelsUsed: number;
  @Column(COUNT) declare panelsClosing: number;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare receiptsDifferenceReason: string | null;

  @Column(COUNT) declare blanketsOpening: number;
  @Column(COUNT) declare blanketsReceived: number;
  @Column(COUNT) declare blanketsClosing: number;

  // DECIMAL comes back from MariaDB as text; the mapper converts it.
  @Column({ type: DataType.DECIMAL(9, 2), allowNull: false, defaultValue: 0 })
  declare volunteerHours: string | number;

  @Column({ type: DataType.DECIMAL(10, 3), allowNull: true })
  declare yarnValue: string | number | null;

  @Column({ type: DataType.ENUM('kg', 'lb'), allowNull: true })
  declare yarnUnit: MassUnit | null;

  @Column({ type: DataType.DECIMAL(14, 6), allowNull: true })
  declare yarnKg: string | number | null;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare notes: string | null;

  @Column({ type: DataType.JSON, allowNull: true })
  declare acknowledgedWarnings: unknown;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare acknowledgementNote: string | null;

  @Column({ type: DataType.STRING(128), allowNull: true })
  declare submissionKey: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare createdBy: number | null;

  @Column({ type: DataType.DATE, allowNull: true })
  declare submittedAt: Date | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare submittedBy: number | null;

  @Column({ type: DataType.DATE, allowNull: true })
  declare approvedAt: Date | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare approvedBy: number | null;

  @HasMany(() => TallyBlanketsAssembled)
  declare assembled?: Relation<TallyBlanketsAssembled>[];

  @HasMany(() => TallyBlanketsGiven)
  declare given?: Relation<TallyBlanketsGiven>[];

  @HasMany(() => TallyPeopleServed)
  declare peopleServed?: Relation<TallyPeopleServed>[];

  declare createdAt: Date;
  declare updatedAt: Date;
}
