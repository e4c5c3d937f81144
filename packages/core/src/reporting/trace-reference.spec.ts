import {
  parseTraceReference,
  traceableReference,
  tracePath,
  traceReference,
} from './trace-reference';

describe('trace references', () => {
  it.each([
    ['network', null, 'FY2026', 'network:FY2026'],
    ['region', 3, '2026-Q1', 'region:3:2026-Q1'],
    ['chapter', 12, '2025-07', 'chapter:12:2025-07'],
    ['region', 4, '2025-01..2025-06', 'region:4:2025-01..2025-06'],
  ] as const)('%s %s %s → %s and back', (scope, id, key, expected) => {
    expect(traceReference(scope, id, key)).toBe(expected);
    expect(parseTraceReference(expected)).toEqual({ scope, scopeId: id, periodKey: key });
  });

  it('refuses a missing id or a period key it does not know', () => {
    expect(() => traceReference('region', null, 'FY2026')).toThrow(/positive id/);
    expect(() => traceReference('chapter', 0, '2026-01')).toThrow(/positive id/);
    expect(() => traceReference('network', null, '2026')).toThrow(/period key/);
    expect(parseTraceReference('region:x:FY2026')).toBeNull();
    expect(parseTraceReference('network:FY26')).toBeNull();
    expect(parseTraceReference('network:3:FY2026')).toBeNull();
    expect(parseTraceReference('campaign:3:FY2026')).toBeNull();
  });

  it('gives stored periods a reference and a custom range none', () => {
    expect(traceableReference('region', 2, { kind: 'quarter', key: '2026-Q1' })).toBe(
      'region:2:2026-Q1',
    );
    expect(traceableReference('network', null, { kind: 'custom', key: '2025-01..2025-03' })).toBe(
      null,
    );
  });
});

describe('tracePath', () => {
  it('matches the web route /trace/:reference with the measure in the query', () => {
    expect(tracePath('region:3:2026-Q1')).toBe('/trace/region%3A3%3A2026-Q1');
    expect(tracePath('network:FY2026', 'blanketsGiven')).toBe(
      '/trace/network%3AFY2026?measure=blanketsGiven',
    );
  });
});
