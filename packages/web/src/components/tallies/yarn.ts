import { KG_PER_POUND, kgToPounds, poundsToKg } from '@tallyloom/core';

// Enough places for the exact pound (0.45359237 kg) times a weight with 3 decimals.
const exact = new Intl.NumberFormat('en-US', { maximumFractionDigits: 11 });
const rounded = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

/** "12 lb = 5.44310844 kg", exact (1 lb is 0.45359237 kg by definition); kg → lb is rounded. */
export function yarnInWords(value: number, unit: 'kg' | 'lb'): string {
  if (unit === 'lb') {
    return `${exact.format(value)} lb = ${exact.format(poundsToKg(value))} kg (1 lb = ${exact.format(KG_PER_POUND)} kg exactly)`;
  }
  return `${exact.format(value)} kg ≈ ${rounded.format(kgToPounds(value))} lb`;
}
