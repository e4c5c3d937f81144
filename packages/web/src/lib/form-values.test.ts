import { describe, expect, it } from 'vitest';
import { parseDecimal, parseWholeNumber } from './form-values';

describe('parseWholeNumber', () => {
  it('reads a whole number within the bounds', () => {
    expect(parseWholeNumber(' 28 ', 1, 28)).toBe(28);
    expect(parseWholeNumber('1', 1, 28)).toBe(1);
  });

  it('refuses text, decimals and values outside the bounds', () => {
    expect(parseWholeNumber('', 1, 28)).toBeUndefined();
    expect(parseWholeNumber('7.5', 1, 28)).toBeUndefined();
    expect(parseWholeNumber('29', 1, 28)).toBeUndefined();
    expect(parseWholeNumber('0', 1, 28)).toBeUndefined();
    expect(parseWholeNumber('ten', 1, 28)).toBeUndefined();
  });
});

describe('parseDecimal', () => {
  const tolerance = { min: 0, max: 3, decimals: 2 };

  it('reads up to the allowed decimals', () => {
    expect(parseDecimal('0.5', tolerance)).toBe(0.5);
    expect(parseDecimal('.25', tolerance)).toBe(0.25);
    expect(parseDecimal('3', tolerance)).toBe(3);
  });

  it('refuses more decimals, negatives and values past the bounds', () => {
    expect(parseDecimal('0.125', tolerance)).toBeUndefined();
    expect(parseDecimal('-1', tolerance)).toBeUndefined();
    expect(parseDecimal('3.01', tolerance)).toBeUndefined();
    expect(parseDecimal('', tolerance)).toBeUndefined();
  });
});
