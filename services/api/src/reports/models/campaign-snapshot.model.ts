import type { CampaignSnapshotFigures } from '@tallyloom/reports';
import { Column, DataType, Model, PrimaryKey, Table } from 'sequelize-typescript';

/** A campaign's credited panels, rebuilt by the snapshot jobs; pace is worked out when read. */
@Table({ tableName: 'campaign_snapshots', underscored: true, timestamps: false })
export class CampaignSnapshot extends Model {
  @PrimaryKey
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare campaignId: number;

  @Column({ type: DataType.JSON, allowNull: false })
  declare figures: CampaignSnapshotFigures;

  /** [[tallyId, revision], …] of the approved chapter-months whose receipts are credited. */
  @Column({ type: DataType.JSON, allowNull: false })
  declare sourceRevisions: Array<[number, number]>;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare asOf: Date;
}
