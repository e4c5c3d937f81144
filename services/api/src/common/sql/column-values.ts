/*
 * Column values as raw SQL reads return them: the driver gives JSON as text or parsed, and
 * DATE / DATETIME as a Date or text depending on the connection's type casting.
 */

/** A JSON column, parsed if it came as text. */
export function jsonColumn<T>(value: unknown): T {
  return (typeof value === 'string' ? JSON.parse(value) : value) as T;
}

const SQL_UTC_TIMESTAMP = /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}$/;

/** A DATETIME read at the connection's UTC time zone, as an ISO timestamp. */
export function isoTimestamp(value: unknown): string {
  if (value instanceof Date) return value.toISOString();
  const text = String(value);
  // The reports' DATE_FORMAT text: rewritten, not parsed (a full rebuild reads tens of thousands).
  if (SQL_UTC_TIMESTAMP.test(text)) return `${text.slice(0, 10)}T${text.slice(11)}.000Z`;
  return new Date(
    /[zZ]|[+-]\d\d:?\d\d$/.test(text) ? text : `${text.replace(' ', 'T')}Z`,
  ).toISOString();
}

/** A DATE column as YYYY-MM-DD. */
export function isoDate(value: unknown): string {
  return value instanceof Date ? value.toISOString().slice(0, 10) : String(value).slice(0, 10);
}

/** A nullable column read with `read`, null staying null. */
export function orNull<T>(value: unknown, read: (value: unknown) => T): T | null {
  return value === null || value === undefined ? null : read(value);
}
