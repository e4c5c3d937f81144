import { changeBetween } from '@tallyloom/core';
import { formatFigure } from '@/lib/format';

export interface FigureChange {
  direction: 'up' | 'down' | 'same' | 'new' | 'none';
  /** Rounded to one decimal, without sign; null when there is nothing to divide by. */
  percent: number | null;
}

/**
 * The change on the previous period, as a card shows it. A rise from 0 has no percent to speak
 * of: it is "new", not "+∞ %"; without a previous period there is nothing to compare.
 */
export function figureChange(current: number, previous: number | null | undefined): FigureChange {
  if (previous === null || previous === undefined) return { direction: 'none', percent: null };
  const change = changeBetween(current, previous);
  if (change.percent === null) {
    return change.direction === 'same'
      ? { direction: 'same', percent: 0 }
      : { direction: change.direction === 'up' ? 'new' : 'down', percent: null };
  }
  return {
    direction: change.direction,
    percent: Math.round(Math.abs(change.percent) * 10) / 10,
  };
}

/** The change as shown: "▲ 12.5%", "▼ 3%", "No change", "New", or "—". */
export function changeMark(change: FigureChange): string {
  switch (change.direction) {
    case 'up':
      return `▲ ${formatFigure(change.percent ?? 0)}%`;
    case 'down':
      return change.percent === null ? '▼' : `▼ ${formatFigure(change.percent)}%`;
    case 'same':
      return 'No change';
    case 'new':
      return 'New';
    default:
      return '—';
  }
}

/** The change in words for screen readers, which would read "▲" as "black up-pointing triangle". */
export function changeWords(change: FigureChange, previousLabel: string | null): string {
  const against = previousLabel ?? 'the previous period';
  switch (change.direction) {
    case 'up':
      return `up ${formatFigure(change.percent ?? 0)} percent on ${against}`;
    case 'down':
      return change.percent === null
        ? `down on ${against}`
        : `down ${formatFigure(change.percent)} percent on ${against}`;
    case 'same':
      return `no change on ${against}`;
    case 'new':
      return `none in ${against}`;
    default:
      return 'no previous period to compare with';
  }
}
