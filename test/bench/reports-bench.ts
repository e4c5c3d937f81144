import type { INestApplicationContext, Type } from '@nestjs/common';
import { step } from '../../db/lifecycle/console';
import { apiContext, apiExport } from './api-context';
import { connectTo } from './db-connection';
import { timed } from './timed';
import { load } from './load';
import { settledAfterLoad } from './settle';
import { SyntheticNetwork, type NetworkSize } from './synthetic-network';

/** The compiled API's snapshot builder (imported from dist: tsx emits no decorator metadata). */
interface SnapshotBuilderLike {
  rebuildAll(): Promise<{ snapshots: number; campaigns: number }>;
  rebuildForChapterMonth(chapterId: number, month: string): Promise<unknown>;
}

export interface ReportsBenchInput {
  /** The app's own connection (the builder and the raw GROUP BY use it). */
  databaseUrl: string;
  /** A connection allowed to write every table, for generating the network. */
  generatorUrl: string;
  baseUrl: string;
  auth: Record<string, string>;
  size: NetworkSize;
  connections: number;
  seconds: number;
}

export interface ReportsBenchResult {
  rows: Array<Record<string, string | number>>;
}

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
};

/**
 * The one raw GROUP BY the full rebuild is compared with: every measure summed per region and
 * month straight from the approved revisions and their line rows — the same rows the rebuild
 * reads, without snapshots, periods, compliance or writes.
 */
const RAW_GROUP_BY = `
  SELECT c.region_id, t.month,
         SUM(r.panels_accepted), SUM(r.set_aside_off_size + r.set_aside_hard_care
           + r.set_aside_soiled + r.set_aside_other), SUM(r.panels_used),
         SUM(a.n), SUM(r.blankets_received), SUM(g.n), SUM(p.n),
         SUM(r.volunteer_hours), SUM(r.yarn_kg), SUM(r.panels_closing), SUM(r.blankets_closing)
    FROM monthly_tallies t
    JOIN chapters c ON c.id = t.chapter_id
    JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision
    LEFT JOIN (SELECT revision_id, SUM(count) n FROM tally_blankets_assembled GROUP BY revision_id) a
      ON a.revision_id = r.id
    LEFT JOIN (SELECT revision_id, SUM(count) n FROM tally_blankets_given GROUP BY revision_id) g
      ON g.revision_id = r.id
    LEFT JOIN (SELECT revision_id, SUM(count) n FROM tally_people_served GROUP BY revision_id) p
      ON p.revision_id = r.id
   WHERE t.approved_revision IS NOT NULL
   GROUP BY c.region_id, t.month`;

async function rawGroupBy(databaseUrl: string): Promise<number> {
  const connection = await connectTo(databaseUrl);
  try {
    await connection.query(RAW_GROUP_BY); // warm the buffer pool like the rebuild finds it
    const runs: number[] = [];
    for (let i = 0; i < 3; i += 1)
      runs.push((await timed(() => connection.query(RAW_GROUP_BY))).ms);
    return median(runs);
  } finally {
    await connection.end();
  }
}

/** The snapshot builder of the compiled API, in a context of its own. */
async function builderContext(): Promise<{
  context: INestApplicationContext;
  builder: SnapshotBuilderLike;
}> {
  const context = await apiContext();
  const SnapshotBuilder = await apiExport<Type<SnapshotBuilderLike>>(
    'reports/snapshot-builder.service',
    'SnapshotBuilder',
  );
  return { context, builder: context.get(SnapshotBuilder) };
}

async function dashboardP95(input: ReportsBenchInput, connections: number): Promise<number> {
  await load(input.baseUrl, '/api/dashboards/network', connections, 1, input.auth); // warm-up
  const run = await load(
    input.baseUrl,
    '/api/dashboards/network',
    connections,
    input.seconds,
    input.auth,
  );
  if (run.errors > 0) throw new Error(`the network dashboard answered ${run.errors} errors`);
  return run.p95Ms;
}

/**
 * #6's figures on a synthetic network: full rebuild ÷ one raw GROUP BY, incremental ÷ full,
 * dashboard p95 ÷ health p95 at 50 clients, and the dashboard at 10 % vs 100 % of the data.
 */
export async function benchReports(input: ReportsBenchInput): Promise<ReportsBenchResult> {
  const { size } = input;
  const network = await SyntheticNetwork.connect(input.generatorUrl, size);
  const { context, builder } = await builderContext();
  try {
    const tenth = Math.max(size.regions, Math.round(size.chapters / 10));
    step(`Generating ${tenth} of ${size.chapters} chapters × ${size.months} months…`);
    await network.growTo(tenth);
    await settledAfterLoad(input.databaseUrl);
    await builder.rebuildAll();
    const dashboardAtTenth = await dashboardP95(input, input.connections);

    step(
      `Generating the rest (${size.chapters} chapters, ${size.chapters * size.months * size.receiptsPerMonth} receipts)…`,
    );
    await network.growTo(size.chapters, (done) => {
      if (done % 100 === 0) step(`  ${done} chapters`);
    });

    const settled = await settledAfterLoad(input.databaseUrl);
    step(
      `  the server wrote back the load's pages for ${settled.seconds.toFixed(0)} s ` +
        `(${settled.dirtyPages} still dirty)`,
    );
    step('Raw GROUP BY over the approved revisions…');
    const groupByMs = await rawGroupBy(input.databaseUrl);
    step('Full rebuild (first build of the new chapters)…');
    const first = await timed(() => builder.rebuildAll());
    step('Full rebuild again (the nightly repair, nothing changed)…');
    const nightly = await timed(() => builder.rebuildAll());

    step('Incremental refreshes (one chapter-month each)…');
    const incremental: number[] = [];
    // Eleven chapter-months across the history: the median of eleven is steadier than of five.
    const months = [1, 4, 7, 13, 19, 30, 45, 61, 80, 100, 115].map((back) =>
      monthBack(-Math.min(back, size.months)),
    );
    const chapterIds = await benchChapterIds(input.databaseUrl);
    // One untimed refresh first, as the raw GROUP BY and the dashboard get their warm-up run:
    // the timed ones then measure the refresh, not the first compilation of its code.
    await builder.rebuildForChapterMonth(chapterIds[chapterIds.length - 1], monthBack(-2));
    for (let i = 0; i < months.length; i += 1) {
      const chapterId = chapterIds[(i * 37) % chapterIds.length];
      incremental.push(
        (await timed(() => builder.rebuildForChapterMonth(chapterId, months[i]))).ms,
      );
    }
    const incrementalMs = median(incremental);

    step(`Dashboard and health at ${input.connections} connections…`);
    await load(input.baseUrl, '/api/health', input.connections, 1);
    const health = await load(input.baseUrl, '/api/health', input.connections, input.seconds);
    const dashboardAtFull = await dashboardP95(input, input.connections);

    const ratio = (a: number, b: number) => (a / Math.max(b, 0.001)).toFixed(3);
    return {
      rows: [
        {
          measure: 'full rebuild ÷ raw GROUP BY (first build)',
          value: ratio(first.ms, groupByMs),
          target: '≤ 2.0',
          detail: `${first.ms.toFixed(0)} ms for ${first.value.snapshots} snapshots ÷ ${groupByMs.toFixed(0)} ms`,
        },
        {
          measure: 'full rebuild ÷ raw GROUP BY (nightly, unchanged)',
          value: ratio(nightly.ms, groupByMs),
          target: '≤ 2.0',
          detail: `${nightly.ms.toFixed(0)} ms ÷ ${groupByMs.toFixed(0)} ms`,
        },
        {
          measure: 'incremental ÷ full rebuild',
          value: ratio(incrementalMs, first.ms),
          target: '≤ 0.01',
          detail: `median of ${incremental.length}: ${incrementalMs.toFixed(0)} ms (${Math.min(...incremental).toFixed(0)}–${Math.max(...incremental).toFixed(0)})`,
        },
        {
          measure: `dashboard p95 ÷ health p95 (${input.connections} clients)`,
          value: ratio(dashboardAtFull, health.p95Ms),
          target: '≤ 3',
          detail: `${dashboardAtFull} ms ÷ ${health.p95Ms} ms`,
        },
        {
          measure: 'dashboard p95 at 100 % ÷ at 10 % of the data',
          value: ratio(dashboardAtFull, dashboardAtTenth),
          target: '≤ 1.5',
          detail: `${dashboardAtFull} ms ÷ ${dashboardAtTenth} ms`,
        },
      ],
    };
  } finally {
    await context.close();
    await network.close();
  }
}

/** 'YYYY-MM' of `back` months before this one (negative numbers). */
function monthBack(back: number): string {
  const now = new Date();
  const date = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() + back, 1));
  return date.toISOString().slice(0, 7);
}

async function benchChapterIds(databaseUrl: string): Promise<number[]> {
  const connection = await connectTo(databaseUrl);
  try {
    const rows = await connection.query<Array<{ id: number }>>(
      "SELECT id FROM chapters WHERE name LIKE 'Bench chapter %' ORDER BY id",
    );
    return rows.map((row) => Number(row.id));
  } finally {
    await connection.end();
  }
}
