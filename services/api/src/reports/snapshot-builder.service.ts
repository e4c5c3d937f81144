import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import {
  monthPeriod,
  monthsBetween,
  periodDates,
  type MonthKey,
  type Period,
} from '@tallyloom/core';
import {
  buildCampaignSnapshot,
  campaignCreditFromRow,
  campaignCreditSql,
  campaignsOfChapterMonthSql,
  figuresFromRow,
  chaptersSql,
  monthRangeOf,
  networkFromRegions,
  periodStockSql,
  periodStocksFromRows,
  regionMonthFlowsFromRow,
  regionMonthFlowsSql,
  regionPeriodFromMonths,
  rollUpSnapshots,
  SnapshotRollup,
  storedTargetsOf,
  STORED_SCOPES,
  tallyStatusSql,
  targetsOfChapterMonth,
  type BuiltCampaignSnapshot,
  type BuiltSnapshot,
  type ChapterInfo,
  type ChapterInfoFilter,
  type FactsFilter,
  type MonthFlows,
  type MonthPart,
  type PeriodStock,
  type RegionPart,
  type SnapshotTarget,
  type SqlQuery,
  type TallyStatus,
} from '@tallyloom/reports';
import type { Connection } from 'mariadb';
import { QueryTypes, Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ViewCache } from '../cache/view-cache';
import { isoDate, jsonColumn, orNull } from '../common/sql/column-values';
import { SettingsService } from '../settings/settings.service';
import { latestMonth } from '../tallies/tally-clock';
import { CampaignSnapshot } from './models/campaign-snapshot.model';
import type { RebuildSummary } from './report-jobs';
import { batchRows, pooledExecute, pooledRows, selectRows } from './driver-rows';
import { chapterInfoFromRow, tallyStatusFromRow } from './snapshot-inputs';

// One rebuild at a time across every worker: two jobs touching the same region would otherwise
// each read before the other's tally committed and the later write could carry stale figures.
const LOCK_NAME = 'tallyloom:report-snapshots';
const LOCK_WAIT_SECONDS = 120;
const WRITE_CHUNK = 250;
const FLOW_READ_PARTS = 2;
/** The upsert of `rows` snapshots, each with the values of `snapshotValues`. */
const upsertSnapshotsSql = (rows: number) => `INSERT INTO report_snapshots (scope, scope_id,
    period_kind, period_key, period_from, period_to, figures, compliance, pending_tallies,
    source_revisions, as_of)
  VALUES ${Array.from({ length: rows }, () => '(?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)').join(', ')}
  ON DUPLICATE KEY UPDATE period_from = VALUES(period_from), period_to = VALUES(period_to),
    figures = VALUES(figures), compliance = VALUES(compliance),
    pending_tallies = VALUES(pending_tallies), source_revisions = VALUES(source_revisions),
    as_of = VALUES(as_of)`;
const UPSERT_SNAPSHOT_SQL = upsertSnapshotsSql(1);

/** As UTC text: the driver would send a Date in the process's time zone. */
const sqlTimestamp = (at: Date) => at.toISOString().slice(0, 23).replace('T', ' ');

/** One snapshot's values in the column order of `upsertSnapshotsSql`. */
function snapshotValues(snapshot: BuiltSnapshot, asOfText: string): unknown[] {
  const { fromDate, toDate } = periodDates(snapshot.period);
  return [
    snapshot.scope,
    snapshot.scopeId,
    snapshot.period.kind,
    snapshot.period.key,
    fromDate,
    toDate,
    JSON.stringify(snapshot.figures),
    JSON.stringify(snapshot.compliance),
    snapshot.pendingTallies,
    snapshot.sourceRevisions && JSON.stringify(snapshot.sourceRevisions),
    asOfText,
  ];
}

type Progress = (percent: number) => Promise<unknown>;
type Row = Record<string, unknown>;

/** A stored region row of one period, as far as the network needs it. */
type StoredRegionPart = RegionPart & { period: Pick<Period, 'kind' | 'key'> };

/** What `storedRegionRows` reads for an incremental rebuild. */
interface StoredRegionRows {
  /** Every region of the network. */
  regionIds: number[];
  otherRegions: StoredRegionPart[];
  /** With the UTC day each was built on. */
  ownMonths: Array<MonthPart & { builtOn: string }>;
}

/** Each region's first and last month any of its chapters is active in ('YYYY-MM'; null for none). */
const regionSpansSql = (regionIds: number[]): SqlQuery => ({
  sql: `SELECT g.id AS region_id, DATE_FORMAT(MIN(c.active_from), :monthFormat) AS first_month,
               DATE_FORMAT(MAX(COALESCE(c.active_to, :openEnd)), :monthFormat) AS last_month
          FROM regions g LEFT JOIN chapters c ON c.region_id = g.id
         WHERE g.id IN (:regionIds)
         GROUP BY g.id`,
  replacements: { monthFormat: '%Y-%m', openEnd: '9999-12-31', regionIds },
});

/**
 * Builds the stored report snapshots (regions and the network) and campaign snapshots from
 * approved tallies: reads the flows summed per region and month and one status row per tally,
 * rolls them up with the report definition, and upserts each snapshot (recompute, never
 * increment) with its as-of time and the revisions it was built from (listed on region months,
 * named through them by every row that adds them up: see `namesOwnSources`).
 */
@Injectable()
export class SnapshotBuilder {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(CampaignSnapshot) private readonly campaignSnapshots: typeof CampaignSnapshot,
    private readonly settings: SettingsService,
    private readonly views: ViewCache,
  ) {}

  /**
   * The snapshots one chapter-month touches, and the campaigns its receipts credit. The region's
   * month is rolled up from its chapters' tallies of that month; its quarter and fiscal year add
   * up that month and the region's other months (stored rows built today, the rest from their
   * tallies: see `unbuiltMonths`), with each period's stock summed by the database
   * (`periodStockSql`); the network adds up that region and the other regions' stored rows. So
   * the work grows neither with the size of the network nor with the length of its history, and
   * once the nightly rebuild has run it reads one month of tallies, not a year's. Chapters have
   * no stored rows: their figures are read live (ChapterFigures).
   */
  async rebuildForChapterMonth(chapterId: number, month: MonthKey): Promise<RebuildSummary> {
    return this.lockedThenInvalidate(async () => {
      // Reads side by side on pooled connections, outside the write transaction: the lock keeps
      // every other rebuild out, and each statement sees what was committed when it began. The
      // one that needs neither the region nor the fiscal year starts at once.
      const campaignsRead = this.pooled(campaignsOfChapterMonthSql(chapterId, month));
      // Awaited below; this only keeps a failure meanwhile from going unhandled.
      campaignsRead.catch(() => undefined);
      const [inRegion, { fiscalYearStartMonth }] = await Promise.all([
        this.pooledChapters({ regionOfChapterId: chapterId }),
        this.settings.current(),
      ]);
      const chapter = inRegion.find((each) => each.chapterId === chapterId);
      if (!chapter) throw new Error(`chapter ${chapterId} does not exist`);
      const targets = targetsOfChapterMonth(chapter, month, fiscalYearStartMonth, STORED_SCOPES);
      const periods = targets.filter((target) => target.scope === 'network').map((t) => t.period);
      const longer = periods.filter((period) => period.kind !== 'month');
      const range = monthRangeOf(targets)!;
      const chapterIds = inRegion.map((each) => each.chapterId);
      const [{ statuses, flows }, stored, stocks, campaignIds] = await Promise.all([
        this.pooledStatusesWithFlows({ chapterIds, from: month, to: month }, chapter.regionId),
        this.storedRegionRows(periods, chapter.regionId, range),
        this.pooledPeriodStocks(chapterIds, longer),
        campaignsRead.then((rows) => rows.map((row) => Number(row.campaign_id))),
      ]);
      const today = new Date().toISOString().slice(0, 10);
      // The region's month from its chapters' tallies; its quarter and fiscal year from its
      // months (this one, and the others as stored) with the stock of each period.
      const months = await this.regionMonthsFromFacts(
        { regionId: chapter.regionId, month, chapters: inRegion, statuses, flows },
        this.unbuiltMonths(stored, month, range, today),
        today,
      );
      const fresh = new Set(months.map((snapshot) => snapshot.period.key));
      const monthParts: MonthPart[] = [
        ...stored.ownMonths.filter((part) => !fresh.has(part.month)),
        ...months.map((snapshot) => ({ ...snapshot, month: snapshot.period.key })),
      ];
      const built = [
        months.find((snapshot) => snapshot.period.key === month)!,
        ...longer.map((period, index) =>
          regionPeriodFromMonths(
            { scope: 'region', scopeId: chapter.regionId, period },
            monthParts,
            stocks[index],
          ),
        ),
      ];

      const otherRegions = [
        ...stored.otherRegions,
        ...(await this.otherRegionsWithoutRows(periods, stored, chapter.regionId, today)),
      ];
      for (const period of periods) {
        const samePeriod = (each: { period: Pick<Period, 'kind' | 'key'> }) =>
          each.period.kind === period.kind && each.period.key === period.key;
        const regions = [
          ...built.filter((each) => each.scope === 'region' && samePeriod(each)),
          ...otherRegions.filter(samePeriod),
        ];
        built.push(networkFromRegions(period, regions));
      }
      const asOf = new Date();
      if (campaignIds.length === 0) {
        // One statement is atomic on its own: no transaction, and two round trips fewer.
        await this.upsertInOneStatement(built, asOf);
        return { snapshots: built.length, campaigns: 0 };
      }
      // Writes only: the default isolation does, and one statement fewer.
      return this.sequelize.transaction(async (transaction) => {
        await this.writeSnapshots(built, asOf, transaction);
        const campaigns = await this.rebuildCampaigns(campaignIds, asOf, transaction);
        return { snapshots: built.length, campaigns };
      });
    });
  }

  /**
   * The region's months in `range` other than `month` that are rolled up from their tallies:
   * those without a stored row (none built since the last full rebuild) or with one built before
   * today (its open or missing chapter-months were judged on another day), up to the latest
   * month a tally can be for. A full rebuild every night leaves none of either by day.
   */
  private unbuiltMonths(
    stored: StoredRegionRows,
    month: MonthKey,
    range: { from: MonthKey; to: MonthKey },
    today: string,
  ): MonthKey[] {
    const current = new Set(
      stored.ownMonths.filter((part) => part.builtOn === today).map((part) => part.month),
    );
    const last = latestMonth();
    return monthsBetween(range.from, range.to).filter(
      (each) => each !== month && each <= last && !current.has(each),
    );
  }

  /**
   * The region's snapshots of `month` (from the statuses and flows read for it) and of each of
   * `unbuilt` (read here), rolled up from its chapters' tallies.
   */
  private async regionMonthsFromFacts(
    read: {
      regionId: number;
      month: MonthKey;
      chapters: ChapterInfo[];
      statuses: TallyStatus[];
      flows: MonthFlows[];
    },
    unbuilt: MonthKey[],
    today: string,
  ): Promise<BuiltSnapshot[]> {
    const statuses = [...read.statuses];
    const flows = [...read.flows];
    if (unbuilt.length > 0) {
      const filter = {
        chapterIds: read.chapters.map((each) => each.chapterId),
        from: unbuilt[0],
        to: unbuilt.at(-1)!,
      };
      const { statuses: moreStatuses, flows: moreFlows } = await this.pooledStatusesWithFlows(
        filter,
        read.regionId,
      );
      // `month`'s own were read already; the roll-up skips every month it was not asked for.
      statuses.push(...moreStatuses.filter((status) => status.month !== read.month));
      flows.push(...moreFlows.filter((row) => row.month !== read.month));
    }
    const rollup = new SnapshotRollup(
      [read.month, ...unbuilt].map((each) => ({
        scope: 'region' as const,
        scopeId: read.regionId,
        period: monthPeriod(each),
      })),
      today,
    );
    rollup.addStatuses(read.chapters, statuses);
    rollup.addFlows(flows);
    return rollup.snapshots();
  }

  /**
   * The other regions without a stored row for one of the periods (nothing filed there since
   * the last full rebuild), built from their facts so their chapters still count as missing or
   * open; unless none of their chapters was active then (a region set up later), which adds
   * nothing. Their spans are read only when some row is missing, which is seldom.
   */
  private async otherRegionsWithoutRows(
    periods: Period[],
    stored: StoredRegionRows,
    regionId: number,
    today: string,
  ): Promise<BuiltSnapshot[]> {
    const has = new Set(
      stored.otherRegions.map((row) => `${row.scopeId}:${row.period.kind}:${row.period.key}`),
    );
    const lacking = periods.flatMap((period) =>
      stored.regionIds
        .filter((id) => id !== regionId && !has.has(`${id}:${period.kind}:${period.key}`))
        .map((id) => ({ regionId: id, period })),
    );
    if (lacking.length === 0) return [];
    const spans = new Map(
      (await this.pooled(regionSpansSql([...new Set(lacking.map((each) => each.regionId))]))).map(
        (row) => [
          Number(row.region_id),
          {
            firstMonth: orNull(row.first_month, String),
            lastMonth: orNull(row.last_month, String),
          },
        ],
      ),
    );
    const currentMonth = today.slice(0, 7);
    const missing = lacking
      .filter(({ regionId: id, period }) => {
        const span = spans.get(id);
        return (
          span?.firstMonth != null &&
          span.firstMonth <= (period.to < currentMonth ? period.to : currentMonth) &&
          span.lastMonth! >= period.from
        );
      })
      .map(({ regionId: id, period }) => ({ scope: 'region' as const, scopeId: id, period }));
    return missing.length > 0 ? this.regionsFromFacts(missing, today) : [];
  }

  /** Regions' snapshots for these targets, rolled up from their chapters' facts. */
  private async regionsFromFacts(
    targets: SnapshotTarget[],
    today: string,
  ): Promise<BuiltSnapshot[]> {
    const regionIds = [...new Set(targets.map((target) => target.scopeId))];
    const chapters = await this.pooledChapters({ regionIds });
    const filter = {
      ...monthRangeOf(targets)!,
      chapterIds: chapters.map((each) => each.chapterId),
    };
    const [flows, statuses] = await Promise.all([
      this.pooledFlows(filter),
      this.pooledStatuses(filter),
    ]);
    return rollUpSnapshots({ flows, chapters, statuses, today }, targets);
  }

  /**
   * Every region, and stored rows: the other regions' rows of these periods (for the network),
   * and one region's month rows in `range` (for its quarter and fiscal year).
   */
  private async storedRegionRows(
    periods: Period[],
    regionId: number,
    range: { from: MonthKey; to: MonthKey },
  ): Promise<StoredRegionRows> {
    const replacements: Record<string, unknown> = {
      regionId,
      fromKey: range.from,
      toKey: range.to,
      dayFormat: '%Y-%m-%d',
    };
    const wanted = periods.map((period, index) => {
      replacements[`kind${index}`] = period.kind;
      replacements[`key${index}`] = period.key;
      return `(period_kind = :kind${index} AND period_key = :key${index})`;
    });
    // The regions' ids are added as rows without a period: a join from the regions would make
    // the server read every stored row of each region to find the few wanted.
    const rows = await this.pooled({
      sql: `SELECT scope_id AS region_id, period_kind, period_key, figures, compliance,
                   pending_tallies, DATE_FORMAT(as_of, :dayFormat) AS built_on
              FROM report_snapshots
             WHERE scope = 'region' AND (
                   (scope_id <> :regionId AND (${wanted.join(' OR ')}))
                OR (scope_id = :regionId AND period_kind = 'month'
                    AND period_key BETWEEN :fromKey AND :toKey))
            UNION ALL
            SELECT id, NULL, NULL, NULL, NULL, NULL, NULL FROM regions`,
      replacements,
    });
    const regionIds = new Set<number>();
    const otherRegions: StoredRegionPart[] = [];
    const ownMonths: StoredRegionRows['ownMonths'] = [];
    for (const row of rows) {
      const scopeId = Number(row.region_id);
      regionIds.add(scopeId);
      const key = row.period_key;
      if (typeof key !== 'string') continue;
      const part = {
        figures: jsonColumn<BuiltSnapshot['figures']>(row.figures),
        compliance: jsonColumn<BuiltSnapshot['compliance']>(row.compliance),
        pendingTallies: Number(row.pending_tallies),
      };
      if (scopeId === regionId) {
        ownMonths.push({ ...part, month: key, builtOn: String(row.built_on) });
      } else {
        const kind = row.period_kind as Period['kind'];
        otherRegions.push({ ...part, scopeId, period: { kind, key } });
      }
    }
    return { regionIds: [...regionIds], otherRegions, ownMonths };
  }

  /** Every stored scope × every period from the network's first tally, and every campaign. */
  async rebuildAll(progress: Progress = () => Promise.resolve()): Promise<RebuildSummary> {
    return this.lockedThenInvalidate(() =>
      this.inTransaction(async (transaction) => {
        const chapters = await this.chapters(transaction);
        const { fiscalYearStartMonth } = await this.settings.current();
        // The flows' GROUP BY is the longest read: it runs on a connection of its own while the
        // statuses are read and rolled up. Each statement of a READ COMMITTED transaction sees
        // what was committed when it began, so this is no less consistent, and a tally approved
        // meanwhile queues its own rebuild, which waits for this one's lock.
        const flowsRead = this.regionFlowsInParts(chapters);
        // Awaited below; this only keeps a failure meanwhile from going unhandled.
        flowsRead.catch(() => undefined);
        // Every tally in any state: compliance, pending, stock, sources, and which months exist.
        const statuses = await this.statuses({}, transaction);
        // From the network's first tally to this month, months nobody filed count too.
        const firstMonth = statuses.reduce<string | null>(
          (earliest, { month }) => (earliest === null || month < earliest ? month : earliest),
          null,
        );
        const today = new Date().toISOString().slice(0, 10);
        const targets = firstMonth
          ? storedTargetsOf(
              chapters,
              statuses,
              { from: firstMonth, to: today.slice(0, 7) },
              fiscalYearStartMonth,
            )
          : [];
        const rollup = new SnapshotRollup(targets, today);
        rollup.addStatuses(chapters, statuses);
        await progress(10);
        rollup.addFlows(await flowsRead);
        const built = rollup.snapshots();
        await progress(40);
        const asOf = new Date();
        await this.writeSnapshots(built, asOf, transaction, async (done) =>
          progress(40 + Math.floor((50 * done) / Math.max(built.length, 1))),
        );
        const campaignIds = (
          await this.select({ sql: 'SELECT id FROM campaigns', replacements: {} }, transaction)
        ).map((row) => Number(row.id));
        const campaigns = await this.rebuildCampaigns(campaignIds, asOf, transaction);
        await progress(100);
        return { snapshots: built.length, campaigns };
      }),
    );
  }

  /**
   * Every region's flows, summed by the database in parts of the chapters on connections of
   * their own, side by side: one GROUP BY runs on one core, and a region's rows from two parts
   * simply add up in the roll-up.
   */
  private async regionFlowsInParts(chapters: readonly ChapterInfo[]): Promise<MonthFlows[]> {
    const ids = chapters.map((chapter) => chapter.chapterId);
    const size = Math.ceil(ids.length / FLOW_READ_PARTS);
    const parts = Array.from({ length: FLOW_READ_PARTS }, (_, index) =>
      ids.slice(index * size, (index + 1) * size),
    ).filter((part) => part.length > 0);
    return (await Promise.all(parts.map((chapterIds) => this.pooledFlows({ chapterIds })))).flat();
  }

  private async statuses(filter: FactsFilter, transaction: Transaction): Promise<TallyStatus[]> {
    return (await selectRows(transaction, tallyStatusSql(filter))).map(tallyStatusFromRow);
  }

  /**
   * Upserts snapshots in the driver's bulk protocol: a full rebuild writes a row per stored scope
   * × period, megabytes of JSON in all, and model instances or escaped SQL text for each would
   * cost more than the writes themselves.
   */
  private async writeSnapshots(
    built: BuiltSnapshot[],
    asOf: Date,
    transaction: Transaction,
    progress: (done: number) => Promise<unknown> = () => Promise.resolve(),
  ): Promise<void> {
    const asOfText = sqlTimestamp(asOf);
    const valuesOf = (snapshot: BuiltSnapshot) => snapshotValues(snapshot, asOfText);
    // The next chunk's JSON is written while the server stores the one before (one statement
    // at a time on the connection, but the two processes work side by side).
    let writing: Promise<void> | null = null;
    for (let start = 0; start < built.length; start += WRITE_CHUNK) {
      const rows = built.slice(start, start + WRITE_CHUNK).map(valuesOf);
      if (writing) {
        await writing;
        await progress(start);
      }
      writing = batchRows(transaction, UPSERT_SNAPSHOT_SQL, rows);
    }
    if (writing) await writing;
    await progress(built.length);
  }

  /** A few snapshots upserted by one multi-row statement on a pooled connection. */
  private async upsertInOneStatement(built: BuiltSnapshot[], asOf: Date): Promise<void> {
    if (built.length === 0) return;
    const asOfText = sqlTimestamp(asOf);
    await pooledExecute(
      this.sequelize,
      upsertSnapshotsSql(built.length),
      built.flatMap((snapshot) => snapshotValues(snapshot, asOfText)),
    );
  }

  private async rebuildCampaigns(
    campaignIds: number[],
    asOf: Date,
    transaction: Transaction,
  ): Promise<number> {
    if (campaignIds.length === 0) return 0;
    const campaigns = await this.select(
      {
        sql: `SELECT id, DATE_FORMAT(starts_on, :dayFormat) AS starts_on,
                     DATE_FORMAT(ends_on, :dayFormat) AS ends_on
                FROM campaigns WHERE id IN (:campaignIds)`,
        replacements: { campaignIds, dayFormat: '%Y-%m-%d' },
      },
      transaction,
    );
    const credits = (await this.select(campaignCreditSql({ campaignIds }), transaction)).map(
      campaignCreditFromRow,
    );
    const today = new Date().toISOString().slice(0, 10);
    const built: BuiltCampaignSnapshot[] = campaigns.map((row) =>
      buildCampaignSnapshot(
        { id: Number(row.id), startsOn: isoDate(row.starts_on), endsOn: isoDate(row.ends_on) },
        credits,
        today,
      ),
    );
    await this.campaignSnapshots.bulkCreate(
      built.map((snapshot) => ({ ...snapshot, asOf })),
      { transaction, updateOnDuplicate: ['figures', 'sourceRevisions', 'asOf'] },
    );
    return built.length;
  }

  private async chapters(
    transaction: Transaction,
    filter: ChapterInfoFilter = {},
  ): Promise<ChapterInfo[]> {
    return (await selectRows(transaction, chaptersSql(filter))).map(chapterInfoFromRow);
  }

  private select(query: SqlQuery, transaction: Transaction): Promise<Row[]> {
    return this.sequelize.query<Row>(query.sql, {
      type: QueryTypes.SELECT,
      replacements: query.replacements,
      transaction,
    });
  }

  /** Cached dashboards are dropped once the new snapshots are committed, not before. */
  private async lockedThenInvalidate<T>(work: () => Promise<T>): Promise<T> {
    const result = await this.locked(work);
    await this.views.invalidate();
    return result;
  }

  /** The writes (and a full rebuild's reads) in one READ COMMITTED transaction. */
  private inTransaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
    return this.sequelize.transaction(
      { isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED },
      work,
    );
  }

  private pooled(query: SqlQuery): Promise<Row[]> {
    return pooledRows(this.sequelize, query);
  }

  /** Flows summed per region and month (a few rows per region and month), on a pooled connection. */
  private async pooledFlows(filter: FactsFilter): Promise<MonthFlows[]> {
    return (await this.pooled(regionMonthFlowsSql(filter))).map(regionMonthFlowsFromRow);
  }

  private async pooledChapters(filter: ChapterInfoFilter): Promise<ChapterInfo[]> {
    return (await this.pooled(chaptersSql(filter))).map(chapterInfoFromRow);
  }

  private async pooledStatuses(filter: FactsFilter): Promise<TallyStatus[]> {
    return (await this.pooled(tallyStatusSql(filter))).map(tallyStatusFromRow);
  }

  /**
   * Statuses, and the flows of each approved tally (per chapter), from one statement: what an
   * incremental rebuild needs of a region's month.
   */
  private async pooledStatusesWithFlows(
    filter: FactsFilter,
    regionId: number,
  ): Promise<{ statuses: TallyStatus[]; flows: MonthFlows[] }> {
    const rows = await this.pooled(tallyStatusSql(filter, { withFlows: true }));
    const statuses = rows.map(tallyStatusFromRow);
    const flows = rows.flatMap((row, index): MonthFlows[] => {
      const { chapterId, month, approved } = statuses[index];
      return approved ? [{ chapterId, regionId, month, figures: figuresFromRow(row) }] : [];
    });
    return { statuses, flows };
  }

  /** Each period's stock of these chapters, in the order of `periods`. */
  private async pooledPeriodStocks(
    chapterIds: number[],
    periods: Period[],
  ): Promise<PeriodStock[]> {
    const rows = await this.pooled(periodStockSql({ chapterIds, periods }));
    return periodStocksFromRows(rows, periods.length);
  }

  /**
   * Runs the rebuild while a named lock is held on a connection of its own (a named lock belongs
   * to the connection, not to a transaction). The lock is released only after the work has
   * committed, so the next rebuild's reads see every snapshot and tally committed before it won
   * the lock; should the connection die, the server releases the lock itself.
   */
  private async locked<T>(work: () => Promise<T>): Promise<T> {
    const manager = this.sequelize.connectionManager;
    const holder = (await manager.getConnection({ type: 'write' })) as Connection;
    try {
      const [{ got }] = await holder.query<Array<{ got: number | null }>>(
        'SELECT GET_LOCK(?, ?) AS got',
        [LOCK_NAME, LOCK_WAIT_SECONDS],
      );
      if (Number(got) !== 1) throw new Error('another snapshot rebuild held the lock too long');
      try {
        return await work();
      } finally {
        await holder.query('SELECT RELEASE_LOCK(?)', [LOCK_NAME]);
      }
    } finally {
      manager.releaseConnection(holder);
    }
  }
}
