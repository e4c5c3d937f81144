import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Relation } from '../../common/models/relation';
import { User } from '../../users/models/user.model';

/** A response to a finding (table `audit_finding_responses`); append-only. */
@Table({ tableName: 'audit_finding_responses', underscored: true, timestamps: false })
export class AuditFindingResponse extends Model {
  declare id: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare findingId: number;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare body: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare respondedBy: number;

  @BelongsTo(() => User, 'respondedBy')
  declare responder?: Relation<User>;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare respondedAt: Date;
}
