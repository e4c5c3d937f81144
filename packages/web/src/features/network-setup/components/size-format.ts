import type { BlanketGrid, FinishedSize } from '@tallyloom/core';

const inches = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });
// One decimal, always shown, so the column reads evenly: 160.0, not 160.
const centimetres = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 1,
  maximumFractionDigits: 1,
});

/** { columns: 7, rows: 7 } → "7 × 7" (across × down). */
export function formatGrid(grid: BlanketGrid): string {
  return `${grid.columns} × ${grid.rows}`;
}

/** → "49 × 63 in (124.5 × 160.0 cm)": width × height, inches first. */
export function formatFinishedSize(size: FinishedSize): string {
  return `${inches.format(size.widthIn)} × ${inches.format(size.heightIn)} in (${centimetres.format(size.widthCm)} × ${centimetres.format(size.heightCm)} cm)`;
}
