// wcag-contrast ships no types; only the functions the tests call are declared.
declare module 'wcag-contrast' {
  /** Contrast ratio (1–21) between two hex colours. */
  export function hex(a: string, b: string): number;
  /** "AAA", "AA", "AA Large" or "Fail" for a contrast ratio. */
  export function score(contrast: number): string;
}
