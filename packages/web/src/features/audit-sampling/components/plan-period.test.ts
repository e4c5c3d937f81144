import { describe, expect, it } from 'vitest';
import { recentQuarters } from './plan-period';

describe('recentQuarters', () => {
  it('starts at the last complete quarter and walks back across years', () => {
    const quarters = recentQuarters('2026-02-14', 3);
    expect(quarters.map((quarter) => [quarter.key, quarter.from, quarter.to])).toEqual([
      ['2025-Q4', '2025-10', '2025-12'],
      ['2025-Q3', '2025-07', '2025-09'],
      ['2025-Q2', '2025-04', '2025-06'],
    ]);
  });
});
