import { describe, expect, it } from 'vitest';
import { yarnInWords } from './yarn';

describe('yarnInWords', () => {
  it('converts pounds to kilograms exactly', () => {
    // Source: 1959 international yard and pound agreement, 1 lb = 0.45359237 kg exactly;
    // 12 × 0.45359237 = 5.44310844.
    expect(yarnInWords(12, 'lb')).toBe('12 lb = 5.44310844 kg (1 lb = 0.45359237 kg exactly)');
  });

  it('rounds kilograms to pounds to two places', () => {
    // 4.5 / 0.45359237 = 9.9208...
    expect(yarnInWords(4.5, 'kg')).toBe('4.5 kg ≈ 9.92 lb');
  });
});
