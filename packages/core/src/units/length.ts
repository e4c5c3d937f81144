import { DomainError } from '../errors/domain-error';
import { requireFiniteNumber } from '../errors/require';

// Exact by definition since the International Yard and Pound Agreement of 1959
// (NIST Handbook 44 Appendix C; NIST SP 811 (2008) Appendix B).
export const CM_PER_INCH = 2.54;

export type LengthUnit = 'in' | 'cm';

export interface Length {
  value: number;
  unit: LengthUnit;
}

// The converters do not round: rounding at every step would add up in totals; callers format.

export function inchesToCm(inches: number): number {
  return requireFiniteNumber('inches', inches) * CM_PER_INCH;
}

export function cmToInches(cm: number): number {
  return requireFiniteNumber('cm', cm) / CM_PER_INCH;
}

export function toInches(length: Length, argument = 'length'): number {
  switch (length.unit) {
    case 'in':
      return requireFiniteNumber(`${argument}.value`, length.value);
    case 'cm':
      return requireFiniteNumber(`${argument}.value`, length.value) / CM_PER_INCH;
    default:
      throw new DomainError(
        `${argument}.unit`,
        `${argument}.unit must be 'in' or 'cm'; got ${JSON.stringify((length as { unit: unknown }).unit)}.`,
      );
  }
}
