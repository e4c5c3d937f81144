import { BadRequestException } from '@nestjs/common';
import { traceTargetOf } from './trace-reference';

/** The field a 400 names, or what was thrown instead. */
function fieldOf(reference: string): string {
  try {
    traceTargetOf(reference, 7);
  } catch (error) {
    if (!(error instanceof BadRequestException)) throw error;
    const body = error.getResponse() as { fields: Array<{ field: string }> };
    return body.fields.map((problem) => problem.field).join(',');
  }
  return 'accepted';
}

describe('traceTargetOf', () => {
  it('reads a network fiscal year with the fiscal year start from the settings', () => {
    const target = traceTargetOf('network:FY2026', 7);
    expect(target).toMatchObject({ reference: 'network:FY2026', scope: 'network', scopeId: null });
    expect(target.period).toMatchObject({ kind: 'fiscal_year', from: '2025-07', to: '2026-06' });
  });

  it('reads a region quarter and a chapter month', () => {
    expect(traceTargetOf('region:3:2026-Q1', 7)).toMatchObject({
      scope: 'region',
      scopeId: 3,
      period: { kind: 'quarter', from: '2026-01', to: '2026-03' },
    });
    expect(traceTargetOf('chapter:12:2025-07', 7)).toMatchObject({
      scope: 'chapter',
      scopeId: 12,
      period: { kind: 'month', key: '2025-07' },
    });
  });

  it.each([
    ['a custom range', 'network:2025-07..2026-06'],
    ['an unknown scope', 'galaxy:1:2026-01'],
    ['a region without an id', 'region:2026-Q1'],
    ['a network with an id', 'network:4:2026-01'],
    ['region id 0', 'region:0:2026-01'],
    ['a thirteenth month', 'chapter:1:2026-13'],
    ['a two-digit fiscal year', 'network:FY26'],
  ])('refuses %s with a 400 naming reference', (_, reference) => {
    expect(fieldOf(reference)).toBe('reference');
  });
});
