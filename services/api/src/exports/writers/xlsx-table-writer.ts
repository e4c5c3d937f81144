import * as ExcelJS from 'exceljs';
import type {
  ExportColumn,
  ExportRow,
  ExportTableSpec,
  RowsWritten,
  WriteOutcome,
} from './export-table';

/** Rows per worksheet, the header included. */
// Source: Microsoft, "Excel specifications and limits": 1,048,576 rows by 16,384 columns.
export const XLSX_MAX_ROWS = 1_048_576;

/** Excel refuses sheet names longer than this. */
// Source: Microsoft, "Excel specifications and limits" (worksheet name: 31 characters).
const MAX_SHEET_NAME = 31;

const NUMBER_FORMATS: Record<ExportColumn['kind'], string | undefined> = {
  text: undefined,
  id: '0',
  count: '#,##0',
  decimal: '#,##0.00',
  date: 'yyyy-mm-dd',
  timestamp: 'yyyy-mm-dd hh:mm',
};

export interface XlsxWriterOptions {
  /** Rows per sheet including the header (and the totals row, when there is one). */
  rowLimit?: number;
  /** The document's creation time (defaults to now). */
  created?: Date;
}

/**
 * Writes one table with exceljs's streaming writer: each row is committed (flushed to the zip
 * stream) as soon as it is added, so memory stays flat whatever the row count.
 */
export class XlsxTableWriter {
  private readonly rowLimit: number;

  constructor(private readonly options: XlsxWriterOptions = {}) {
    this.rowLimit = options.rowLimit ?? XLSX_MAX_ROWS;
  }

  async write(
    filePath: string,
    spec: ExportTableSpec,
    batches: AsyncIterable<readonly ExportRow[]>,
    onRows?: RowsWritten,
  ): Promise<WriteOutcome> {
    const hasTotals = spec.columns.some((column) => column.total === 'sum');
    // Header row, and the totals row under the data, share the sheet's rows.
    const dataRowsPerSheet = this.rowLimit - 1 - (hasTotals ? 1 : 0);
    if (dataRowsPerSheet < 1)
      throw new RangeError(`a row limit of ${this.rowLimit} leaves no data rows`);

    const workbook = new ExcelJS.stream.xlsx.WorkbookWriter({
      filename: filePath,
      useStyles: true,
      useSharedStrings: false,
    });
    workbook.creator = 'Tallyloom';
    workbook.lastModifiedBy = 'Tallyloom';
    workbook.title = spec.title;
    workbook.created = this.options.created ?? new Date();
    workbook.modified = workbook.created;

    let sheet: SheetState | null = null;
    let sheets = 0;
    let rows = 0;
    const open = (): SheetState => {
      sheets += 1;
      return startSheet(workbook, spec, sheets);
    };

    for await (const batch of batches) {
      for (const row of batch) {
        if (sheet === null || sheet.dataRows === dataRowsPerSheet) {
          if (sheet) finishSheet(sheet, spec);
          sheet = open();
        }
        addDataRow(sheet, spec.columns, row);
        rows += 1;
      }
      if (onRows) await onRows(rows);
    }
    // An empty table still gets its sheet with the header, so the file opens with its columns.
    finishSheet(sheet ?? open(), spec);
    await workbook.commit();
    return { rows, sheets };
  }
}

interface SheetState {
  worksheet: ExcelJS.Worksheet;
  dataRows: number;
  /** Running sums of the columns with totals, for the cached results of the total formulas. */
  sums: number[];
}

export function sheetNameOf(base: string, index: number): string {
  const suffix = index === 1 ? '' : ` (${index})`;
  return `${base.slice(0, MAX_SHEET_NAME - suffix.length)}${suffix}`;
}

function startSheet(
  workbook: ExcelJS.stream.xlsx.WorkbookWriter,
  spec: ExportTableSpec,
  index: number,
): SheetState {
  const worksheet = workbook.addWorksheet(sheetNameOf(spec.sheetName, index), {
    views: [{ state: 'frozen', ySplit: 1, xSplit: 0 }],
  });
  worksheet.columns = spec.columns.map((column) => ({
    key: column.key,
    width: column.width,
    style: NUMBER_FORMATS[column.kind] ? { numFmt: NUMBER_FORMATS[column.kind] } : {},
  }));
  const header = worksheet.addRow(spec.columns.map((column) => column.header));
  header.font = { bold: true };
  header.commit();
  return { worksheet, dataRows: 0, sums: spec.columns.map(() => 0) };
}

function addDataRow(sheet: SheetState, columns: readonly ExportColumn[], row: ExportRow): void {
  const values = columns.map((column, index) => {
    const value = row[column.key] ?? null;
    if (column.total === 'sum' && typeof value === 'number') sheet.sums[index] += value;
    return cellValue(column, value);
  });
  sheet.worksheet.addRow(values).commit();
  sheet.dataRows += 1;
}

function cellValue(column: ExportColumn, value: ExportRow[string]): ExcelJS.CellValue {
  if (value === null) return null;
  // Dates as real dates (UTC midnight), so sorting and date formulas work in the sheet.
  if (column.kind === 'date' && typeof value === 'string') return new Date(`${value}T00:00:00Z`);
  if (column.kind === 'timestamp' && typeof value === 'string') return new Date(value);
  return value;
}

/** Adds the totals row and the autofilter, then writes the sheet out. */
function finishSheet(sheet: SheetState, spec: ExportTableSpec): void {
  const { worksheet } = sheet;
  const lastDataRow = 1 + sheet.dataRows;
  const lastColumn = columnLetter(spec.columns.length);
  worksheet.autoFilter = `A1:${lastColumn}${lastDataRow}`;
  if (spec.columns.some((column) => column.total === 'sum')) {
    const totals = worksheet.addRow(
      spec.columns.map((column, index): ExcelJS.CellValue => {
        if (index === 0 && column.total !== 'sum') return 'Total';
        if (column.total !== 'sum') return null;
        const letter = columnLetter(index + 1);
        // SUBTOTAL 109 sums only the rows the autofilter leaves visible. The result is cached in
        // the file, so readers that do not recalculate still show the number.
        // Source: Microsoft, "SUBTOTAL function" (function_num 109 = SUM, ignoring hidden rows).
        return {
          formula: `SUBTOTAL(109,${letter}2:${letter}${Math.max(lastDataRow, 2)})`,
          result: sheet.sums[index],
        };
      }),
    );
    totals.font = { bold: true };
    totals.commit();
  }
  worksheet.commit();
}

/** 1 → 'A', 27 → 'AA'. */
export function columnLetter(position: number): string {
  let letters = '';
  for (let n = position; n > 0; n = Math.floor((n - 1) / 26)) {
    letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  }
  return letters;
}
