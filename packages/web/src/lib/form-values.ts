/**
 * Number fields are kept as typed (text) while a form is open, so a half-typed "0." or an empty
 * box is never forced into a number; these read them when the form is checked or sent.
 */

/** "12" → 12; anything that is not a whole number from `min` to `max` → undefined. */
export function parseWholeNumber(text: string, min: number, max: number): number | undefined {
  const trimmed = text.trim();
  if (!/^-?\d+$/.test(trimmed)) return undefined;
  const value = Number(trimmed);
  return value >= min && value <= max ? value : undefined;
}

/** "0.25" → 0.25, with at most `decimals` places and within the bounds; else undefined. */
export function parseDecimal(
  text: string,
  { min, max, decimals }: { min: number; max: number; decimals: number },
): number | undefined {
  const trimmed = text.trim();
  const pattern = new RegExp(`^\\d+(\\.\\d{0,${decimals}})?$|^\\.\\d{1,${decimals}}$`);
  if (!pattern.test(trimmed)) return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) && value >= min && value <= max ? value : undefined;
}
