import { Column, DataType, Model, Table } from 'sequelize-typescript';

export type LinkPurpose = 'invitation' | 'password_reset';

@Table({ tableName: 'one_time_links', underscored: true, updatedAt: false })
export class OneTimeLink extends Model {
  declare id: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare userId: number;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare purpose: LinkPurpose;

  /** SHA-256 of the token in the e-mailed link; the token itself is never stored. */
  @Column({ type: DataType.CHAR(64), allowNull: false })
  declare tokenHash: string;

  @Column({ type: DataType.DATE, allowNull: false })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE, allowNull: true })
  declare usedAt: Date | null;
}
