import { DomainError } from '../errors/domain-error';
import { requireFiniteNumber } from '../errors/require';

// The avoirdupois pound, exact by definition since the International Yard and Pound Agreement
// of 1959 (NIST Handbook 44 Appendix C; NIST SP 811 (2008) Appendix B). Yarn donations are
// weighed in either unit.
export const KG_PER_POUND = 0.45359237;

export type MassUnit = 'kg' | 'lb';

export interface Mass {
  value: number;
  unit: MassUnit;
}

export function poundsToKg(pounds: number): number {
  return requireFiniteNumber('pounds', pounds) * KG_PER_POUND;
}

export function kgToPounds(kg: number): number {
  return requireFiniteNumber('kg', kg) / KG_PER_POUND;
}

export function toKilograms(mass: Mass, argument = 'mass'): number {
  switch (mass.unit) {
    case 'kg':
      return requireFiniteNumber(`${argument}.value`, mass.value);
    case 'lb':
      return requireFiniteNumber(`${argument}.value`, mass.value) * KG_PER_POUND;
    default:
      throw new DomainError(
        `${argument}.unit`,
        `${argument}.unit must be 'kg' or 'lb'; got ${JSON.stringify((mass as { unit: unknown }).unit)}.`,
      );
  }
}
