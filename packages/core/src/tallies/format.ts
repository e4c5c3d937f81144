// Numbers in check messages read like the screens: thousands separators, at most 2 decimals.
const NUMBER = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

export function formatNumber(value: number): string {
  return NUMBER.format(value).replace('-', '−');
}

/** '+10' or '−10': a difference with its sign. */
export function formatDifference(value: number): string {
  return value > 0 ? `+${formatNumber(value)}` : formatNumber(value);
}

export function plural(count: number, one: string, many: string): string {
  return `${formatNumber(count)} ${count === 1 ? one : many}`;
}

/** True for a number that arithmetic can use; bad input is reported by the value rules. */
export function isUsable(value: unknown): value is number {
  return typeof value === 'number' && Number.isFinite(value);
}
