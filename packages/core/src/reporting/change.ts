import { requireFiniteNumber } from '../errors/require';

export interface Change {
  absolute: number;
  /** Relative change in percent (25 = +25 %); null when the previous value is 0. */
  percent: number | null;
  direction: 'up' | 'down' | 'same';
}

/** "Change vs the previous period" on a KPI card. */
export function changeBetween(current: number, previous: number): Change {
  requireFiniteNumber('current', current);
  requireFiniteNumber('previous', previous);
  const absolute = current - previous;
  return {
    absolute,
    // A percentage of nothing has no meaning: the card shows the absolute change alone.
    percent: previous === 0 ? null : (absolute / Math.abs(previous)) * 100,
    direction: absolute > 0 ? 'up' : absolute < 0 ? 'down' : 'same',
  };
}
