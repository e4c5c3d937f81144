import { addCompliance, complianceOf, emptyCompliance } from './compliance';

// Tallies are due on day 10 of the following month: March's tally is due 10 April 2026.
const TODAY = '2026-04-10';

describe('complianceOf', () => {
  it('sorts chapter-months into on time, late, missing and open', () => {
    const figures = complianceOf(
      [
        { month: '2026-01', dueDay: 10, firstSubmittedAt: '2026-02-09T16:00:00Z' }, // on time
        { month: '2026-01', dueDay: 10, firstSubmittedAt: '2026-02-10T23:59:00Z' }, // on the due day
        { month: '2026-01', dueDay: 10, firstSubmittedAt: '2026-02-11T08:00:00Z' }, // late
        { month: '2026-02', dueDay: 10, firstSubmittedAt: null }, // due 10 Mar → missing
        { month: '2026-03', dueDay: 10, firstSubmittedAt: null }, // due today → open
        { month: '2026-04', dueDay: 10, firstSubmittedAt: null }, // not over yet → open
      ],
      TODAY,
    );
    expect(figures).toEqual({ expected: 6, onTime: 2, late: 1, missing: 1, open: 2 });
  });

  it('counts nothing for no chapter-months', () => {
    expect(complianceOf([], TODAY)).toEqual(emptyCompliance());
  });

  it('refuses a bad today', () => {
    expect(() =>
      complianceOf([{ month: '2026-03', dueDay: 10, firstSubmittedAt: null }], '10/04/2026'),
    ).toThrow(/today must be an ISO date/);
  });
});

describe('addCompliance', () => {
  it('adds every count', () => {
    expect(
      addCompliance(
        { expected: 4, onTime: 2, late: 1, missing: 1, open: 0 },
        { expected: 3, onTime: 1, late: 0, missing: 0, open: 2 },
      ),
    ).toEqual({ expected: 7, onTime: 3, late: 1, missing: 1, open: 2 });
  });
});
