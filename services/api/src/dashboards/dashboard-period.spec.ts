import { BadRequestException } from '@nestjs/common';
import { resolvePeriod } from './dashboard-period';

const LAST = '2026-03';

function fieldOf(run: () => unknown): string | undefined {
  try {
    run();
  } catch (error) {
    if (!(error instanceof BadRequestException)) throw error;
    const body = error.getResponse() as { fields: Array<{ field: string }> };
    return body.fields.map((problem) => problem.field).join(',');
  }
  return undefined;
}

describe('resolvePeriod', () => {
  it('defaults to the last complete month, and to the quarter or fiscal year holding it', () => {
    expect(resolvePeriod({}, 7, LAST)).toMatchObject({ kind: 'month', key: '2026-03' });
    expect(resolvePeriod({ periodKind: 'quarter' }, 7, LAST)).toMatchObject({ key: '2026-Q1' });
    // With a July start, March 2026 falls in the fiscal year Jul 2025 – Jun 2026.
    expect(resolvePeriod({ periodKind: 'fiscal_year' }, 7, LAST)).toMatchObject({
      key: 'FY2026',
      from: '2025-07',
      to: '2026-06',
    });
  });

  it('reads the kind from the shape of the key when none is given', () => {
    expect(resolvePeriod({ period: '2025-Q4' }, 1, LAST).kind).toBe('quarter');
    expect(resolvePeriod({ period: 'FY2025' }, 1, LAST)).toMatchObject({
      kind: 'fiscal_year',
      from: '2025-01',
      to: '2025-12',
    });
    expect(resolvePeriod({ from: '2025-01', to: '2025-02' }, 1, LAST).kind).toBe('custom');
  });

  it('accepts a custom range of 36 months and refuses one of 37, naming `to`', () => {
    expect(
      resolvePeriod({ periodKind: 'custom', from: '2023-04', to: '2026-03' }, 1, LAST),
    ).toMatchObject({
      from: '2023-04',
      to: '2026-03',
    });
    expect(
      fieldOf(() =>
        resolvePeriod({ periodKind: 'custom', from: '2023-03', to: '2026-03' }, 1, LAST),
      ),
    ).toBe('to');
  });

  it.each([
    [{ periodKind: 'week' }, 'periodKind'],
    [{ periodKind: 'month', period: '2026-3' }, 'period'],
    [{ periodKind: 'quarter', period: '2026-03' }, 'period'],
    [{ periodKind: 'custom', to: '2026-03' }, 'from'],
    [{ periodKind: 'custom', from: '2026-03' }, 'to'],
    [{ periodKind: 'custom', from: '2026-04', to: '2026-03' }, 'to'],
  ])('refuses %j naming %s', (query, field) => {
    expect(fieldOf(() => resolvePeriod(query, 1, LAST))).toBe(field);
  });
});
