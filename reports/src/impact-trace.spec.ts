import { parseTraceReference, traceReference } from './impact-trace';

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
    expect(() => traceReference('network', null, '2026')).toThrow(/period key/);
    expect(parseTraceReference('region:x:FY2026')).toBeNull();
    expect(parseTraceReference('network:FY26')).toBeNull();
  });
});
