import { Column, DataType, Model, PrimaryKey, Table } from 'sequelize-typescript';
import type { ReminderKind } from '../reminder-dates';

/** One reminder sent: at most one per chapter, month and kind (the primary key sees to it). */
@Table({ tableName: 'tally_reminders', underscored: true, timestamps: false })
export class TallyReminder extends Model {
  @PrimaryKey
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare chapterId: number;

  /** The first day of the month, 'YYYY-MM-01'. */
  @PrimaryKey
  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare month: string;

  @PrimaryKey
  @Column({ type: DataType.ENUM('before_due', 'after_due'), allowNull: false })
  declare kind: ReminderKind;

  @Column({ type: DataType.STRING(1000), allowNull: false })
  declare sentTo: string;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare sentAt: Date;
}
