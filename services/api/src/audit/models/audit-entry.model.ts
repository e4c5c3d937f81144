import { Column, DataType, Model, Table } from 'sequelize-typescript';

/**
 * Append-only: the application's database account may only INSERT and SELECT here, and fill in
 * the three seal columns (the sealer, once per entry).
 */
@Table({ tableName: 'audit_entries', underscored: true, timestamps: false })
export class AuditEntry extends Model {
  declare id: number;

  @Column({ type: DataType.DATE(3), allowNull: false, defaultValue: DataType.NOW })
  declare occurredAt: Date;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare actorUserId: number | null;

  @Column({ type: DataType.STRING(254), allowNull: true })
  declare actorEmail: string | null;

  @Column({ type: DataType.STRING(64), allowNull: false })
  declare action: string;

  @Column({ type: DataType.STRING(64), allowNull: false })
  declare entityType: string;

  @Column({ type: DataType.STRING(64), allowNull: true })
  declare entityId: string | null;

  @Column({ type: DataType.JSON, allowNull: true })
  declare beforeJson: unknown;

  @Column({ type: DataType.JSON, allowNull: true })
  declare afterJson: unknown;

  @Column({ type: DataType.STRING(64), allowNull: true })
  declare requestId: string | null;

  @Column({ type: DataType.STRING(45), allowNull: true })
  declare ip: string | null;

  /** Null until the sealer puts the entry on the hash chain. */
  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: true })
  declare chainSeq: number | null;

  @Column({ type: DataType.CHAR(64), allowNull: true })
  declare prevHash: string | null;

  @Column({ type: DataType.CHAR(64), allowNull: true })
  declare entryHash: string | null;
}
