import {
  BelongsTo,
  Column,
  DataType,
  ForeignKey,
  HasMany,
  Model,
  Table,
} from 'sequelize-typescript';
import { Campaign } from '../../campaigns/models/campaign.model';
import { Chapter } from '../../chapters/models/chapter.model';
import type { Relation } from '../../common/models/relation';
import { ReceiptFinishedBlanket } from './receipt-finished-blanket.model';
import { ReceiptScan } from './receipt-scan.model';

const COUNT = { type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 };

@Table({ tableName: 'parcel_receipts', underscored: true })
export class ParcelReceipt extends Model {
  declare id: number;

  @ForeignKey(() => Chapter)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare chapterId: number;

  @BelongsTo(() => Chapter)
  declare chapter?: Relation<Chapter>;

  @Column({ type: DataType.DATEONLY, allowNull: false })
  declare receivedOn: string;

  // Personal data (BRIEF §2): shown only to roles with 'senders.read'; erasable.
  @Column({ type: DataType.STRING(160), allowNull: true })
  declare senderName: string | null;

  @Column({ type: DataType.STRING(254), allowNull: true })
  declare senderEmail: string | null;

  @Column({ type: DataType.STRING(500), allowNull: true })
  declare senderAddress: string | null;

  @Column({ type: DataType.DATE, allowNull: true })
  declare senderErasedAt: Date | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare senderErasedBy: number | null;

  @ForeignKey(() => Campaign)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare campaignId: number | null;

  @BelongsTo(() => Campaign)
  declare campaign?: Relation<Campaign> | null;

  @Column({ type: DataType.STRING(24), allowNull: true })
  declare campaignCodeEntered: string | null;

  @Column(COUNT) declare panelsAccepted: number;
  @Column(COUNT) declare setAsideOffSize: number;
  @Column({ ...COUNT, field: 'set_aside_hard_care' }) declare setAsideHardCareYarn: number;
  @Column({ ...COUNT, field: 'set_aside_soiled' }) declare setAsideSoiledOrDamaged: number;
  @Column(COUNT) declare setAsideOther: number;

  @Column({ type: DataType.STRING(500), allowNull: true })
  declare setAsideOtherNote: string | null;

  @Column(COUNT) declare otherItems: number;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare notes: string | null;

  // DECIMAL comes back from MariaDB as text; the mapper converts it.
  @Column({ type: DataType.DECIMAL(6, 2), allowNull: true })
  declare sampleWidth: string | number | null;

  @Column({ type: DataType.DECIMAL(6, 2), allowNull: true })
  declare sampleHeight: string | number | null;

  @Column({ type: DataType.ENUM('in', 'cm'), allowNull: true })
  declare sampleUnit: 'in' | 'cm' | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare importBatchId: number | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare createdBy: number | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @HasMany(() => ReceiptFinishedBlanket)
  declare finishedBlankets?: Relation<ReceiptFinishedBlanket>[];

  @HasMany(() => ReceiptScan)
  declare scans?: Relation<ReceiptScan>[];

  declare createdAt: Date;
}
