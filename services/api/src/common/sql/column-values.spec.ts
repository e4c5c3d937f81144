import { isoTimestamp } from './column-values';

describe('isoTimestamp', () => {
  // Source: ECMA-262, Date Time String Format (§21.4.1.32): Date#toISOString gives
  // YYYY-MM-DDTHH:mm:ss.sssZ in UTC, the reference the rewritten SQL text must equal.
  it.each(['2026-03-10 00:00:00', '2024-02-29 23:59:59', '1999-12-31 12:34:56'])(
    'rewrites the SQL text %s exactly as Date would read it in UTC',
    (text) => {
      expect(isoTimestamp(text)).toBe(new Date(`${text.replace(' ', 'T')}Z`).toISOString());
    },
  );

  it('reads a Date, an ISO timestamp with an offset, and fractional seconds through Date', () => {
    expect(isoTimestamp(new Date(Date.UTC(2026, 2, 10, 8, 5, 0)))).toBe('2026-03-10T08:05:00.000Z');
    expect(isoTimestamp('2026-03-10T10:05:00+02:00')).toBe('2026-03-10T08:05:00.000Z');
    expect(isoTimestamp('2026-03-10 08:05:00.250')).toBe('2026-03-10T08:05:00.250Z');
  });
});
