import { customPeriod, emptySnapshotFigures, monthPeriod, quarterPeriod } from '@tallyloom/core';
import { oldestAsOf, snapshotOf } from './snapshot-assembly';
import type { SnapshotRow } from './snapshot-rows';

const subject = { scope: 'chapter' as const, scopeId: 4, scopeName: 'Alder Falls' };
const NOW = '2026-04-02T00:00:00.000Z';

function row(
  key: string,
  values: Partial<SnapshotRow> & { accepted: number; stock: number },
): SnapshotRow {
  const { accepted, stock, ...rest } = values;
  return {
    scope: 'chapter',
    scopeId: 4,
    periodKind: /Q/.test(key) ? 'quarter' : 'month',
    periodKey: key,
    figures: {
      ...emptySnapshotFigures(),
      panelsAccepted: accepted,
      panelsInStock: stock,
      approvedTallies: 1,
    },
    compliance: { expected: 1, onTime: 1, late: 0, missing: 0, open: 0 },
    pendingTallies: 0,
    asOf: '2026-04-01T00:00:00.000Z',
    ...rest,
  };
}

describe('snapshotOf', () => {
  const rows = [
    row('2026-01', { accepted: 10, stock: 50, asOf: '2026-03-01T00:00:00.000Z' }),
    row('2026-02', { accepted: 20, stock: 40, pendingTallies: 1 }),
    row('2026-03', { accepted: 30, stock: 70 }),
    // Another chapter's row never leaks in.
    { ...row('2026-03', { accepted: 999, stock: 999 }), scopeId: 5 },
  ];

  it('takes the stored row of the period when there is one', () => {
    const stored = row('2026-Q1', { accepted: 61, stock: 71 });
    const view = snapshotOf(subject, quarterPeriod('2026-Q1'), [...rows, stored], NOW);
    expect(view.figures.panelsAccepted).toBe(61);
  });

  it('else sums the months, keeps the last stock, and is as old as its oldest month', () => {
    const view = snapshotOf(subject, customPeriod('2026-01', '2026-03'), rows, NOW);
    expect(view.figures.panelsAccepted).toBe(60);
    expect(view.figures.panelsInStock).toBe(70);
    expect(view.compliance.expected).toBe(3);
    expect(view.pendingTallies).toBe(1);
    expect(view.asOf).toBe('2026-03-01T00:00:00.000Z');
  });

  it('is empty, as of now, when nothing is stored', () => {
    const view = snapshotOf(subject, monthPeriod('2025-12'), rows, NOW);
    expect(view.figures).toEqual(emptySnapshotFigures());
    expect(view.asOf).toBe(NOW);
  });
});

describe('oldestAsOf', () => {
  it('picks the earliest timestamp', () => {
    expect(oldestAsOf(['2026-03-02T00:00:00.000Z', '2026-01-05T09:00:00.000Z', NOW])).toBe(
      '2026-01-05T09:00:00.000Z',
    );
  });
});
