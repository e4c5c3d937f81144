import type { ReceiptListParams } from '@tallyloom/core';
import { Op, literal, type Order, type WhereOptions } from 'sequelize';
import { Chapter } from '../chapters/models/chapter.model';

/**
 * The receipts list's filters and order, shared by the list endpoint and the receipts export so
 * that an export holds exactly the rows on screen, in the same order. Queries include the chapter
 * (as `chapter`) for the region filter and the chapter-name sort.
 */
export function receiptListFilters(query: ReceiptListParams): WhereOptions {
  const filters: WhereOptions[] = [];
  if (query.from) filters.push({ receivedOn: { [Op.gte]: query.from } });
  if (query.to) filters.push({ receivedOn: { [Op.lte]: query.to } });
  if (query.regionId) filters.push({ '$chapter.region_id$': query.regionId });
  if (query.chapterId) filters.push({ chapterId: query.chapterId });
  if (query.campaignId) filters.push({ campaignId: query.campaignId });
  if (query.hasScan !== undefined) {
    const exists =
      'EXISTS (SELECT 1 FROM receipt_scans s WHERE s.receipt_id = `ParcelReceipt`.`id`)';
    filters.push(literal(query.hasScan ? exists : `NOT ${exists}`));
  }
  return { [Op.and]: filters };
}

export type ReceiptSortAttribute = 'receivedOn' | 'panelsAccepted' | 'chapterName' | 'id';

export interface ReceiptSortKey {
  attribute: ReceiptSortAttribute;
  direction: 'ASC' | 'DESC';
}

/** The list's order as keys; the last one (the id) makes it total, so ties never reorder. */
export function receiptSortKeys(query: ReceiptListParams): ReceiptSortKey[] {
  const direction = query.direction === 'asc' ? 'ASC' : 'DESC';
  if (query.sort === 'chapterName')
    return [
      { attribute: 'chapterName', direction },
      { attribute: 'receivedOn', direction: 'DESC' },
      { attribute: 'id', direction: 'DESC' },
    ];
  return [
    { attribute: query.sort === 'panelsAccepted' ? 'panelsAccepted' : 'receivedOn', direction },
    { attribute: 'id', direction },
  ];
}

export function receiptListOrder(keys: ReceiptSortKey[]): Order {
  return keys.map(({ attribute, direction }) =>
    attribute === 'chapterName'
      ? [{ model: Chapter, as: 'chapter' }, 'name', direction]
      : [attribute, direction],
  );
}

/**
 * Each sort attribute as SQL over the list's query, whose receipt is `ParcelReceipt` and its
 * chapter `chapter` (Sequelize's aliases): for reads that stream the list in its own order.
 */
const RECEIPT_SORT_SQL: Record<ReceiptSortAttribute, string> = {
  receivedOn: '`ParcelReceipt`.`received_on`',
  panelsAccepted: '`ParcelReceipt`.`panels_accepted`',
  chapterName: '`chapter`.`name`',
  id: '`ParcelReceipt`.`id`',
};

/** The list's order as an SQL ORDER BY clause (the same columns and directions). */
export function receiptListOrderSql(keys: ReceiptSortKey[]): string {
  return `ORDER BY ${keys.map((key) => `${RECEIPT_SORT_SQL[key.attribute]} ${key.direction}`).join(', ')}`;
}
