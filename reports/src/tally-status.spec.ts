import { chaptersSql, tallyStatusSql } from './tally-status';

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
