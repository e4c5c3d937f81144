import { DomainError } from '../errors/domain-error';
import { CM_PER_INCH, cmToInches, inchesToCm, Length, toInches } from './length';

// Floating point leaves the last bit loose (49 × 2.54 = 124.46000000000001); 10 decimals is far
// below anything a tape measure reads.
const DECIMALS = 10;

describe('length units', () => {
  it('uses the exact international inch', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly (International Yard and Pound Agreement, 1959)
    expect(CM_PER_INCH).toBe(2.54);
  });

  it('converts inches to centimetres', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly (International Yard and Pound Agreement, 1959)
    expect(inchesToCm(1)).toBeCloseTo(2.54, DECIMALS);
    expect(inchesToCm(7)).toBeCloseTo(17.78, DECIMALS);
    expect(inchesToCm(9)).toBeCloseTo(22.86, DECIMALS);
    expect(inchesToCm(36)).toBeCloseTo(91.44, DECIMALS);
    expect(inchesToCm(0)).toBe(0);
  });

  it('gives one yard (36 in) as 91.44 cm', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 yd = 0.9144 m exactly (International Yard and Pound Agreement, 1959)
    const inchesPerYard = 36;
    expect(inchesToCm(inchesPerYard)).toBeCloseTo(91.44, DECIMALS);
  });

  it('converts centimetres to inches', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly (International Yard and Pound Agreement, 1959)
    expect(cmToInches(2.54)).toBeCloseTo(1, DECIMALS);
    expect(cmToInches(17.78)).toBeCloseTo(7, DECIMALS);
    expect(cmToInches(22.86)).toBeCloseTo(9, DECIMALS);
    expect(cmToInches(91.44)).toBeCloseTo(36, DECIMALS);
    // 100 cm / 2.54 = 39.370 078 7… in, worked by hand from the exact factor above.
    expect(cmToInches(100)).toBeCloseTo(39.3700787, 7);
  });

  it('round-trips without drift', () => {
    for (const inches of [0.5, 7, 9, 36, 49, 63, 123.25]) {
      expect(cmToInches(inchesToCm(inches))).toBeCloseTo(inches, DECIMALS);
    }
  });

  it('reads a Length in either unit as inches', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly (International Yard and Pound Agreement, 1959)
    expect(toInches({ value: 22.86, unit: 'cm' })).toBeCloseTo(9, DECIMALS);
    expect(toInches({ value: 7, unit: 'in' })).toBe(7);
  });

  it('rejects values that are not finite numbers, naming the argument', () => {
    expect(() => inchesToCm(Number.NaN)).toThrow('inches must be a finite number; got NaN.');
    expect(() => cmToInches(Infinity)).toThrow('cm must be a finite number; got Infinity.');
    expect(() => toInches({ value: Number.NaN, unit: 'cm' })).toThrow(
      'length.value must be a finite number',
    );
  });

  it('rejects an unknown unit, naming the argument', () => {
    const millimetres = { value: 178, unit: 'mm' } as unknown as Length;
    expect(() => toInches(millimetres, 'width')).toThrow(DomainError);
    expect(() => toInches(millimetres, 'width')).toThrow(
      "width.unit must be 'in' or 'cm'; got \"mm\".",
    );
  });
});
