import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'blanket_sizes', underscored: true })
export class BlanketSize extends Model {
  declare id: number;

  @Column({ type: DataType.STRING(60), allowNull: false })
  declare name: string;

  /** Panels across. */
  @Column({ field: 'grid_columns', type: DataType.TINYINT.UNSIGNED, allowNull: false })
  declare columns: number;

  /** Panels down. */
  @Column({ field: 'grid_rows', type: DataType.TINYINT.UNSIGNED, allowNull: false })
  declare rows: number;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 })
  declare sortOrder: number;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true })
  declare active: boolean;

  @Column({ type: DataType.STRING(255), allowNull: true })
  declare sourceNote: string | null;
}
