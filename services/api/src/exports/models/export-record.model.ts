import type { ExportFormat, ExportState, ExportTable } from '@tallyloom/core';
import { Column, DataType, Model, PrimaryKey, Table } from 'sequelize-typescript';

/** One export request and, once the job is done, where its file is (table `exports`). */
@Table({ tableName: 'exports', underscored: true, timestamps: false })
export class ExportRecord extends Model {
  @PrimaryKey
  @Column({ type: DataType.CHAR(36), allowNull: false })
  declare id: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare requestedBy: number;

  @Column({ type: DataType.ENUM('table', 'impact-pack'), allowNull: false })
  declare kind: 'table' | 'impact-pack';

  @Column({ type: DataType.STRING(20), allowNull: true })
  declare tableName: ExportTable | null;

  @Column({ type: DataType.ENUM('xlsx', 'csv'), allowNull: false })
  declare format: ExportFormat;

  /** The request as validated: table filters and bom, or the impact pack's scope and period. */
  @Column({ type: DataType.JSON, allowNull: false })
  declare params: unknown;

  @Column({ type: DataType.STRING(300), allowNull: false })
  declare description: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare fileName: string;

  @Column({ type: DataType.STRING(10), allowNull: false, defaultValue: 'queued' })
  declare state: ExportState;

  @Column({ type: DataType.TINYINT.UNSIGNED, allowNull: false, defaultValue: 0 })
  declare progress: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare rowCount: number | null;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: true })
  declare sheetCount: number | null;

  @Column({ type: DataType.STRING(200), allowNull: true })
  declare fileKey: string | null;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: true })
  declare sizeBytes: number | string | null;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  declare error: string | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare createdAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true })
  declare finishedAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  declare expiresAt: Date | null;
}

/** JSON columns may come back parsed or as text, depending on the driver. */
export function paramsOf<T>(record: ExportRecord): T {
  return (typeof record.params === 'string' ? JSON.parse(record.params) : record.params) as T;
}
