import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { NetworkSettings } from '@tallyloom/core';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import { CampaignsService } from '../campaigns/campaigns.service';
import type { Campaign } from '../campaigns/models/campaign.model';
import { SettingsService } from '../settings/settings.service';

export type ReceiptSettings = Pick<NetworkSettings, 'panelToleranceIn' | 'receiptCountCeiling'>;

/**
 * What receipts read from the network set-up: campaigns, blanket sizes and settings. The one
 * place that knows where they come from, so the receipt rules depend on three plain questions.
 */
@Injectable()
export class ReceiptReferenceData {
  constructor(
    private readonly campaigns: CampaignsService,
    private readonly settingsService: SettingsService,
    @InjectModel(BlanketSize) private readonly sizes: typeof BlanketSize,
  ) {}

  /** The campaign a label code credits on that day: national ones, or the chapter's region's. */
  findCreditableCampaign(code: string, onDate: string, regionId: number): Promise<Campaign | null> {
    return this.campaigns.findCreditable(code, onDate, regionId);
  }

  blanketSizes(ids: number[]): Promise<BlanketSize[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return this.sizes.findAll({ where: { id: ids } });
  }

  /** The sizes a parcel may still list, in catalogue order. */
  activeBlanketSizes(): Promise<BlanketSize[]> {
    return this.sizes.findAll({
      where: { active: true },
      order: [
        ['sortOrder', 'ASC'],
        ['id', 'ASC'],
      ],
    });
  }

  async settings(): Promise<ReceiptSettings> {
    const { panelToleranceIn, receiptCountCeiling } = await this.settingsService.current();
    return { panelToleranceIn, receiptCountCeiling };
  }
}
