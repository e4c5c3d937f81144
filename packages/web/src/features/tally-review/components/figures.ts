// Counts are whole numbers; volunteer hours carry up to two decimals. One locale for both.
const figureFormat = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

/** 1234 → "1,234"; 12.5 → "12.5". */
export function formatFigure(value: number): string {
  return figureFormat.format(value);
}
