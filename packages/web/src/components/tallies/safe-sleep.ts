/** BRIEF §8: shown where baby blankets are handed out. */
export const SAFE_SLEEP_CAUTION =
  "Follow safe-sleep guidance for infants: no loose blankets in a sleeping infant's cot; the partner agency's own rules come first.";

/** Baby and infant sizes get the safe-sleep caution. */
export function isBabySize(name: string): boolean {
  return /\bbaby\b|\binfant\b/i.test(name);
}
