import type { FindingSeverity, FindingStatus } from '@tallyloom/core';
import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Relation } from '../../common/models/relation';
import { User } from '../../users/models/user.model';

/** One audit finding (table `audit_findings`); edits bump `version`, history is the audit log. */
@Table({ tableName: 'audit_findings', underscored: true })
export class AuditFinding extends Model {
  declare id: number;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare title: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare body: string;

  @Column({ type: DataType.ENUM('low', 'medium', 'high'), allowNull: false })
  declare severity: FindingSeverity;

  @Column({ type: DataType.ENUM('open', 'responded', 'closed'), allowNull: false })
  declare status: FindingStatus;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare createdBy: number;

  @BelongsTo(() => User, 'createdBy')
  declare author?: Relation<User>;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare closedBy: number | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  declare closedAt: Date | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare version: number;

  declare createdAt: Date;
  declare updatedAt: Date;
}
