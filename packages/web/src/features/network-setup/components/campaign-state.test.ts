import { describe, expect, it } from 'vitest';
import { campaignState } from './campaign-state';

const deepWinter = { startsOn: '2025-11-01', endsOn: '2026-02-28' };

describe('campaignState', () => {
  it('is upcoming before the first day', () => {
    expect(campaignState(deepWinter, new Date(2025, 9, 31, 23, 59))).toBe('upcoming');
  });

  it('is running from the first day to the last, both included', () => {
    expect(campaignState(deepWinter, new Date(2025, 10, 1, 0, 0))).toBe('running');
    expect(campaignState(deepWinter, new Date(2026, 0, 15, 12, 0))).toBe('running');
    expect(campaignState(deepWinter, new Date(2026, 1, 28, 23, 59))).toBe('running');
  });

  it('has ended from the day after the last', () => {
    expect(campaignState(deepWinter, new Date(2026, 2, 1, 0, 0))).toBe('ended');
  });
});
