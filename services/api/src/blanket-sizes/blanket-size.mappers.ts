import { finishedSize, panelsPerBlanket } from '@tallyloom/core';
import type { BlanketSizeDto } from './dto/blanket-size.dto';
import type { BlanketSize } from './models/blanket-size.model';

const twoDecimals = (value: number) => Math.round(value * 100) / 100;

export function toBlanketSizeDto(size: BlanketSize): BlanketSizeDto {
  const grid = { columns: size.columns, rows: size.rows };
  const finished = finishedSize(grid);
  return {
    id: size.id,
    name: size.name,
    columns: size.columns,
    rows: size.rows,
    panels: panelsPerBlanket(grid),
    widthIn: twoDecimals(finished.widthIn),
    heightIn: twoDecimals(finished.heightIn),
    widthCm: twoDecimals(finished.widthCm),
    heightCm: twoDecimals(finished.heightCm),
    active: size.active,
    sortOrder: size.sortOrder,
    sourceNote: size.sourceNote ?? null,
  };
}

export function auditableSize(size: BlanketSize): Record<string, unknown> {
  return {
    name: size.name,
    columns: size.columns,
    rows: size.rows,
    active: size.active,
    sortOrder: size.sortOrder,
    sourceNote: size.sourceNote ?? null,
  };
}
