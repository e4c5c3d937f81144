import { monthStart, type TallyListParams } from '@tallyloom/core';
import { Op, literal, type IncludeOptions, type Order, type WhereOptions } from 'sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import { Region } from '../regions/models/region.model';

/**
 * The tallies list's filters and order, shared by GET /api/tallies (and so the review queue) and
 * the tallies and review-queue exports, so that an export holds exactly the rows on screen, in
 * the same order. Queries include TALLY_LIST_INCLUDE (the chapter as `chapter`, with its region).
 */
export const TALLY_LIST_INCLUDE: IncludeOptions = {
  model: Chapter,
  attributes: ['id', 'name', 'regionId', 'reportingDueDay'],
  required: true,
  include: [{ model: Region, attributes: ['id', 'name'] }],
};

export function tallyListFilters(query: TallyListParams): WhereOptions {
  const filters: WhereOptions[] = [];
  if (query.state) filters.push({ state: query.state });
  if (query.regionId) filters.push({ '$chapter.region_id$': query.regionId });
  if (query.chapterId) filters.push({ chapterId: query.chapterId });
  if (query.month) filters.push({ month: monthStart(query.month) });
  if (query.from) filters.push({ month: { [Op.gte]: monthStart(query.from) } });
  if (query.to) filters.push({ month: { [Op.lte]: monthStart(query.to) } });
  return { [Op.and]: filters };
}

export type TallySortAttribute = 'month' | 'chapterName' | 'state' | 'submittedAt' | 'id';

export interface TallySortKey {
  attribute: TallySortAttribute;
  direction: 'ASC' | 'DESC';
}

/** The list's order as keys; the last one (the id) makes it total, so keyset paging can use it. */
export function tallySortKeys(query: TallyListParams): TallySortKey[] {
  const direction = query.direction === 'asc' ? 'ASC' : 'DESC';
  switch (query.sort) {
    case 'chapterName':
      return [
        { attribute: 'chapterName', direction },
        { attribute: 'month', direction: 'DESC' },
        { attribute: 'id', direction: 'DESC' },
      ];
    case 'state':
      return [
        { attribute: 'state', direction },
        { attribute: 'month', direction: 'DESC' },
        { attribute: 'id', direction: 'DESC' },
      ];
    case 'submittedAt':
      return [
        { attribute: 'submittedAt', direction },
        { attribute: 'id', direction },
      ];
    default:
      return [
        { attribute: 'month', direction },
        { attribute: 'chapterName', direction: 'ASC' },
        { attribute: 'id', direction },
      ];
  }
}

/**
 * When the current revision was submitted; null for a draft never submitted. MariaDB sorts NULL
 * before every value, so NULLs come first ascending and last descending.
 */
// Source: MariaDB Knowledge Base, "ORDER BY" (NULL values are treated as lower than any value).
export const SUBMITTED_AT_SQL =
  '(SELECT r.submitted_at FROM tally_revisions r WHERE r.tally_id = `MonthlyTally`.`id` AND r.revision = `MonthlyTally`.`current_revision`)';

export function tallyListOrder(keys: readonly TallySortKey[]): Order {
  return keys.map(({ attribute, direction }) => {
    if (attribute === 'chapterName') return [{ model: Chapter, as: 'chapter' }, 'name', direction];
    if (attribute === 'submittedAt') return [literal(SUBMITTED_AT_SQL), direction];
    return [attribute, direction];
  });
}

/** The `where` key of each sort attribute; the submission time is a subquery. */
export const TALLY_SORT_COLUMNS: Record<TallySortAttribute, string | ReturnType<typeof literal>> = {
  month: 'month',
  chapterName: '$chapter.name$',
  state: 'state',
  submittedAt: literal(SUBMITTED_AT_SQL),
  id: 'id',
};
