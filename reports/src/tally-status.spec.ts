import { factJoinsSql, flowColumns } from './chapter-month-facts';
import { chaptersSql, periodStockSql, periodStocksFromRows, tallyStatusSql } from './tally-status';

describe('chaptersSql', () => {
  it('reads every chapter without a filter', () => {
    expect(chaptersSql().sql).not.toContain('WHERE');
  });

  it('narrows to chapters and regions, both when both are given', () => {
    const { sql, replacements } = chaptersSql({ chapterIds: [4], regionIds: [2, 3] });
    expect(sql).toContain('WHERE c.id IN (:chapterIds) AND c.region_id IN (:regionIds)');
    expect(replacements).toMatchObject({ chapterIds: [4], regionIds: [2, 3] });
  });

  it('matches nothing for an empty list instead of writing IN ()', () => {
    const { sql } = chaptersSql({ regionIds: [] });
    expect(sql).toContain('WHERE 1 = 0');
    expect(sql).not.toContain('IN ()');
  });

  it('refuses ids that are not positive whole numbers', () => {
    expect(() => chaptersSql({ regionIds: [0] })).toThrow(/regionIds/);
    expect(() => chaptersSql({ regionOfChapterId: 1.5 })).toThrow(/regionOfChapterId/);
  });

  it("narrows to the chapters of one chapter's region with a sub-select, no second query", () => {
    const { sql, replacements } = chaptersSql({ regionOfChapterId: 7 });
    expect(sql).toContain(
      'WHERE c.region_id = (SELECT o.region_id FROM chapters o WHERE o.id = :regionOf)',
    );
    expect(replacements).toMatchObject({ regionOf: 7 });
  });
});

describe('tallyStatusSql', () => {
  it('joins the approved revision only, so a tally stays one row', () => {
    const { sql } = tallyStatusSql();
    expect(sql).toContain(
      'LEFT JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision',
    );
    expect(sql.match(/JOIN/g)).toHaveLength(1);
  });
});

describe('periodStockSql', () => {
  it("takes each chapter's last approved month per period, one window per period", () => {
    const { sql, replacements } = periodStockSql({
      chapterIds: [3, 4],
      periods: [
        { from: '2026-01', to: '2026-03' },
        { from: '2025-07', to: '2026-06' },
      ],
    });
    expect(
      sql.match(/ROW_NUMBER\(\) OVER \(PARTITION BY t.chapter_id ORDER BY t.month DESC\)/g),
    ).toHaveLength(2);
    expect(sql).toContain('WHERE l.nth = 1');
    expect(replacements).toMatchObject({
      chapterIds: [3, 4],
      from0: '2026-01-01',
      to0: '2026-03-01',
      from1: '2025-07-01',
      to1: '2026-06-01',
    });
  });

  it('matches nothing for no chapters, and refuses a month that is not YYYY-MM', () => {
    expect(
      periodStockSql({ chapterIds: [], periods: [{ from: '2026-01', to: '2026-03' }] }).sql,
    ).toContain('WHERE 1 = 0');
    expect(() =>
      periodStockSql({ chapterIds: [1], periods: [{ from: '2026-1', to: '2026-03' }] }),
    ).toThrow(/periods\[0\]\.from/);
  });

  it('reads one stock per period, nothing where no row came back', () => {
    expect(
      periodStocksFromRows([{ period_index: 1, panels_closing: '12', blankets_closing: '3' }], 2),
    ).toEqual([
      { panels: 0, blankets: 0 },
      { panels: 12, blankets: 3 },
    ]);
  });
});

describe('tallyStatusSql with flows', () => {
  it("adds the approved revision's flow columns and their line totals, still one row per tally", () => {
    const plain = tallyStatusSql({ chapterIds: [2] });
    const { sql, replacements } = tallyStatusSql({ chapterIds: [2] }, { withFlows: true });
    for (const [column] of flowColumns()) expect(sql).toContain(` AS ${column}`);
    expect(sql).toContain(factJoinsSql());
    expect(plain.sql).not.toContain('panels_accepted');
    // Each line table is summed per revision before the join: no fan-out.
    expect(sql.match(/GROUP BY l.revision_id/g)).toHaveLength(3);
    expect(replacements).toEqual(plain.replacements);
  });
});
