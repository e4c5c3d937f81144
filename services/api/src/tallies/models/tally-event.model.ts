import type { TallyEventKind } from '@tallyloom/core';
import { Column, CreatedAt, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MonthlyTally } from './monthly-tally.model';

/** The review trail: one row per transition, with its comment or reason. */
@Table({ tableName: 'tally_events', underscored: true, updatedAt: false })
export class TallyEvent extends Model {
  declare id: number;

  @ForeignKey(() => MonthlyTally)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare tallyId: number;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false })
  declare revision: number;

  @Column({
    type: DataType.ENUM('created', 'submitted', 'returned', 'approved', 'amendment_started'),
    allowNull: false,
  })
  declare kind: TallyEventKind;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare comment: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare actorId: number | null;

  // Milliseconds, so events of one request keep their order when read by time.
  @CreatedAt
  @Column({ type: DataType.DATE(3), allowNull: false })
  declare createdAt: Date;
}
