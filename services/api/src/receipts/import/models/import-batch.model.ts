import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** One committed bulk import: the receipts it created carry its id in `import_batch_id`. */
@Table({ tableName: 'import_batches', underscored: true, updatedAt: false })
export class ImportBatch extends Model {
  declare id: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare chapterId: number;

  /** The same file imported twice is recognised by its content, whatever its name. */
  @Column({ type: DataType.CHAR(64), allowNull: false })
  declare fileSha256: string;

  @Column({ type: DataType.STRING(255), allowNull: false })
  declare fileName: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare rowCount: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare createdBy: number | null;

  declare createdAt: Date;
}
