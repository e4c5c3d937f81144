import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { BlanketSize } from '../../blanket-sizes/models/blanket-size.model';
import type { Relation } from '../../common/models/relation';
import { ParcelReceipt } from './parcel-receipt.model';

/** Finished blankets that arrived in a parcel, by size. */
@Table({ tableName: 'receipt_finished_blankets', underscored: true, timestamps: false })
export class ReceiptFinishedBlanket extends Model {
  @ForeignKey(() => ParcelReceipt)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare receiptId: number;

  @ForeignKey(() => BlanketSize)
  @Column({ type: DataType.INTEGER.UNSIGNED, primaryKey: true })
  declare blanketSizeId: number;

  @BelongsTo(() => BlanketSize)
  declare blanketSize?: Relation<BlanketSize>;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare count: number;
}
