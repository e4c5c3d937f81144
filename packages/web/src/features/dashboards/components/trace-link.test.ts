import type { Period } from '@tallyloom/core';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { traceHref } from './trace-link';

const quarter: Period = {
  kind: 'quarter',
  key: '2026-Q1',
  from: '2026-01',
  to: '2026-03',
  label: 'Q1 2026',
};

describe('traceHref', () => {
  it('leads roles that may trace to the figure of that scope, period and measure', () => {
    expect(
      traceHref(
        'auditor',
        { scope: 'region', scopeId: 3, period: quarter } as const,
        'blanketsGiven',
      ),
    ).toBe(paths.trace.getHref('region:3:2026-Q1', 'blanketsGiven'));
    expect(
      traceHref(
        'chapter_lead',
        { scope: 'chapter', scopeId: 12, period: { ...quarter, kind: 'month', key: '2026-02' } },
        'panelsAccepted',
      ),
    ).toBe(paths.trace.getHref('chapter:12:2026-02', 'panelsAccepted'));
  });

  it('gives grant writers and custom ranges no trace', () => {
    const network = { scope: 'network', scopeId: null, period: quarter } as const;
    expect(traceHref('grant_writer', network, 'blanketsGiven')).toBeNull();
    expect(
      traceHref(
        'auditor',
        { ...network, period: { ...quarter, kind: 'custom', key: '2026-01..2026-02' } },
        'blanketsGiven',
      ),
    ).toBeNull();
  });
});
