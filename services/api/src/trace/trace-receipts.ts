import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { monthEnd, monthStart, type TraceReceipt } from '@tallyloom/core';
import { Op } from 'sequelize';
import type { Actor } from '../common/access/actor';
import { within } from '../common/access/scope';
import { ParcelReceipt } from '../receipts/models/parcel-receipt.model';
import { ReceiptScan } from '../receipts/models/receipt-scan.model';
import { receiptScope, SCOPE_CHAPTER } from '../receipts/receipt-scope';

export interface ChapterMonth {
  chapterId: number;
  /** 'YYYY-MM'. */
  month: string;
}

/** The key of a chapter-month in the map `of` returns. */
export const chapterMonthKey = (chapterId: number, month: string) => `${chapterId}:${month}`;

/** The parcel receipts behind tallies: a chapter's receipts received in the tally's month. */
@Injectable()
export class TraceReceipts {
  constructor(
    @InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt,
    @InjectModel(ReceiptScan) private readonly scans: typeof ReceiptScan,
  ) {}

  /** Receipts by `chapterId:month`, oldest first, with their scans; only those in scope. */
  async of(actor: Actor, wanted: readonly ChapterMonth[]): Promise<Map<string, TraceReceipt[]>> {
    const byKey = new Map<string, TraceReceipt[]>();
    if (wanted.length === 0) return byKey;
    for (const { chapterId, month } of wanted) byKey.set(chapterMonthKey(chapterId, month), []);
    const months = wanted.map((line) => line.month).sort();
    const rows = await this.receipts.findAll({
      where: within(receiptScope(actor), {
        chapterId: [...new Set(wanted.map((line) => line.chapterId))],
        receivedOn: { [Op.between]: [monthStart(months[0]), monthEnd(months.at(-1)!)] },
      }),
      include: [SCOPE_CHAPTER],
      attributes: [
        'id',
        'chapterId',
        'receivedOn',
        'campaignCodeEntered',
        'panelsAccepted',
        'setAsideOffSize',
        'setAsideHardCareYarn',
        'setAsideSoiledOrDamaged',
        'setAsideOther',
      ],
      order: [
        ['receivedOn', 'ASC'],
        ['id', 'ASC'],
      ],
    });
    // One range covers every month asked for; receipts of months not asked for drop out here.
    const kept = rows.filter((row) =>
      byKey.has(chapterMonthKey(row.chapterId, row.receivedOn.slice(0, 7))),
    );
    const scans = await this.scansOf(kept.map((row) => row.id));
    for (const row of kept) {
      const own = scans.get(row.id) ?? [];
      byKey.get(chapterMonthKey(row.chapterId, row.receivedOn.slice(0, 7)))!.push({
        id: row.id,
        receivedOn: row.receivedOn,
        panelsAccepted: row.panelsAccepted,
        setAsideTotal:
          row.setAsideOffSize +
          row.setAsideHardCareYarn +
          row.setAsideSoiledOrDamaged +
          row.setAsideOther,
        campaignCode: row.campaignCodeEntered,
        scanCount: own.length,
        scans: own,
      });
    }
    return byKey;
  }

  private async scansOf(receiptIds: number[]): Promise<Map<number, TraceReceipt['scans']>> {
    const byReceipt = new Map<number, TraceReceipt['scans']>();
    if (receiptIds.length === 0) return byReceipt;
    const rows = await this.scans.findAll({
      where: { receiptId: receiptIds },
      attributes: ['id', 'receiptId', 'displayName'],
      order: [['id', 'ASC']],
    });
    for (const scan of rows) {
      const view = {
        id: scan.id,
        fileName: scan.displayName,
        // The receipts' own download route, with its sign-in and scope checks.
        url: `/api/receipts/${scan.receiptId}/scans/${scan.id}/file`,
      };
      const list = byReceipt.get(scan.receiptId);
      if (list) list.push(view);
      else byReceipt.set(scan.receiptId, [view]);
    }
    return byReceipt;
  }
}
