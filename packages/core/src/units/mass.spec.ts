import { DomainError } from '../errors/domain-error';
import { kgToPounds, KG_PER_POUND, Mass, poundsToKg, toKilograms } from './mass';

const DECIMALS = 10;

describe('mass units', () => {
  it('uses the exact avoirdupois pound', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 lb = 0.453 592 37 kg exactly (International Yard and Pound Agreement, 1959)
    expect(KG_PER_POUND).toBe(0.45359237);
  });

  it('converts pounds to kilograms', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 lb = 0.453 592 37 kg exactly (International Yard and Pound Agreement, 1959)
    expect(poundsToKg(1)).toBeCloseTo(0.45359237, DECIMALS);
    expect(poundsToKg(100)).toBeCloseTo(45.359237, DECIMALS);
    // Source: NIST Handbook 44 Appendix C: 1 lb = 16 oz avoirdupois, 1 oz = 28.349 523 125 g exactly
    expect(poundsToKg(1 / 16) * 1000).toBeCloseTo(28.349523125, DECIMALS);
  });

  it('converts kilograms to pounds', () => {
    // from memory: 1 kg ≈ 2.2046 lb
    expect(kgToPounds(1)).toBeCloseTo(2.2046, 4);
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 lb = 0.453 592 37 kg exactly (International Yard and Pound Agreement, 1959)
    expect(kgToPounds(0.45359237)).toBeCloseTo(1, DECIMALS);
    expect(kgToPounds(45.359237)).toBeCloseTo(100, DECIMALS);
  });

  it('round-trips without drift', () => {
    for (const kg of [0.05, 0.1, 1, 12.5, 250]) {
      expect(poundsToKg(kgToPounds(kg))).toBeCloseTo(kg, DECIMALS);
    }
  });

  it('reads a Mass in either unit as kilograms', () => {
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 lb = 0.453 592 37 kg exactly (International Yard and Pound Agreement, 1959)
    expect(toKilograms({ value: 10, unit: 'lb' })).toBeCloseTo(4.5359237, DECIMALS);
    expect(toKilograms({ value: 3.2, unit: 'kg' })).toBe(3.2);
  });

  it('rejects bad input, naming the argument', () => {
    expect(() => poundsToKg(Number.NaN)).toThrow('pounds must be a finite number; got NaN.');
    expect(() => kgToPounds(-Infinity)).toThrow('kg must be a finite number; got -Infinity.');
    const stones = { value: 2, unit: 'st' } as unknown as Mass;
    expect(() => toKilograms(stones, 'yarnDonated')).toThrow(DomainError);
    expect(() => toKilograms(stones, 'yarnDonated')).toThrow(
      "yarnDonated.unit must be 'kg' or 'lb'; got \"st\".",
    );
  });
});
