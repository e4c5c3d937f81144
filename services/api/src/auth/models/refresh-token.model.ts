import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'refresh_tokens', underscored: true, updatedAt: false })
export class RefreshToken extends Model {
  declare id: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare userId: number;

  @Column({ type: DataType.CHAR(36), allowNull: false })
  declare familyId: string;

  /** SHA-256 of the token; the token itself is never stored. */
  @Column({ type: DataType.CHAR(64), allowNull: false })
  declare tokenHash: string;

  @Column({ type: DataType.DATE, allowNull: false })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE, allowNull: true })
  declare revokedAt: Date | null;

  @Column({ type: DataType.STRING(32), allowNull: true })
  declare revokedReason: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare replacedById: number | null;
}
