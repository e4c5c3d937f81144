import { finishedSize } from '@tallyloom/core';
import { describe, expect, it } from 'vitest';
import { formatFinishedSize, formatGrid } from './size-format';

describe('blanket size formats', () => {
  it('writes the grid across × down', () => {
    expect(formatGrid({ columns: 5, rows: 4 })).toBe('5 × 4');
  });

  it('writes the finished size in inches with centimetres to one decimal', () => {
    // 7 panels of 7 × 9 in each way; 1 in = 2.54 cm exactly (NIST SP 811, Appendix B).
    expect(formatFinishedSize(finishedSize({ columns: 7, rows: 7 }))).toBe(
      '49 × 63 in (124.5 × 160.0 cm)',
    );
  });
});
