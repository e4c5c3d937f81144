import type { FindingLinkKind } from '@tallyloom/core';
import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** What a finding points at (table `audit_finding_links`); only ever added. */
@Table({ tableName: 'audit_finding_links', underscored: true, timestamps: false })
export class AuditFindingLink extends Model {
  declare id: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare findingId: number;

  @Column({
    type: DataType.ENUM('trace', 'sample', 'sample_item', 'tally', 'receipt'),
    allowNull: false,
  })
  declare kind: FindingLinkKind;

  @Column({ type: DataType.STRING(100), allowNull: false })
  declare reference: string;
}
