import * as ExcelJS from 'exceljs';
import { once } from 'node:events';
import { setImmediate as nextTurn } from 'node:timers/promises';
import type {
  ExportCell,
  ExportCells,
  ExportColumn,
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
    batches: AsyncIterable<readonly ExportCells[]>,
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
      for (const cells of batch) {
        if (sheet === null || sheet.dataRows === dataRowsPerSheet) {
          if (sheet) finishSheet(sheet, spec);
          sheet = open();
        }
        addDataRow(sheet, spec.columns, cells);
        rows += 1;
      }
      if (onRows) await onRows(rows);
      if (sheet) await zipCaughtUp(workbook, sheet.worksheet);
    }
    // An empty table still gets its sheet with the header, so the file opens with its columns.
    finishSheet(sheet ?? open(), spec);
    await workbook.commit();
    return { rows, sheets };
  }
}

/** The parts of exceljs's streaming writer that show how far behind its zip is (not typed). */
interface ZipInternals {
  zip?: NodeJS.EventEmitter;
}
interface SheetStreamInternals {
  stream?: {
    pipes?: Array<NodeJS.EventEmitter & { _writableState?: { length?: number } }>;
  };
}

/**
 * How much uncompressed sheet XML may wait for deflate before the writer stops adding rows: the
 * two then work side by side (deflate runs on libuv's threads), and memory stays bounded.
 */
const ZIP_BACKLOG_BYTES = 8 * 1024 * 1024;

/**
 * exceljs writes a sheet's XML into the zip without back-pressure: each row goes into the zip's
 * intake stream whatever it holds, and deflate takes one chunk per turn of the event loop, so a
 * reader faster than deflate piles the uncompressed sheet up in memory (about 0.6 KB per row).
 * Between batches this yields a turn (deflate's turn), and once the intake holds more than
 * ZIP_BACKLOG_BYTES it waits until deflate has emptied it, so memory stays flat.
 */
async function zipCaughtUp(
  workbook: ExcelJS.stream.xlsx.WorkbookWriter,
  worksheet: ExcelJS.Worksheet,
): Promise<void> {
  const intake = (worksheet as unknown as SheetStreamInternals).stream?.pipes?.[0];
  const zip = (workbook as unknown as ZipInternals).zip;
  // Far past the intake's high-water mark, so a 'drain' is owed when it empties.
  if (!intake || !zip || (intake._writableState?.length ?? 0) < ZIP_BACKLOG_BYTES) {
    await nextTurn();
    return;
  }
  const stop = new AbortController();
  try {
    await Promise.race([
      once(intake, 'drain', { signal: stop.signal }),
      once(zip, 'error', { signal: stop.signal }).then(([error]) => {
        throw error as Error;
      }),
    ]);
  } finally {
    stop.abort();
  }
}

interface SheetState {
  worksheet: ExcelJS.Worksheet;
  /** One style object per column, shared by its data cells (see addDataRow). */
  styles: Array<Partial<ExcelJS.Style>>;
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
  const styles = spec.columns.map((column): Partial<ExcelJS.Style> => {
    const numFmt = NUMBER_FORMATS[column.kind];
    return numFmt ? { numFmt } : {};
  });
  worksheet.columns = spec.columns.map((column, index) => ({
    key: column.key,
    width: column.width,
    style: styles[index],
  }));
  const header = worksheet.addRow(spec.columns.map((column) => column.header));
  header.font = { bold: true };
  header.commit();
  return { worksheet, styles, dataRows: 0, sums: spec.columns.map(() => 0) };
}

function addDataRow(sheet: SheetState, columns: readonly ExportColumn[], cells: ExportCells): void {
  const values = columns.map((column, index) => {
    const value = cells[index] ?? null;
    if (column.total === 'sum' && typeof value === 'number') sheet.sums[index] += value;
    return cellValue(column, value);
  });
  const added = sheet.worksheet.addRow(values);
  // exceljs gives each cell a fresh copy of its column's style and then works out that style's
  // id for every cell; one shared object per column lets it reuse the id it remembers per object.
  for (let index = 0; index < columns.length; index += 1)
    added.getCell(index + 1).style = sheet.styles[index];
  added.commit();
  sheet.dataRows += 1;
}

function cellValue(column: ExportColumn, value: ExportCell): ExcelJS.CellValue {
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
