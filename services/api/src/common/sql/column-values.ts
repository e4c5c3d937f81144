/*
 * Column values as raw SQL reads return them: the driver gives JSON as text or parsed, and
 * DATE / DATETIME as a Date or text depending on the connection's type casting.
 */

/** A JSON column, parsed if it came as text. */
export function jsonColumn<T>(value: unknown): T {
  return (typeof value === 'string' ? JSON.parse(value) : value) as T;
}

/** A DATETIME read at the connection's UTC time zone, as an ISO timestamp. */
export function isoTimestamp(value: unknown): string {
  if (value instanceof Date) return value.toISOString();
  const text = String(value);
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
