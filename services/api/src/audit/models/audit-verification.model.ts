import type { ChainBreakReason } from '@tallyloom/core';
import { Column, DataType, Model, Table } from 'sequelize-typescript';

export type VerificationSource = 'request' | 'nightly';

/** One run of the chain verification (table `audit_verifications`, append-only). */
@Table({ tableName: 'audit_verifications', underscored: true, timestamps: false })
export class AuditVerification extends Model {
  declare id: number;

  /** Null for the nightly job. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare verifiedBy: number | null;

  @Column({ type: DataType.ENUM('request', 'nightly'), allowNull: false })
  declare source: VerificationSource;

  @Column({ type: DataType.DATE(3), allowNull: false, defaultValue: DataType.NOW })
  declare verifiedAt: Date;

  @Column({ type: DataType.BOOLEAN, allowNull: false })
  declare ok: boolean;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: false })
  declare entriesChecked: number;

  /** The last place that held, and its hash: the next run's anchor. */
  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: false })
  declare headChainSeq: number;

  @Column({ type: DataType.CHAR(64), allowNull: false })
  declare headHash: string;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: true })
  declare brokenChainSeq: number | null;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: true })
  declare brokenEntryId: number | null;

  @Column({ type: DataType.STRING(32), allowNull: true })
  declare brokenReason: ChainBreakReason | null;

  @Column({ type: DataType.STRING(500), allowNull: true })
  declare brokenMessage: string | null;
}
