import { PEOPLE_GROUPS } from '@tallyloom/core';
import { chapterMonthFactsSql, factFromRow } from './chapter-month-facts';

describe('chapterMonthFactsSql', () => {
  it('reads approved revisions only, with no filter but the approval', () => {
    const { sql, replacements } = chapterMonthFactsSql();
    expect(sql).toContain('r.revision = t.approved_revision');
    expect(sql).toMatch(/WHERE t\.approved_revision IS NOT NULL\nORDER BY/);
    expect(Object.keys(replacements)).toEqual(['monthFormat']);
  });

  it('filters by chapters and months as named replacements, never inline', () => {
    const { sql, replacements } = chapterMonthFactsSql({
      chapterIds: [7, 3, 7],
      from: '2025-07',
      to: '2026-06',
    });
    expect(sql).toContain('t.chapter_id IN (:chapterIds)');
    expect(sql).toContain('t.month >= :fromMonth');
    expect(sql).toContain('t.month <= :toMonth');
    expect(replacements).toMatchObject({
      chapterIds: [7, 3],
      fromMonth: '2025-07-01',
      toMonth: '2026-06-01',
    });
  });

  it('matches nothing for an empty chapter list instead of writing IN ()', () => {
    const { sql, replacements } = chapterMonthFactsSql({ chapterIds: [] });
    expect(sql).toContain('1 = 0');
    expect(sql).not.toContain('IN ()');
    expect(replacements).not.toHaveProperty('chapterIds');
  });

  it('sums each line table grouped by revision before joining, so lines cannot multiply rows', () => {
    const { sql } = chapterMonthFactsSql();
    const from = sql.slice(sql.indexOf('\nFROM monthly_tallies'));
    // Inner joins: the chapter and the one approved revision; each line table joins as one
    // row per revision (grouped by revision_id), so a tally stays one row.
    expect(from.match(/(?<!LEFT )JOIN/g)).toHaveLength(2);
    const lineJoins = from.match(
      /LEFT JOIN \(SELECT l\.revision_id, .*? GROUP BY l\.revision_id\)/g,
    );
    expect(lineJoins).toHaveLength(3);
    const people = lineJoins!.find((join) => join.includes('tally_people_served'))!;
    expect(people.match(/CASE WHEN l\.people_group = /g)).toHaveLength(PEOPLE_GROUPS.length);
  });

  it.each([
    [{ from: '2026-13' }, /from must be a month/],
    [{ to: '2026-3' }, /to must be a month/],
    [{ chapterIds: [1, 0] }, /chapterIds must be positive whole numbers/],
    [{ chapterIds: [1.5] }, /chapterIds must be positive whole numbers/],
  ])('refuses %j', (filter, message) => {
    expect(() => chapterMonthFactsSql(filter)).toThrow(message);
  });
});

describe('factFromRow', () => {
  it('reads decimals sent as text and counts one approved tally', () => {
    const fact = factFromRow({
      chapter_id: 4,
      region_id: 2,
      month: '2026-03',
      tally_id: 90,
      revision: 2,
      panels_accepted: 120,
      panels_set_aside: 6,
      panels_used: 96,
      blankets_assembled: '3',
      blankets_received: 1,
      blankets_given: '2',
      people_served: '5',
      people_infants: '1',
      people_children: '0',
      people_adults: '4',
      people_older_adults: '0',
      people_disaster_affected: '0',
      volunteer_hours: '12.50',
      yarn_kg: '0.453592',
      panels_closing: 40,
      blankets_closing: 7,
    });
    expect(fact).toMatchObject({ chapterId: 4, regionId: 2, month: '2026-03', tallyId: 90 });
    expect(fact.figures).toMatchObject({
      blanketsAssembled: 3,
      peopleServed: 5,
      peopleServedByGroup: { infants: 1, adults: 4 },
      volunteerHours: 12.5,
      yarnKg: 0.453592,
      panelsInStock: 40,
      approvedTallies: 1,
    });
  });

  it('refuses a column that is not a number', () => {
    expect(() => factFromRow({ chapter_id: 'x' })).toThrow(/chapter_id/);
  });
});
