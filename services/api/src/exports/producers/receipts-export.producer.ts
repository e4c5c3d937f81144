import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { can, type ReceiptListParams } from '@tallyloom/core';
import { col, fn } from 'sequelize';
import { Chapter } from '../../chapters/models/chapter.model';
import { within } from '../../common/access/scope';
import { ParcelReceipt } from '../../receipts/models/parcel-receipt.model';
import { ReceiptFinishedBlanket } from '../../receipts/models/receipt-finished-blanket.model';
import { ReceiptScan } from '../../receipts/models/receipt-scan.model';
import {
  RECEIPT_SORT_COLUMNS,
  receiptListFilters,
  receiptListOrder,
  receiptSortKeys,
  type ReceiptSortKey,
} from '../../receipts/receipt-list-query';
import { receiptScope, SCOPE_CHAPTER } from '../../receipts/receipt-scope';
import { Region } from '../../regions/models/region.model';
import type { ExportProducer, ExportResult, ExportRun } from '../export-producer';
import type { ExportColumn, ExportRow, ExportTableSpec } from '../writers/export-table';
import { after, EXPORT_PAGE_SIZE } from './keyset';
import { writeTableFile, type TableExportParams } from './table-file';

const SENDER_COLUMNS: ExportColumn[] = [
  { header: 'Sender name', key: 'senderName', kind: 'text', width: 22 },
  { header: 'Sender e-mail', key: 'senderEmail', kind: 'text', width: 26 },
  { header: 'Sender address', key: 'senderAddress', kind: 'text', width: 32 },
];

/** The receipts table's columns; sender details only for roles that may read them. */
export function receiptColumns(showSender: boolean): ExportColumn[] {
  return [
    { header: 'Receipt no.', key: 'id', kind: 'id', width: 10 },
    { header: 'Received on', key: 'receivedOn', kind: 'date', width: 12 },
    { header: 'Region', key: 'regionName', kind: 'text', width: 18 },
    { header: 'Chapter', key: 'chapterName', kind: 'text', width: 20 },
    ...(showSender ? SENDER_COLUMNS : []),
    { header: 'Campaign code', key: 'campaignCode', kind: 'text', width: 14 },
    { header: 'Credited to a campaign', key: 'credited', kind: 'text', width: 10 },
    {
      header: 'Panels accepted (panels)',
      key: 'panelsAccepted',
      kind: 'count',
      width: 14,
      total: 'sum',
    },
    {
      header: 'Set aside: off-size (panels)',
      key: 'offSize',
      kind: 'count',
      width: 14,
      total: 'sum',
    },
    {
      header: 'Set aside: hard-care yarn (panels)',
      key: 'hardCareYarn',
      kind: 'count',
      width: 14,
      total: 'sum',
    },
    {
      header: 'Set aside: soiled or damaged (panels)',
      key: 'soiledOrDamaged',
      kind: 'count',
      width: 14,
      total: 'sum',
    },
    {
      header: 'Set aside: other (panels)',
      key: 'otherSetAside',
      kind: 'count',
      width: 14,
      total: 'sum',
    },
    {
      header: 'Set aside in all (panels)',
      key: 'setAsideTotal',
      kind: 'count',
      width: 14,
      total: 'sum',
    },
    { header: 'Why set aside (other)', key: 'setAsideOtherNote', kind: 'text', width: 24 },
    {
      header: 'Finished blankets (blankets)',
      key: 'finishedBlankets',
      kind: 'count',
      width: 14,
      total: 'sum',
    },
    { header: 'Other items (items)', key: 'otherItems', kind: 'count', width: 12, total: 'sum' },
    { header: 'Scans (files)', key: 'scans', kind: 'count', width: 10 },
    { header: 'Notes', key: 'notes', kind: 'text', width: 40 },
  ];
}

interface ReceiptRaw {
  id: number;
  receivedOn: string;
  senderName: string | null;
  senderEmail: string | null;
  senderAddress: string | null;
  campaignId: number | null;
  campaignCodeEntered: string | null;
  panelsAccepted: number;
  setAsideOffSize: number;
  setAsideHardCareYarn: number;
  setAsideSoiledOrDamaged: number;
  setAsideOther: number;
  setAsideOtherNote: string | null;
  otherItems: number;
  notes: string | null;
  chapter: { name: string; region: { name: string } };
}

/** Parcel receipts exactly as the list shows them to the person: same filters, scope and order. */
@Injectable()
export class ReceiptsExportProducer implements ExportProducer<
  TableExportParams<ReceiptListParams>
> {
  constructor(
    @InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt,
    @InjectModel(ReceiptFinishedBlanket)
    private readonly finishedBlankets: typeof ReceiptFinishedBlanket,
    @InjectModel(ReceiptScan) private readonly scans: typeof ReceiptScan,
  ) {}

  async produce(
    params: TableExportParams<ReceiptListParams>,
    run: ExportRun,
  ): Promise<ExportResult> {
    const showSender = can(run.actor.role, 'senders.read');
    const spec: ExportTableSpec = {
      sheetName: 'Parcel receipts',
      title: 'Parcel receipts',
      columns: receiptColumns(showSender),
    };
    const where = within(receiptScope(run.actor), receiptListFilters(params.filters));
    const expected = await this.receipts.count({ where, include: [SCOPE_CHAPTER] });
    const keys = receiptSortKeys(params.filters);
    return writeTableFile(params, spec, this.pages(where, keys, showSender), expected, run);
  }

  private async *pages(
    where: ReturnType<typeof within>,
    keys: ReceiptSortKey[],
    showSender: boolean,
  ): AsyncIterable<ExportRow[]> {
    let last: ReceiptRaw | null = null;
    for (;;) {
      const rows = (await this.receipts.findAll({
        where: last ? within(where, after(keys.map((key) => keyOf(key, last!)))) : where,
        include: [
          {
            model: Chapter,
            attributes: ['name'],
            required: true,
            include: [{ model: Region, attributes: ['name'] }],
          },
        ],
        order: receiptListOrder(keys),
        limit: EXPORT_PAGE_SIZE,
        raw: true,
        nest: true,
      })) as unknown as ReceiptRaw[];
      if (rows.length === 0) return;
      yield await this.toRows(rows, showSender);
      if (rows.length < EXPORT_PAGE_SIZE) return;
      last = rows[rows.length - 1];
    }
  }

  private async toRows(rows: ReceiptRaw[], showSender: boolean): Promise<ExportRow[]> {
    const ids = rows.map((row) => row.id);
    const [blankets, scans] = await Promise.all([
      this.sumsBy(this.finishedBlankets, ids, fn('SUM', col('count'))),
      this.sumsBy(this.scans, ids, fn('COUNT', col('id'))),
    ]);
    return rows.map((r) => {
      const setAsideTotal =
        r.setAsideOffSize + r.setAsideHardCareYarn + r.setAsideSoiledOrDamaged + r.setAsideOther;
      return {
        id: r.id,
        receivedOn: r.receivedOn,
        regionName: r.chapter.region.name,
        chapterName: r.chapter.name,
        ...(showSender
          ? { senderName: r.senderName, senderEmail: r.senderEmail, senderAddress: r.senderAddress }
          : {}),
        campaignCode: r.campaignCodeEntered,
        credited: r.campaignId !== null ? 'yes' : 'no',
        panelsAccepted: r.panelsAccepted,
        offSize: r.setAsideOffSize,
        hardCareYarn: r.setAsideHardCareYarn,
        soiledOrDamaged: r.setAsideSoiledOrDamaged,
        otherSetAside: r.setAsideOther,
        setAsideTotal,
        setAsideOtherNote: r.setAsideOtherNote,
        finishedBlankets: blankets.get(r.id) ?? 0,
        otherItems: r.otherItems,
        scans: scans.get(r.id) ?? 0,
        notes: r.notes,
      };
    });
  }

  /** One grouped query per page: a figure per receipt id. */
  private async sumsBy(
    model: typeof ReceiptFinishedBlanket | typeof ReceiptScan,
    ids: number[],
    aggregate: ReturnType<typeof fn>,
  ): Promise<Map<number, number>> {
    const rows = (await (model as typeof ReceiptScan).findAll({
      attributes: ['receiptId', [aggregate, 'figure']],
      where: { receiptId: ids },
      group: ['receiptId'],
      raw: true,
    })) as unknown as Array<{ receiptId: number; figure: number | string }>;
    return new Map(rows.map((row) => [row.receiptId, Number(row.figure)]));
  }
}

function keyOf(key: ReceiptSortKey, row: ReceiptRaw) {
  const value =
    key.attribute === 'chapterName'
      ? row.chapter.name
      : key.attribute === 'id'
        ? row.id
        : row[key.attribute];
  return { column: RECEIPT_SORT_COLUMNS[key.attribute], direction: key.direction, value };
}
