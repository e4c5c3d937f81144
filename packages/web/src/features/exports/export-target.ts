import type {
  ExportFiltersByTable,
  ExportFormat,
  ExportTable,
  TableExportRequest,
} from '@tallyloom/core';

/** A table and the filters it shows now: what "Export" sends, whatever the format. */
export type TableExportTarget = {
  [T in ExportTable]: { table: T; filters: ExportFiltersByTable[T] };
}[ExportTable];

/** The three choices of the Export menu. */
export interface ExportChoice {
  format: ExportFormat;
  bom: boolean;
  label: string;
}

export const EXPORT_CHOICES: readonly ExportChoice[] = [
  { format: 'xlsx', bom: false, label: 'Spreadsheet (.xlsx)' },
  { format: 'csv', bom: false, label: 'CSV' },
  { format: 'csv', bom: true, label: 'CSV for spreadsheet programs (with BOM)' },
];

export function tableExportRequest(
  target: TableExportTarget,
  choice: ExportChoice,
): TableExportRequest {
  return {
    table: target.table,
    format: choice.format,
    ...(choice.format === 'csv' ? { bom: choice.bom } : {}),
    filters: target.filters,
  } as TableExportRequest;
}
