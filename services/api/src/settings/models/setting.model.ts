import { Column, DataType, Model, PrimaryKey, Table } from 'sequelize-typescript';

/** One network setting as key and JSON value; a missing key means the default. */
@Table({ tableName: 'settings', underscored: true, createdAt: false })
export class Setting extends Model {
  @PrimaryKey
  @Column({ type: DataType.STRING(64), allowNull: false })
  declare key: string;

  @Column({ type: DataType.JSON, allowNull: false })
  declare value: unknown;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare updatedBy: number | null;

  declare updatedAt: Date;
}
