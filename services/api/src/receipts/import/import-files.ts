import { BadRequestException } from '@nestjs/common';
import { RECEIPT_IMPORT_MAX_ROWS, type ImportCell } from '@tallyloom/core';
import { parse } from 'csv-parse/sync';
import { Workbook, ValueType, type Cell } from 'exceljs';

/** A sheet as read: its headers and its non-blank data rows, cells normalised. */
export interface ParsedSheet {
  fileType: 'csv' | 'xlsx';
  headers: string[];
  rows: SheetRow[];
}

export interface SheetRow {
  /** The row's number in the sheet: the header is row 1. */
  rowNumber: number;
  cells: ImportCell[];
}

const ZIP_MAGIC = Buffer.from([0x50, 0x4b, 0x03, 0x04]);
const NOT_A_SHEET = 'This is not a CSV or XLSX file.';

export function fileProblem(message: string): BadRequestException {
  return new BadRequestException({ message, fields: [{ field: 'file', messages: [message] }] });
}

/** Reads an upload by its content, never its name: a zip is XLSX, UTF-8 text is CSV. */
export async function readSheet(content: Buffer): Promise<ParsedSheet> {
  if (content.length === 0) throw fileProblem('The file is empty.');
  const sheet = content.subarray(0, 4).equals(ZIP_MAGIC)
    ? await readXlsx(content)
    : readCsv(content);
  if (sheet.headers.length === 0) throw fileProblem('The first row holds no column headers.');
  const seen = new Set<string>();
  for (const header of sheet.headers) {
    if (seen.has(header))
      throw fileProblem(`Two columns are headed "${header}"; give each column its own header.`);
    seen.add(header);
  }
  if (sheet.rows.length === 0) throw fileProblem('The file has a header row but no data rows.');
  if (sheet.rows.length > RECEIPT_IMPORT_MAX_ROWS)
    throw fileProblem(
      `The file has ${sheet.rows.length.toLocaleString('en-US')} data rows; one import takes at most ${RECEIPT_IMPORT_MAX_ROWS.toLocaleString('en-US')}. Split it into several files.`,
    );
  return sheet;
}

// Control characters other than tab, line feed and carriage return never occur in a text sheet;
// they mark a binary file (an executable renamed .csv, a picture, …).
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const BINARY = /[\u0000-\u0008\u000b\u000c\u000e-\u001f]/;

function readCsv(content: Buffer): ParsedSheet {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(content);
  } catch {
    throw fileProblem(`${NOT_A_SHEET} (A CSV file must be UTF-8 text.)`);
  }
  if (BINARY.test(text)) throw fileProblem(NOT_A_SHEET);
  let records: string[][];
  try {
    // RFC 4180; a byte-order mark is dropped, short rows are padded below.
    records = parse(text, {
      bom: true,
      relax_column_count: true,
      skip_empty_lines: false,
    }) as string[][];
  } catch (error) {
    throw fileProblem(`The CSV file could not be read: ${(error as Error).message}`);
  }
  const [header = [], ...data] = records;
  return {
    fileType: 'csv',
    headers: headersOf(header),
    rows: data
      .map((cells, index) => ({
        rowNumber: index + 2,
        cells: cells.map((cell) => (cell === '' ? null : cell)),
      }))
      .filter((row) => !blank(row.cells)),
  };
}

async function readXlsx(content: Buffer): Promise<ParsedSheet> {
  const workbook = new Workbook();
  try {
    await workbook.xlsx.load(content as unknown as ArrayBuffer);
  } catch {
    throw fileProblem(NOT_A_SHEET);
  }
  const sheet = workbook.worksheets[0];
  if (!sheet) throw fileProblem('The workbook has no worksheet.');
  const width = sheet.columnCount;
  const headerCells: ImportCell[] = [];
  for (let column = 1; column <= width; column++)
    headerCells.push(cellValue(sheet.getRow(1).getCell(column)));
  const headers = headersOf(headerCells.map((cell) => (cell === null ? '' : String(cell))));
  const rows: SheetRow[] = [];
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    if (rowNumber === 1) return;
    const cells: ImportCell[] = [];
    for (let column = 1; column <= headers.length; column++)
      cells.push(cellValue(row.getCell(column)));
    if (!blank(cells)) rows.push({ rowNumber, cells });
  });
  return { fileType: 'xlsx', headers, rows };
}

/** Headers trimmed; trailing empty ones dropped, inner empty ones named by their position. */
function headersOf(raw: string[]): string[] {
  const headers = raw.map((header) => header.trim());
  while (headers.length > 0 && headers[headers.length - 1] === '') headers.pop();
  return headers.map((header, index) => header || `Column ${index + 1}`);
}

function blank(cells: ImportCell[]): boolean {
  return cells.every((cell) => cell === null || (typeof cell === 'string' && cell.trim() === ''));
}

/**
 * One XLSX cell as text or a number. A formula is never evaluated and its cached result never
 * used: it becomes its own text ("=SUM(B2:B9)"), which the row checks then flag.
 */
function cellValue(cell: Cell): ImportCell {
  switch (cell.type) {
    case ValueType.Null:
    case ValueType.Merge:
      return null;
    case ValueType.Number:
      return cell.value as number;
    case ValueType.String:
    case ValueType.SharedString:
      return emptyAsNull(cell.text);
    case ValueType.Date:
      return isoDate(cell.value as Date);
    case ValueType.Boolean:
      return cell.value ? 'TRUE' : 'FALSE';
    case ValueType.Formula:
      return `=${cell.formula}`;
    case ValueType.RichText:
    case ValueType.Hyperlink:
    case ValueType.Error:
      return emptyAsNull(cell.text);
    default:
      return emptyAsNull(cell.text);
  }
}

function emptyAsNull(text: string): string | null {
  return text === '' ? null : text;
}

/** exceljs reads a date cell as that day at 00:00 UTC. */
function isoDate(value: Date): string {
  return value.toISOString().slice(0, 10);
}
