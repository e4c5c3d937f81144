import type { TallyState } from '@tallyloom/core';
import {
  BelongsTo,
  Column,
  DataType,
  ForeignKey,
  HasMany,
  Model,
  Table,
} from 'sequelize-typescript';
import { Chapter } from '../../chapters/models/chapter.model';
import type { Relation } from '../../common/models/relation';
import { TallyRevision } from './tally-revision.model';

/**
 * One chapter-month and where it stands. Its figures live in revisions: reports read
 * `approvedRevision`, the form edits `currentRevision`.
 */
@Table({ tableName: 'monthly_tallies', underscored: true })
export class MonthlyTally extends Model {
  declare id: number;

  @ForeignKey(() => Chapter)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare chapterId: number;

  @BelongsTo(() => Chapter)
  declare chapter?: Relation<Chapter>;

  /** The first day of the month, 'YYYY-MM-01'. */
  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare month: string;

  @Column({
    type: DataType.ENUM('draft', 'submitted', 'returned', 'approved'),
    allowNull: false,
    defaultValue: 'draft',
  })
  declare state: TallyState;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare currentRevision: number;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: true })
  declare approvedRevision: number | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false })
  declare openingEnteredByHand: boolean;

  @Column({ type: DataType.DATE, allowNull: true })
  declare firstSubmittedAt: Date | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare createdBy: number | null;

  @HasMany(() => TallyRevision)
  declare revisions?: Relation<TallyRevision>[];

  declare createdAt: Date;
  declare updatedAt: Date;
}
