import { execFileSync } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
// SheetJS, not exceljs: the file is checked by a reader independent of the writer.
import * as XLSX from 'xlsx';
import { cellsOf, type ExportCells, type ExportRow, type ExportTableSpec } from './export-table';
import { columnLetter, sheetNameOf, XlsxTableWriter } from './xlsx-table-writer';

const spec: ExportTableSpec = {
  sheetName: 'Receipts',
  title: 'Parcel receipts',
  columns: [
    { header: 'Received on', key: 'receivedOn', kind: 'date', width: 12 },
    { header: 'Chapter', key: 'chapter', kind: 'text', width: 20 },
    { header: 'Panels accepted (panels)', key: 'panels', kind: 'count', width: 14, total: 'sum' },
  ],
};

// eslint-disable-next-line @typescript-eslint/require-await -- a stand-in for paged reads
async function* inBatches(rows: ExportRow[], size: number): AsyncIterable<ExportCells[]> {
  for (let i = 0; i < rows.length; i += size)
    yield rows.slice(i, i + size).map((row) => cellsOf(spec.columns, row));
}

function rowsOf(count: number): ExportRow[] {
  return Array.from({ length: count }, (_, i) => ({
    receivedOn: `2026-01-${String((i % 28) + 1).padStart(2, '0')}`,
    chapter: `Chapter ${i + 1}`,
    panels: i + 1,
  }));
}

function readZipEntry(file: string, entry: string): Promise<string> {
  return Promise.resolve(execFileSync('unzip', ['-p', file, entry]).toString());
}

describe('XlsxTableWriter', () => {
  let dir: string;
  beforeEach(async () => {
    dir = await mkdtemp(join(tmpdir(), 'xlsx-writer-'));
  });
  afterEach(() => rm(dir, { recursive: true, force: true }));

  it('continues on a new sheet at the row limit, repeating the header, with totals per sheet', async () => {
    const file = join(dir, 'out.xlsx');
    // 10 rows per sheet: header + 8 data rows + totals row.
    const outcome = await new XlsxTableWriter({ rowLimit: 10 }).write(
      file,
      spec,
      inBatches(rowsOf(20), 3),
    );
    expect(outcome).toEqual({ rows: 20, sheets: 3 });

    const book = XLSX.readFile(file, { cellDates: true });
    expect(book.SheetNames).toEqual(['Receipts', 'Receipts (2)', 'Receipts (3)']);
    const sheets = book.SheetNames.map((name) =>
      XLSX.utils.sheet_to_json<unknown[]>(book.Sheets[name], { header: 1, raw: true }),
    );
    for (const sheet of sheets) {
      expect(sheet[0]).toEqual(['Received on', 'Chapter', 'Panels accepted (panels)']);
      expect(sheet.length).toBeLessThanOrEqual(10);
    }
    // Data rows in order across sheets, none lost or repeated.
    const data = sheets.flatMap((sheet) => sheet.slice(1, -1));
    expect(data.map((row) => row[1])).toEqual(rowsOf(20).map((row) => row.chapter));
    // The second sheet starts with the ninth row.
    expect(sheets[1][1][2]).toBe(9);
    // Each totals row caches the sum of its own sheet: 1..8, 9..16, 17..20.
    expect(sheets.map((sheet) => sheet.at(-1))).toEqual([
      ['Total', undefined, 36],
      ['Total', undefined, 100],
      ['Total', undefined, 74],
    ]);
    const total = book.Sheets['Receipts (2)']['C10'] as XLSX.CellObject;
    expect(total.f).toBe('SUBTOTAL(109,C2:C9)');
  });

  it('writes an empty table as one sheet with its header', async () => {
    const file = join(dir, 'empty.xlsx');
    const outcome = await new XlsxTableWriter().write(file, spec, inBatches([], 5));
    expect(outcome).toEqual({ rows: 0, sheets: 1 });
    const book = XLSX.readFile(file);
    const rows = XLSX.utils.sheet_to_json<unknown[]>(book.Sheets.Receipts, { header: 1 });
    expect(rows[0]).toEqual(['Received on', 'Chapter', 'Panels accepted (panels)']);
  });

  it('refuses a limit that leaves no room for data', async () => {
    await expect(
      new XlsxTableWriter({ rowLimit: 2 }).write(join(dir, 'x.xlsx'), spec, inBatches([], 1)),
    ).rejects.toThrow(RangeError);
  });

  it('names sheets within 31 characters and spells column letters', () => {
    expect(sheetNameOf('A very long sheet name that goes on', 12)).toHaveLength(31);
    expect(sheetNameOf('A very long sheet name that goes on', 12).endsWith(' (12)')).toBe(true);
    // Source: spreadsheet column lettering, common practice: Z is 26, AA 27, XFD 16,384.
    expect([1, 26, 27, 52, 16_384].map(columnLetter)).toEqual(['A', 'Z', 'AA', 'AZ', 'XFD']);
  });

  it("gives every data cell its column's number format, and only the header is bold", async () => {
    const file = join(dir, 'formats.xlsx');
    await new XlsxTableWriter().write(file, spec, inBatches(rowsOf(25), 10));
    const book = XLSX.readFile(file, { cellStyles: true, cellNF: true });
    const sheet = book.Sheets.Receipts;
    for (const row of [2, 14, 26]) {
      expect((sheet[`A${row}`] as XLSX.CellObject).z).toBe('yyyy-mm-dd');
      expect((sheet[`C${row}`] as XLSX.CellObject).z).toBe('#,##0');
    }
    // The shared column styles are not touched by the header's or the totals' bold font.
    const sheetXml = await readZipEntry(file, 'xl/worksheets/sheet1.xml');
    const styleOf = (ref: string) =>
      new RegExp(`<c r="${ref}"[^>]* s="(\\d+)"`).exec(sheetXml)?.[1];
    expect(styleOf('C2')).toBe(styleOf('C26'));
    expect(styleOf('C1')).not.toBe(styleOf('C2'));
    expect(styleOf('C27')).not.toBe(styleOf('C2'));
  });
});
