import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { can, ROLE_SCOPE, type ReceiptListParams } from '@tallyloom/core';
import { within } from '../../common/access/scope';
import { ParcelReceipt } from '../../receipts/models/parcel-receipt.model';
import {
  receiptListFilters,
  receiptListOrderSql,
  receiptSortKeys,
} from '../../receipts/receipt-list-query';
import { receiptScope, SCOPE_CHAPTER } from '../../receipts/receipt-scope';
import type { ExportProducer, ExportResult, ExportRun } from '../export-producer';
import type { ExportColumn, ExportTableSpec } from '../writers/export-table';
import { columnSql, streamedRows, whereSql, type StreamedCell } from './streamed-rows';
import { writeTableCells, type TableExportParams } from './table-file';

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

/** Rows per batch handed to the writer: one file write (CSV) or one pause for the zip (xlsx). */
const BATCH_ROWS = 2_000;

const RECEIPT = '`ParcelReceipt`';

/**
 * Each column's cell in SQL over the list's query (the receipt as `ParcelReceipt`, its chapter as
 * `chapter`, the chapter's region as `chapter->region`), so a streamed row is the file's row.
 */
function cellSql(receipts: typeof ParcelReceipt): Record<string, string> {
  const column = (attribute: string) => columnSql(receipts, attribute);
  return {
    id: column('id'),
    receivedOn: column('receivedOn'),
    regionName: '`chapter->region`.`name`',
    chapterName: '`chapter`.`name`',
    senderName: column('senderName'),
    senderEmail: column('senderEmail'),
    senderAddress: column('senderAddress'),
    campaignCode: column('campaignCodeEntered'),
    credited: `IF(${column('campaignId')} IS NULL, 'no', 'yes')`,
    panelsAccepted: column('panelsAccepted'),
    offSize: column('setAsideOffSize'),
    hardCareYarn: column('setAsideHardCareYarn'),
    soiledOrDamaged: column('setAsideSoiledOrDamaged'),
    otherSetAside: column('setAsideOther'),
    setAsideTotal: [
      'setAsideOffSize',
      'setAsideHardCareYarn',
      'setAsideSoiledOrDamaged',
      'setAsideOther',
    ]
      .map(column)
      .join(' + '),
    setAsideOtherNote: column('setAsideOtherNote'),
    finishedBlankets: `(SELECT COALESCE(SUM(b.count), 0) FROM receipt_finished_blankets b WHERE b.receipt_id = ${column('id')})`,
    otherItems: column('otherItems'),
    scans: `(SELECT COUNT(*) FROM receipt_scans s WHERE s.receipt_id = ${column('id')})`,
    notes: column('notes'),
  };
}

/** Parcel receipts exactly as the list shows them to the person: same filters, scope and order. */
@Injectable()
export class ReceiptsExportProducer implements ExportProducer<
  TableExportParams<ReceiptListParams>
> {
  constructor(@InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt) {}

  async produce(
    params: TableExportParams<ReceiptListParams>,
    run: ExportRun,
  ): Promise<ExportResult> {
    const { spec, batches, expected } = this.rows(params, run.actor);
    return writeTableCells(params, spec, batches, expected, run);
  }

  /**
   * The table and its rows as the file will hold them, streamed in batches, with the row count
   * (counted beside the read, on another connection: only the progress waits for it).
   */
  rows(
    params: TableExportParams<ReceiptListParams>,
    actor: ExportRun['actor'],
  ): {
    spec: ExportTableSpec;
    batches: AsyncIterable<StreamedCell[][]>;
    expected: Promise<number>;
  } {
    const showSender = can(actor.role, 'senders.read');
    const spec: ExportTableSpec = {
      sheetName: 'Parcel receipts',
      title: 'Parcel receipts',
      columns: receiptColumns(showSender),
    };
    const where = within(receiptScope(actor), receiptListFilters(params.filters));
    const cells = cellSql(this.receipts);
    // For xlsx, receipts first (STRAIGHT_JOIN keeps the order of the FROM list): the server
    // sorts them and sends the first row at once, so the slow writer works while the rest is
    // read. Left to itself the optimizer starts from the few regions and builds a temporary
    // table of every row before the first is sent, but does less work in all, which is what
    // counts for CSV, whose writer waits on the read (measured: test/bench, exports). A region
    // narrows through its chapters, and there the optimizer's plan reads far fewer rows.
    const receiptsFirst =
      params.format === 'xlsx' &&
      params.filters.regionId === undefined &&
      ROLE_SCOPE[actor.role] !== 'region';
    // Only the columns the person may see are selected: sender details never leave the database
    // for a role without them.
    const select = spec.columns.map((column) => cells[column.key]).join(', ');
    const sql = [
      `SELECT ${receiptsFirst ? 'STRAIGHT_JOIN ' : ''}${select}`,
      `FROM \`parcel_receipts\` AS ${RECEIPT}`,
      'INNER JOIN `chapters` AS `chapter` ON `chapter`.`id` = `ParcelReceipt`.`chapter_id`',
      'INNER JOIN `regions` AS `chapter->region` ON `chapter->region`.`id` = `chapter`.`region_id`',
      whereSql(this.receipts, where),
      receiptListOrderSql(receiptSortKeys(params.filters)),
    ].join(' ');
    return {
      spec,
      batches: streamedRows(this.receipts, sql, BATCH_ROWS),
      expected: this.receipts.count({ where, include: [SCOPE_CHAPTER] }),
    };
  }
}
