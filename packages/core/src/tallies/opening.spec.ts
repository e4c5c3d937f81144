import type { TallyValues } from '../contract/tallies';
import { emptyTallyValues } from './empty-values';
import { openingProblems } from './opening';

function opening(panels: number, blankets: number): TallyValues {
  const values = emptyTallyValues();
  values.panels.opening = panels;
  values.blankets.opening = blankets;
  return values;
}

const FEBRUARY = { panels: 100, blankets: 3, fromMonth: '2026-02', approved: true };

describe('openingProblems', () => {
  it('is silent when the opening carries last month’s approved closing stock', () => {
    expect(openingProblems(opening(100, 3), { expectedOpening: FEBRUARY })).toEqual([]);
  });

  it('refuses an opening that differs from last month’s closing stock', () => {
    expect(openingProblems(opening(90, 5), { expectedOpening: FEBRUARY })).toEqual([
      {
        code: 'opening-panels',
        severity: 'error',
        field: 'panels.opening',
        message: 'Panel opening stock (90) should equal the closing stock of Feb 2026 (100).',
      },
      {
        code: 'opening-blankets',
        severity: 'error',
        field: 'blankets.opening',
        message: 'Blanket opening stock (5) should equal the closing stock of Feb 2026 (3).',
      },
    ]);
  });

  it('warns while last month’s tally is not approved', () => {
    const problems = openingProblems(opening(100, 3), {
      expectedOpening: { ...FEBRUARY, approved: false },
    });
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ code: 'opening-not-approved', severity: 'warning' });
    expect(problems[0].message).toMatch(/^Last month's tally is not approved yet/);
  });

  it('notes an opening entered by hand in a chapter’s first tally', () => {
    expect(openingProblems(opening(40, 0), { expectedOpening: null })).toEqual([
      expect.objectContaining({ code: 'opening-by-hand', severity: 'info' }),
    ]);
  });
});
