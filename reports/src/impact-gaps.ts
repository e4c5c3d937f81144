/** Known gaps of an impact pack: chapters active in the period with no approved tally in it. */
import { monthStartDate, requireIds, type SqlQuery } from './sql';

/**
 * Chapters among `chapterIds`, active for some of the period, that have no approved tally in it:
 * id and name, by name. Their figures are absent from the pack, not zero.
 */
export function chaptersWithoutApprovedTallySql(filter: {
  chapterIds: readonly number[];
  from: string;
  to: string;
}): SqlQuery {
  const ids = requireIds('chapterIds', filter.chapterIds);
  const fromDay = monthStartDate('from', filter.from);
  const toMonth = monthStartDate('to', filter.to);
  return {
    sql: [
      'SELECT c.id, c.name FROM chapters c',
      `WHERE ${ids.length > 0 ? 'c.id IN (:chapterIds)' : '1 = 0'}`,
      // Active for some of the period: opened by its last day, not closed before its first.
      '  AND c.active_from < :toMonth + INTERVAL 1 MONTH',
      '  AND (c.active_to IS NULL OR c.active_to >= :fromDay)',
      '  AND NOT EXISTS (SELECT 1 FROM monthly_tallies t WHERE t.chapter_id = c.id',
      '    AND t.approved_revision IS NOT NULL AND t.month >= :fromDay AND t.month <= :toMonth)',
      'ORDER BY c.name',
    ].join('\n'),
    replacements: { fromDay, toMonth, ...(ids.length > 0 ? { chapterIds: ids } : {}) },
  };
}
