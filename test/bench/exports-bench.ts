import { fork } from 'node:child_process';
import { mkdir, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { step } from '../../db/lifecycle/console';
import { connectTo } from './db-connection';
import type { BenchActor, ChildResult, ChildTask } from './export-child';
import { settledAfterLoad } from './settle';
import { SyntheticNetwork, type NetworkSize } from './synthetic-network';

export interface ExportsBenchInput {
  databaseUrl: string;
  staffEmail: string;
  /** Target row counts, e.g. [100_000, 1_000_000]; capped by the receipts there are. */
  sizes: number[];
  folder: string;
  /** Generate the synthetic network first (`--only exports`, without the reports section). */
  generate?: { generatorUrl: string; size: NetworkSize };
}

/**
 * One measurement in a fresh Node process (`export-child.ts`, with --expose-gc and the same tsx
 * loader), so each peak RSS starts from a collected heap and no earlier section's memory.
 */
function inChild(task: ChildTask): Promise<ChildResult> {
  return new Promise((resolve, reject) => {
    const child = fork(join(__dirname, 'export-child.ts'), [JSON.stringify(task)], {
      execArgv: [...process.execArgv, '--expose-gc'],
    });
    let answer: { result?: ChildResult; error?: string } = {};
    child.on('message', (message: typeof answer) => (answer = message));
    child.on('error', reject);
    child.on('exit', (code) => {
      if (answer.result) resolve(answer.result);
      else
        reject(
          new Error(`the ${task.format} ${task.mode} failed (${code}): ${answer.error ?? '?'}`),
        );
    });
  });
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
 * #7's figures: the receipts export job (one streamed read → formatting → writer → file) ÷ the
 * library's floor (exceljs's streaming writer alone; a bare file stream for CSV) writing the same
 * rows from memory, at each size, and the job's peak RSS growth. The floors cycle through the
 * job's own first 10,000 rows, so they write the same shapes and about the same bytes. The job
 * runs on a warm server (its read once before), and the read alone is shown beside it.
 */
export async function benchExports(
  input: ExportsBenchInput,
): Promise<Array<Record<string, string | number>>> {
  if (input.generate) {
    const { generatorUrl, size } = input.generate;
    step(`Generating ${size.chapters} chapters × ${size.months} months of receipts…`);
    const network = await SyntheticNetwork.connect(generatorUrl, size);
    try {
      await network.growTo(size.chapters);
    } finally {
      await network.close();
    }
    await settledAfterLoad(input.databaseUrl);
  }
  const connection = await connectTo(input.databaseUrl);
  const [staff] = await connection.query<Array<{ id: number }>>(
    'SELECT id FROM users WHERE email = ?',
    [input.staffEmail],
  );
  await connection.end();
  const actor: BenchActor = {
    id: Number(staff.id),
    email: input.staffEmail,
    role: 'national_staff',
    regionId: null,
    chapterId: null,
  };
  await mkdir(input.folder, { recursive: true });
  const rows: Array<Record<string, string | number>> = [];

  for (const size of input.sizes) {
    const filters = await rangeFor(input.databaseUrl, size);
    const sample = join(input.folder, `job-${size}.csv`);
    // CSV first: its file is the floors' sample of the job's own rows.
    for (const format of ['csv', 'xlsx'] as const) {
      const filePath = join(input.folder, `job-${size}.${format}`);
      step(`Export job: ${format}, about ${size.toLocaleString('en')} receipts…`);
      // The read alone twice: the first brings the rows into the server's cache, as the floor
      // has its rows in memory; the second is the read's own share of the job.
      await inChild({ mode: 'read', format, filters, actor, filePath });
      const read = await inChild({ mode: 'read', format, filters, actor, filePath });
      const job = await inChild({ mode: 'job', format, filters, actor, filePath });
      const { size: bytes } = await stat(filePath);
      const floorPath = join(input.folder, `floor-${size}.${format}`);
      step(`  the floor: ${job.rows.toLocaleString('en')} rows from memory…`);
      const floor = await inChild({
        mode: 'floor',
        format,
        samplePath: sample,
        rows: job.rows,
        filePath: floorPath,
      });
      const { size: floorBytes } = await stat(floorPath);
      const row = {
        export: `${format}, ${job.rows.toLocaleString('en')} rows`,
        'job ÷ floor': (job.ms / floor.ms).toFixed(2),
        target: '≤ 1.5',
        'job ms': Math.round(job.ms),
        'floor ms': Math.round(floor.ms),
        // What the database and its driver alone take, before any formatting or writing.
        'read alone ÷ floor': (read.ms / floor.ms).toFixed(2),
        floor:
          format === 'xlsx'
            ? 'exceljs streaming writer alone'
            : 'plain lines, formatting included, one write per line',
        'peak RSS growth MB': job.peakRssGrowthMb.toFixed(0),
        'RSS target': '≤ 150, flat',
        'floor RSS MB': floor.peakRssGrowthMb.toFixed(0),
        'file MB (floor)': `${(bytes / 1024 / 1024).toFixed(1)} (${(floorBytes / 1024 / 1024).toFixed(1)})`,
      };
      // Printed as each finishes too: a 1 M-row run is long, and a later failure keeps these.
      step(`  ${JSON.stringify(row)}`);
      rows.push(row);
      await rm(floorPath, { force: true });
      if (format === 'xlsx') await rm(filePath, { force: true });
    }
    await rm(sample, { force: true });
  }
  return rows;
}
