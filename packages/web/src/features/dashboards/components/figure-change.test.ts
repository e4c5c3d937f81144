import { describe, expect, it } from 'vitest';
import { changeMark, changeWords, figureChange } from './figure-change';

describe('figureChange', () => {
  it('gives the rise or fall as a percent of the previous period, to one decimal', () => {
    expect(figureChange(1_250, 1_000)).toEqual({ direction: 'up', percent: 25 });
    expect(figureChange(40, 50)).toEqual({ direction: 'down', percent: 20 });
    // 2 of 3 = 66.666…% → 66.7.
    expect(figureChange(1, 3)).toEqual({ direction: 'down', percent: 66.7 });
  });

  it('has no percent from nothing, and nothing to say without a previous period', () => {
    expect(figureChange(38, 0)).toEqual({ direction: 'new', percent: null });
    expect(figureChange(0, 0)).toEqual({ direction: 'same', percent: 0 });
    expect(figureChange(5, null)).toEqual({ direction: 'none', percent: null });
  });

  it('shows an arrow and says the same in words', () => {
    const up = figureChange(1_250, 1_000);
    expect(changeMark(up)).toBe('▲ 25%');
    expect(changeWords(up, 'Feb 2026')).toBe('up 25 percent on Feb 2026');
    const down = figureChange(1, 3);
    expect(changeMark(down)).toBe('▼ 66.7%');
    expect(changeWords(down, null)).toBe('down 66.7 percent on the previous period');
    expect(changeMark(figureChange(5, undefined))).toBe('—');
  });
});
