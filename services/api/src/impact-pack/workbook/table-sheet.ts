import type { CellFormat, ImpactSheet } from '@tallyloom/reports';
import type { Workbook, Worksheet } from 'exceljs';
import { columnLetter } from '../../exports/writers/xlsx-table-writer';

export type TableCell =
  | string
  | number
  | Date
  | null
  | { formula: string; result: number }
  | { text: string; hyperlink: string };

export interface TableOptions {
  /** Row of the header (1-based); rows above it are the sheet's own title lines. */
  headerRow?: number;
  /** Add a totals row with a SUM of every column marked `total`. */
  totals?: boolean;
  /** A defined name for the header and data rows, so formulas elsewhere can name the table. */
  definedName: string;
  /** The Excel number format for `currency` cells (of the hourly value setting's currency). */
  currencyFormat?: string;
}

export const NUMBER_FORMATS: Record<Exclude<CellFormat, 'currency' | 'text'>, string> = {
  count: '#,##0',
  decimal: '#,##0.00',
  percent: '0.0%',
  date: 'yyyy-mm-dd',
  month: 'mmm yyyy',
};

/** e.g. '"$"#,##0.00' for US dollars; other currencies print their ISO code after the amount. */
export function currencyFormat(currency: string): string {
  const symbols: Record<string, string> = { USD: '$', EUR: '€', GBP: '£' };
  const symbol = symbols[currency];
  return symbol ? `"${symbol}"#,##0.00` : `#,##0.00 "${currency.replace(/"/g, '')}"`;
}

export function numberFormat(format: CellFormat, currency = 'USD'): string | undefined {
  if (format === 'text') return undefined;
  if (format === 'currency') return currencyFormat(currency);
  return NUMBER_FORMATS[format];
}

/** A sheet name quoted for a reference, e.g. 'By region'!$A$1. */
export function sheetRef(sheet: string): string {
  return `'${sheet.replace(/'/g, "''")}'`;
}

/** A date-only value as Excel stores it: midnight UTC, so no time zone moves the day. */
export function dateCell(isoDate: string): Date {
  return new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
}

/**
 * Writes a table with frozen header, column widths and number formats: one row per record, keyed
 * by the sheet's column keys, then (optionally) a totals row of SUM formulas with their cached
 * results. Returns the number of data rows.
 */
export function writeTable(
  workbook: Workbook,
  sheet: ImpactSheet,
  records: ReadonlyArray<Record<string, TableCell>>,
  options: TableOptions,
): Worksheet {
  const headerRow = options.headerRow ?? 1;
  const worksheet = workbook.getWorksheet(sheet.name) ?? workbook.addWorksheet(sheet.name);
  worksheet.views = [{ state: 'frozen', ySplit: headerRow, xSplit: 0 }];
  sheet.columns.forEach((column, index) => {
    worksheet.getColumn(index + 1).width = column.width;
  });
  const header = worksheet.getRow(headerRow);
  sheet.columns.forEach((column, index) => {
    const cell = header.getCell(index + 1);
    cell.value = column.header;
    cell.font = { bold: true, color: { argb: 'FFFFFFFF' } };
    cell.fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FF0F6B6B' } };
    cell.alignment = { vertical: 'middle', wrapText: true };
  });

  records.forEach((record, offset) => {
    const row = worksheet.getRow(headerRow + 1 + offset);
    sheet.columns.forEach((column, index) => {
      const cell = row.getCell(index + 1);
      cell.value = record[column.key] ?? null;
      const format =
        column.format === 'currency' ? options.currencyFormat : numberFormat(column.format);
      if (format) cell.numFmt = format;
      if (column.format === 'text') cell.alignment = { wrapText: true, vertical: 'top' };
    });
  });

  const firstData = headerRow + 1;
  const lastData = headerRow + records.length;
  const lastColumn = columnLetter(sheet.columns.length);
  workbook.definedNames.add(
    `${sheetRef(sheet.name)}!$A$${headerRow}:$${lastColumn}$${Math.max(lastData, headerRow)}`,
    options.definedName,
  );

  if (options.totals) {
    const row = worksheet.getRow(lastData + 1);
    row.getCell(1).value = 'Total';
    row.font = { bold: true };
    sheet.columns.forEach((column, index) => {
      if (!column.total) return;
      const letter = columnLetter(index + 1);
      const result = records.reduce((sum, record) => sum + numericOf(record[column.key]), 0);
      const cell = row.getCell(index + 1);
      cell.value =
        records.length > 0
          ? { formula: `SUM(${letter}${firstData}:${letter}${lastData})`, result: tidy(result) }
          : 0;
      const format =
        column.format === 'currency' ? options.currencyFormat : numberFormat(column.format);
      if (format) cell.numFmt = format;
    });
  }
  return worksheet;
}

/** The number a cell adds to a SUM: numbers and formula results; text counts nothing. */
export function numericOf(value: TableCell | undefined): number {
  if (typeof value === 'number') return value;
  if (value && typeof value === 'object' && 'result' in value) return value.result;
  return 0;
}

/** Sums of decimals lose a last digit to binary floating point; cached totals should not. */
function tidy(value: number): number {
  return Math.round(value * 1e6) / 1e6;
}
