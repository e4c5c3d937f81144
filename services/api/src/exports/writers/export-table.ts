/**
 * What a table export writes, independent of the file format, so the writers run outside Nest
 * (the benchmark feeds them rows from memory).
 */

/** text as is; id a reference number (no separators); count a whole number; date 'YYYY-MM-DD'; timestamp an ISO instant. */
export type ColumnKind = 'text' | 'id' | 'count' | 'decimal' | 'date' | 'timestamp';

export type ExportCell = string | number | null;

export interface ExportColumn {
  /** Plain words with the unit, e.g. 'Panels accepted (panels)'. */
  header: string;
  key: string;
  kind: ColumnKind;
  /** In characters, as spreadsheet programs measure column widths. */
  width: number;
  /** 'sum': a totals row under the data adds this column up. */
  total?: 'sum';
}

export type ExportRow = Record<string, ExportCell>;

/** One row as its cells in the order of the table's columns: what the writers take. */
export type ExportCells = readonly ExportCell[];

/** An object row's cells in the order of `columns` (a missing key is an empty cell). */
export function cellsOf(columns: readonly ExportColumn[], row: ExportRow): ExportCell[] {
  return columns.map((column) => row[column.key] ?? null);
}

export interface ExportTableSpec {
  /** The first sheet's name; later sheets are 'Name (2)', 'Name (3)', … */
  sheetName: string;
  /** The workbook's document title. */
  title: string;
  columns: readonly ExportColumn[];
}

export interface WriteOutcome {
  rows: number;
  sheets: number;
}

/** Called after each batch with the data rows written so far. */
export type RowsWritten = (rows: number) => Promise<void> | void;
