import { AGENCY_KINDS } from '@tallyloom/core';
import { agencyKindFiguresSql, agencyKindRows } from './impact-agency-kinds';

describe('figures by partner-agency kind', () => {
  it('reads approved revisions only, in scope and period', () => {
    const { sql, replacements } = agencyKindFiguresSql({
      chapterIds: [3, 3, 5],
      from: '2025-07',
      to: '2026-06',
    });
    expect(sql).toMatch(/t\.approved_revision = r\.revision/);
    expect(sql.match(/t\.chapter_id IN \(:chapterIds\)/g)).toHaveLength(2);
    expect(replacements).toEqual({
      chapterIds: [3, 5],
      fromMonth: '2025-07-01',
      toMonth: '2026-06-01',
    });
  });

  it('matches nothing for no chapters and refuses a bad month', () => {
    expect(agencyKindFiguresSql({ chapterIds: [], from: '2025-07', to: '2025-07' }).sql).toMatch(
      /1 = 0/,
    );
    expect(() => agencyKindFiguresSql({ chapterIds: [1], from: '2025-7', to: '2025-08' })).toThrow(
      /from/,
    );
  });

  it('lists every kind in catalogue order, zero where no line names it', () => {
    const rows = agencyKindRows([{ kind: 'care_home', blankets_given: '12', people_served: 9 }]);
    expect(rows.map((row) => row.kind)).toEqual([...AGENCY_KINDS]);
    expect(rows.find((row) => row.kind === 'care_home')).toMatchObject({
      blanketsGiven: 12,
      peopleServed: 9,
    });
    expect(rows.find((row) => row.kind === 'outreach')).toMatchObject({
      blanketsGiven: 0,
      peopleServed: 0,
    });
  });
});
