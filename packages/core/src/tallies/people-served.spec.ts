import type { TallyValues } from '../contract/tallies';
import { emptyTallyValues } from './empty-values';
import { peopleServedProblems } from './people-served';

function serving(given: number, served: number): TallyValues {
  const values = emptyTallyValues();
  values.blankets.given = given > 0 ? [{ blanketSizeId: 1, partnerAgencyId: 7, count: given }] : [];
  values.peopleServed = [
    { partnerAgencyId: 7, group: 'children', count: Math.ceil(served / 2) },
    { partnerAgencyId: 7, group: 'adults', count: Math.floor(served / 2) },
  ];
  return values;
}

describe('peopleServedProblems', () => {
  const context = { servedPerBlanketWarnFactor: 3 };

  it('is silent up to blankets given × the factor', () => {
    expect(peopleServedProblems(serving(10, 30), context)).toEqual([]);
    expect(peopleServedProblems(serving(10, 4), context)).toEqual([]);
    expect(peopleServedProblems(serving(0, 0), context)).toEqual([]);
  });

  it('warns when more people are served than blankets given × the factor', () => {
    expect(peopleServedProblems(serving(10, 31), context)).toEqual([
      {
        code: 'people-served-high',
        severity: 'warning',
        field: 'peopleServed',
        message:
          'People served (31) is more than 3 × the blankets given out (10); check that no one is counted twice.',
      },
    ]);
  });

  it('reads the factor from the context', () => {
    expect(peopleServedProblems(serving(10, 31), { servedPerBlanketWarnFactor: 4 })).toEqual([]);
    expect(peopleServedProblems(serving(10, 16), { servedPerBlanketWarnFactor: 1.5 })).toHaveLength(
      1,
    );
  });

  it('warns when people are served but no blankets were given', () => {
    expect(peopleServedProblems(serving(0, 5), context)).toEqual([
      {
        code: 'people-served-without-blankets',
        severity: 'warning',
        field: 'peopleServed',
        message: '5 people are reported as served, but no blankets were given out this month.',
      },
    ]);
    expect(peopleServedProblems(serving(0, 1), context)[0].message).toMatch(/^1 person is /);
  });

  it('refuses a factor that is not positive', () => {
    expect(() => peopleServedProblems(serving(1, 1), { servedPerBlanketWarnFactor: 0 })).toThrow(
      'servedPerBlanketWarnFactor must be greater than 0',
    );
  });
});
