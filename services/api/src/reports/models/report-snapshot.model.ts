import type {
  ComplianceFigures,
  PeriodKind,
  SnapshotFigures,
  SnapshotScope,
} from '@tallyloom/core';
import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** One scope × period of the tally report, rebuilt (never incremented) by the snapshot jobs. */
@Table({ tableName: 'report_snapshots', underscored: true, timestamps: false })
export class ReportSnapshot extends Model {
  declare id: number;

  @Column({ type: DataType.ENUM('chapter', 'region', 'network'), allowNull: false })
  declare scope: SnapshotScope;

  /** 0 for the network. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare scopeId: number;

  @Column({ type: DataType.ENUM('month', 'quarter', 'fiscal_year'), allowNull: false })
  declare periodKind: PeriodKind;

  @Column({ type: DataType.STRING(10), allowNull: false })
  declare periodKey: string;

  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare periodFrom: string;

  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare periodTo: string;

  @Column({ type: DataType.JSON, allowNull: false })
  declare figures: SnapshotFigures;

  @Column({ type: DataType.JSON, allowNull: false })
  declare compliance: ComplianceFigures;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare pendingTallies: number;

  /**
   * [[tallyId, revision], …] on a region's month; null on the rows that add up region months
   * and name their revisions through them (see `namesOwnSources`).
   */
  @Column({ type: DataType.JSON, allowNull: true })
  declare sourceRevisions: Array<[number, number]> | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare asOf: Date;
}
