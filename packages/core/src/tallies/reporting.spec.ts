import { DomainError } from '../errors/domain-error';
import { reportingStatus, tallyDueOn } from './reporting';

describe('tallyDueOn', () => {
  it('falls on the due day of the following month', () => {
    expect(tallyDueOn('2026-03', 10)).toBe('2026-04-10');
    expect(tallyDueOn('2026-03', 1)).toBe('2026-04-01');
  });

  it('moves December into January of the next year', () => {
    expect(tallyDueOn('2026-12', 10)).toBe('2027-01-10');
  });

  it('keeps a late due day inside a short month', () => {
    // Source: Gregorian calendar rule: February 2026 has 28 days, February 2028 has 29
    expect(tallyDueOn('2026-01', 31)).toBe('2026-02-28');
    expect(tallyDueOn('2028-01', 30)).toBe('2028-02-29');
    expect(tallyDueOn('2026-03', 31)).toBe('2026-04-30');
  });

  it('refuses a due day that is not a day of the month', () => {
    expect(() => tallyDueOn('2026-03', 0)).toThrow(DomainError);
    expect(() => tallyDueOn('2026-03', 32)).toThrow('dueDay must be a day of the month');
    expect(() => tallyDueOn('2026-03', 2.5)).toThrow('dueDay must be a whole number');
  });
});

describe('reportingStatus', () => {
  const march = { month: '2026-03', dueDay: 10 };

  it('is on time when first submitted on or before the due day', () => {
    expect(
      reportingStatus({ ...march, firstSubmittedAt: '2026-04-10T23:59:59Z', today: '2026-06-01' }),
    ).toBe('on-time');
    expect(
      reportingStatus({ ...march, firstSubmittedAt: '2026-03-31T12:00:00Z', today: '2026-06-01' }),
    ).toBe('on-time');
  });

  it('is late from the day after the due day, in UTC', () => {
    expect(
      reportingStatus({ ...march, firstSubmittedAt: '2026-04-11T00:00:00Z', today: '2026-04-11' }),
    ).toBe('late');
    // 22:30 at UTC−3 on the due day is already the 11th in UTC
    expect(
      reportingStatus({
        ...march,
        firstSubmittedAt: '2026-04-10T22:30:00-03:00',
        today: '2026-04-11',
      }),
    ).toBe('late');
  });

  it('is upcoming until the month is over, due until the due day, then missing', () => {
    const at = (today: string) => reportingStatus({ ...march, firstSubmittedAt: null, today });
    expect(at('2026-03-15')).toBe('upcoming');
    expect(at('2026-03-31')).toBe('upcoming');
    expect(at('2026-04-01')).toBe('due');
    expect(at('2026-04-10')).toBe('due');
    expect(at('2026-04-11')).toBe('missing');
  });

  it('handles a December tally due in January', () => {
    const at = (today: string) =>
      reportingStatus({ month: '2026-12', dueDay: 10, firstSubmittedAt: null, today });
    expect(at('2026-12-31')).toBe('upcoming');
    expect(at('2027-01-10')).toBe('due');
    expect(at('2027-01-11')).toBe('missing');
    expect(
      reportingStatus({
        month: '2026-12',
        dueDay: 10,
        firstSubmittedAt: '2027-01-12T09:00:00Z',
        today: '2027-02-01',
      }),
    ).toBe('late');
  });

  it('refuses a today that is not an ISO date', () => {
    expect(() =>
      reportingStatus({ ...march, firstSubmittedAt: null, today: '11/04/2026' }),
    ).toThrow('today must be an ISO date');
  });
});
