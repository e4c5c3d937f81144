import { parse } from 'csv-parse/sync';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CsvTableWriter, csvField } from './csv-table-writer';
import { cellsOf, type ExportCells, type ExportRow, type ExportTableSpec } from './export-table';

const spec: ExportTableSpec = {
  sheetName: 'Receipts',
  title: 'Parcel receipts',
  columns: [
    { header: 'Notes', key: 'notes', kind: 'text', width: 30 },
    { header: 'Panels accepted (panels)', key: 'panels', kind: 'count', width: 12 },
  ],
};

// eslint-disable-next-line @typescript-eslint/require-await -- a stand-in for paged reads
async function* once(rows: ExportRow[]): AsyncIterable<ExportCells[]> {
  yield rows.map((row) => cellsOf(spec.columns, row));
}

describe('CsvTableWriter', () => {
  let dir: string;
  beforeEach(async () => {
    dir = await mkdtemp(join(tmpdir(), 'csv-writer-'));
  });
  afterEach(() => rm(dir, { recursive: true, force: true }));

  const rows: ExportRow[] = [
    { notes: 'plain', panels: 3 },
    { notes: 'comma, "quote"\nand a line', panels: 0 },
    { notes: '=HYPERLINK("x")', panels: 12 },
    { notes: null, panels: 5 },
  ];

  it('writes RFC 4180 records: CRLF, quoted fields with doubled quotes, no BOM by default', async () => {
    const file = join(dir, 'out.csv');
    expect(await new CsvTableWriter().write(file, spec, once(rows))).toEqual({
      rows: 4,
      sheets: 1,
    });
    const text = await readFile(file, 'utf8');
    // Source: RFC 4180 §2: CRLF line breaks (rule 1/2), fields with commas, quotes or line
    // breaks enclosed in double quotes (rule 6), a quote inside doubled (rule 7).
    expect(text).toBe(
      'Notes,Panels accepted (panels)\r\n' +
        'plain,3\r\n' +
        '"comma, ""quote""\nand a line",0\r\n' +
        '"\'=HYPERLINK(""x"")",12\r\n' +
        ',5\r\n',
    );
    // An independent parser reads the same values back.
    const parsed = parse(text, { bom: true }) as string[][];
    expect(parsed.slice(1).map((row) => row[0])).toEqual([
      'plain',
      'comma, "quote"\nand a line',
      '\'=HYPERLINK("x")',
      '',
    ]);
  });

  it('begins with the UTF-8 byte-order mark when asked', async () => {
    const file = join(dir, 'bom.csv');
    await new CsvTableWriter({ bom: true }).write(
      file,
      spec,
      once([{ notes: 'Fernwick é', panels: 1 }]),
    );
    const bytes = await readFile(file);
    // Source: Unicode Standard §23.8: the UTF-8 byte-order mark is EF BB BF.
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(bytes.subarray(3).toString('utf8')).toBe(
      'Notes,Panels accepted (panels)\r\nFernwick é,1\r\n',
    );
  });

  it('writes every batch in order and reports the rows written after each', async () => {
    const file = join(dir, 'batches.csv');
    const seen: number[] = [];
    // eslint-disable-next-line @typescript-eslint/require-await -- a stand-in for a streamed read
    async function* batches(): AsyncIterable<ExportCells[]> {
      yield [
        ['a', 1],
        ['b', 2],
      ];
      yield [];
      yield [['c', 3]];
    }
    const outcome = await new CsvTableWriter().write(file, spec, batches(), (rows) => {
      seen.push(rows);
    });
    expect(outcome).toEqual({ rows: 3, sheets: 1 });
    expect(seen).toEqual([2, 2, 3]);
    expect(await readFile(file, 'utf8')).toBe(
      'Notes,Panels accepted (panels)\r\na,1\r\nb,2\r\nc,3\r\n',
    );
  });

  it('quotes a field with a lone CR or LF, and neutralises before quoting', () => {
    // Source: RFC 4180 §2 rule 6 (line breaks inside a field need quotes); OWASP "CSV Injection".
    expect(csvField('a\rb')).toBe('"a\rb"');
    expect(csvField('a\nb')).toBe('"a\nb"');
    expect(csvField('=1,2')).toBe('"\'=1,2"');
    expect(csvField(-3)).toBe('-3');
    expect(csvField(null)).toBe('');
  });
});
