import type { INestApplicationContext, Type } from '@nestjs/common';
import * as ExcelJS from 'exceljs';
import { once } from 'node:events';
import { createWriteStream } from 'node:fs';
import { mkdir, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { step } from '../../db/lifecycle/console';
import { apiContext, apiExport } from './api-context';
import { connectTo } from './db-connection';
import { timed } from './timed';

/** The shapes of the compiled API the bench drives (loaded from dist). */
interface ExportColumnLike {
  header: string;
  key: string;
  kind: 'text' | 'id' | 'count' | 'decimal' | 'date' | 'timestamp';
  width: number;
}
interface ReceiptsProducerLike {
  produce(
    params: { format: 'xlsx' | 'csv'; bom: boolean; filters: { from?: string; to?: string } },
    run: {
      actor: { id: number; email: string; role: string; regionId: null; chapterId: null };
      filePath: string;
      progress: (percent: number) => Promise<void>;
      xlsxRowsPerSheet: number;
    },
  ): Promise<{ rows: number; sheets: number }>;
}

export interface ExportsBenchInput {
  databaseUrl: string;
  staffEmail: string;
  /** Target row counts, e.g. [100_000, 1_000_000]; capped by the receipts there are. */
  sizes: number[];
  folder: string;
}

/** Peak resident memory growth over a piece of work, sampled every 20 ms. */
async function peakRssGrowth<T>(work: () => Promise<T>): Promise<{ mb: number; value: T }> {
  (globalThis as { gc?: () => void }).gc?.();
  const before = process.memoryUsage().rss;
  let peak = before;
  const timer = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 20);
  try {
    const value = await work();
    peak = Math.max(peak, process.memoryUsage().rss);
    return { mb: (peak - before) / 1024 / 1024, value };
  } finally {
    clearInterval(timer);
  }
}

/** A value like the export's own for each column kind, so the floor writes the same shapes. */
function sampleValue(column: ExportColumnLike, row: number): string | number | Date {
  switch (column.kind) {
    case 'id':
      return 1_000_000 + row;
    case 'count':
      return (row * 7) % 23;
    case 'decimal':
      return ((row * 13) % 1000) / 10;
    case 'date':
    case 'timestamp':
      return new Date(Date.UTC(2026, row % 12, 1 + (row % 28)));
    default:
      return `Bench chapter ${String(row % 600).padStart(6, '0')}`;
  }
}

/** exceljs's streaming writer alone: the same columns and row count, values from memory. */
async function exceljsAlone(filePath: string, columns: ExportColumnLike[], rows: number) {
  const workbook = new ExcelJS.stream.xlsx.WorkbookWriter({
    filename: filePath,
    useStyles: true,
    useSharedStrings: false,
  });
  const sheet = workbook.addWorksheet('Receipts');
  sheet.columns = columns.map((column) => ({
    header: column.header,
    key: column.key,
    width: column.width,
  }));
  for (let row = 0; row < rows; row += 1) {
    sheet.addRow(columns.map((column) => sampleValue(column, row))).commit();
  }
  sheet.commit();
  await workbook.commit();
}

/** A bare file stream: the same row count as CSV lines, no quoting rules, no library. */
async function bareCsv(filePath: string, columns: ExportColumnLike[], rows: number) {
  const out = createWriteStream(filePath);
  out.write(`${columns.map((column) => column.header).join(',')}\r\n`);
  for (let row = 0; row < rows; row += 1) {
    const line = `${columns
      .map((column) => {
        const value = sampleValue(column, row);
        return value instanceof Date ? value.toISOString().slice(0, 10) : String(value);
      })
      .join(',')}\r\n`;
    if (!out.write(line)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}

/** The earliest month whose receipts to the latest number at least `rows`. */
async function rangeFor(databaseUrl: string, rows: number): Promise<{ from: string; to: string }> {
  const connection = await connectTo(databaseUrl);
  try {
    const months = await connection.query<Array<{ month: string; receipts: number | bigint }>>(
      `SELECT DATE_FORMAT(received_on, '%Y-%m') AS month, COUNT(*) AS receipts
         FROM parcel_receipts GROUP BY month ORDER BY month DESC`,
    );
    const to = `${months[0].month}-28`;
    let total = 0;
    for (const { month, receipts } of months) {
      total += Number(receipts);
      if (total >= rows) return { from: `${month}-01`, to };
    }
    return { from: `${months.at(-1)!.month}-01`, to };
  } finally {
    await connection.end();
  }
}

/**
 * #7's figures: the receipts export job (paged reads → formatting → writer → file) ÷ the
 * library's floor (exceljs's streaming writer alone; a bare file stream for CSV) at each size,
 * and the job's peak RSS growth.
 */
export async function benchExports(
  input: ExportsBenchInput,
): Promise<Array<Record<string, string | number>>> {
  const context: INestApplicationContext = await apiContext({ processors: true });
  try {
    const Producer = await apiExport<Type<ReceiptsProducerLike>>(
      'exports/producers/receipts-export.producer',
      'ReceiptsExportProducer',
    );
    const receiptColumns = await apiExport<(showSender: boolean) => ExportColumnLike[]>(
      'exports/producers/receipts-export.producer',
      'receiptColumns',
    );
    const producer = context.get(Producer, { strict: false });
    const connection = await connectTo(input.databaseUrl);
    const [staff] = await connection.query<Array<{ id: number }>>(
      'SELECT id FROM users WHERE email = ?',
      [input.staffEmail],
    );
    await connection.end();
    const actor = {
      id: Number(staff.id),
      email: input.staffEmail,
      role: 'national_staff',
      regionId: null,
      chapterId: null,
    };
    const columns = receiptColumns(true);
    await mkdir(input.folder, { recursive: true });
    const rows: Array<Record<string, string | number>> = [];

    for (const size of input.sizes) {
      const filters = await rangeFor(input.databaseUrl, size);
      for (const format of ['xlsx', 'csv'] as const) {
        const filePath = join(input.folder, `job-${size}.${format}`);
        step(`Export job: ${format}, about ${size.toLocaleString('en')} receipts…`);
        const job = await peakRssGrowth(() =>
          timed(() =>
            producer
              .produce(
                { format, bom: false, filters },
                { actor, filePath, progress: () => Promise.resolve(), xlsxRowsPerSheet: 1_048_576 },
              )
              .catch((error: Error & { parent?: { message?: string } }) => {
                // Sequelize keeps the database's own words on `parent`.
                throw new Error(
                  `the ${format} export job failed: ${error.parent?.message ?? error.message}`,
                );
              }),
          ),
        );
        const written = job.value.value.rows;
        const { size: bytes } = await stat(filePath);
        const floorPath = join(input.folder, `floor-${size}.${format}`);
        step(`  the floor: ${written.toLocaleString('en')} rows from memory…`);
        const floor = await timed(() =>
          format === 'xlsx'
            ? exceljsAlone(floorPath, columns, written)
            : bareCsv(floorPath, columns, written),
        );
        const row = {
          export: `${format}, ${written.toLocaleString('en')} rows`,
          'job ÷ floor': (job.value.ms / floor.ms).toFixed(2),
          target: '≤ 1.5',
          'job ms': Math.round(job.value.ms),
          'floor ms': Math.round(floor.ms),
          'peak RSS growth MB': job.mb.toFixed(0),
          'RSS target': '≤ 150, flat',
          'file MB': (bytes / 1024 / 1024).toFixed(1),
        };
        // Printed as each finishes too: a 1 M-row run is long, and a later failure keeps these.
        step(`  ${JSON.stringify(row)}`);
        rows.push(row);
        await rm(filePath, { force: true });
        await rm(floorPath, { force: true });
      }
    }
    return rows;
  } finally {
    await context.close();
  }
}
