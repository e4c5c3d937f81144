import type { Type } from '@nestjs/common';
import { parse } from 'csv-parse';
import * as ExcelJS from 'exceljs';
import { once } from 'node:events';
import { createReadStream, createWriteStream } from 'node:fs';
import type { ReceiptsExportProducer } from '../../services/api/src/exports/producers/receipts-export.producer';
import type { ExportColumn } from '../../services/api/src/exports/writers/export-table';
import { apiContext, apiExport } from './api-context';
import { timed } from './timed';

/**
 * One export measurement in a process of its own (forked by exports-bench.ts with --expose-gc),
 * so that its peak RSS is not distorted by the heap of earlier sections or measurements.
 */

type Cell = string | number | Date | null;

export interface BenchActor {
  id: number;
  email: string;
  role: 'national_staff';
  regionId: null;
  chapterId: null;
}

export type ChildTask =
  | {
      /** The job's read alone: the same query streamed in the same batches, then dropped. */
      mode: 'read' | 'job';
      format: 'xlsx' | 'csv';
      filters: { from: string; to: string };
      actor: BenchActor;
      filePath: string;
    }
  | {
      mode: 'floor';
      format: 'xlsx' | 'csv';
      /** The CSV job's file: its first rows are the floor's values. */
      samplePath: string;
      rows: number;
      filePath: string;
    };

export interface ChildResult {
  ms: number;
  rows: number;
  /** Peak RSS over the measured work minus RSS after a full GC just before it. */
  peakRssGrowthMb: number;
}

/** The compiled producer's methods the bench calls, typed by the API's own source. */
type ReceiptsProducerLike = Pick<ReceiptsExportProducer, 'rows' | 'produce'>;

/** Rows of the job's own output the floors cycle through: same shapes, same bytes per row. */
const SAMPLE_ROWS = 10_000;

async function measured(work: () => Promise<number>): Promise<ChildResult> {
  (globalThis as { gc?: () => void }).gc?.();
  const before = process.memoryUsage().rss;
  let peak = before;
  const timer = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 20);
  try {
    const { ms, value: rows } = await timed(work);
    peak = Math.max(peak, process.memoryUsage().rss);
    return { ms, rows, peakRssGrowthMb: (peak - before) / 1024 / 1024 };
  } finally {
    clearInterval(timer);
  }
}

async function receiptColumns(): Promise<ExportColumn[]> {
  const columns = await apiExport<(showSender: boolean) => ExportColumn[]>(
    'exports/producers/receipts-export.producer',
    'receiptColumns',
  );
  return columns(true);
}

async function runJob(task: Extract<ChildTask, { mode: 'read' | 'job' }>): Promise<ChildResult> {
  const context = await apiContext({ processors: true });
  try {
    const Producer = await apiExport<Type<ReceiptsProducerLike>>(
      'exports/producers/receipts-export.producer',
      'ReceiptsExportProducer',
    );
    const producer = context.get(Producer, { strict: false });
    if (task.mode === 'read') {
      return await measured(async () => {
        const { batches, expected } = producer.rows(
          { format: task.format, bom: false, filters: task.filters },
          task.actor,
        );
        let rows = 0;
        for await (const batch of batches) rows += batch.length;
        await expected;
        return rows;
      });
    }
    return await measured(async () => {
      const outcome = await producer.produce(
        { format: task.format, bom: false, filters: task.filters },
        {
          actor: task.actor,
          filePath: task.filePath,
          progress: () => Promise.resolve(),
          xlsxRowsPerSheet: 1_048_576,
        },
      );
      return outcome.rows;
    });
  } finally {
    await context.close();
  }
}

/** The job's first rows back from its CSV file, typed as the job hands them to its writer. */
async function sampleRows(path: string, columns: ExportColumn[]): Promise<Cell[][]> {
  const rows: Cell[][] = [];
  const parser = createReadStream(path).pipe(parse({ from_line: 2, to_line: SAMPLE_ROWS + 1 }));
  for await (const record of parser as AsyncIterable<string[]>) {
    rows.push(
      columns.map((column, index) => {
        const text = record[index];
        if (text === '') return null;
        return column.kind === 'text' || column.kind === 'date' ? text : Number(text);
      }),
    );
  }
  if (rows.length === 0) throw new Error(`${path} holds no rows to sample`);
  return rows;
}

/** exceljs's streaming writer alone: the job's rows (dates as dates) from memory. */
async function exceljsAlone(
  filePath: string,
  columns: ExportColumn[],
  sample: Cell[][],
  rows: number,
): Promise<ChildResult> {
  const cells = sample.map((row) =>
    row.map((cell, index) =>
      columns[index].kind === 'date' && typeof cell === 'string'
        ? new Date(`${cell}T00:00:00Z`)
        : cell,
    ),
  );
  return measured(async () => {
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
    // Shared style objects per column, as the job's writer uses: exceljs then reuses each
    // column's style id instead of working it out for every cell, the fastest way it allows.
    const styles = columns.map(() => ({}));
    for (let row = 0; row < rows; row += 1) {
      const added = sheet.addRow(cells[row % cells.length]);
      for (let index = 0; index < styles.length; index += 1)
        added.getCell(index + 1).style = styles[index];
      added.commit();
    }
    sheet.commit();
    await workbook.commit();
    return rows;
  });
}

/**
 * A bare file stream: the job's rows from memory as plain comma-joined lines (formatting
 * included, no quoting or neutralising), one write per line, waiting on back-pressure.
 */
async function bareCsv(
  filePath: string,
  columns: ExportColumn[],
  sample: Cell[][],
  rows: number,
): Promise<ChildResult> {
  return measured(async () => {
    const out = createWriteStream(filePath);
    out.write(`${columns.map((column) => column.header).join(',')}\r\n`);
    for (let row = 0; row < rows; row += 1) {
      const line = `${sample[row % sample.length].map((cell) => (cell === null ? '' : String(cell))).join(',')}\r\n`;
      if (!out.write(line)) await once(out, 'drain');
    }
    out.end();
    await once(out, 'finish');
    return rows;
  });
}

async function runFloor(task: Extract<ChildTask, { mode: 'floor' }>): Promise<ChildResult> {
  const columns = await receiptColumns();
  const sample = await sampleRows(task.samplePath, columns);
  return task.format === 'xlsx'
    ? exceljsAlone(task.filePath, columns, sample, task.rows)
    : bareCsv(task.filePath, columns, sample, task.rows);
}

async function main(): Promise<void> {
  const task = JSON.parse(process.argv[2]) as ChildTask;
  const result = task.mode === 'floor' ? await runFloor(task) : await runJob(task);
  process.send!({ result });
}

if (process.send) {
  main()
    .then(() => process.exit(0))
    .catch((error: Error & { parent?: { message?: string } }) => {
      // Sequelize keeps the database's own words on `parent`.
      process.send!({ error: error.parent?.message ?? error.stack ?? error.message });
      process.exit(1);
    });
}
