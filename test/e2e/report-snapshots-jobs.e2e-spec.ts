import { getConnectionToken } from '@nestjs/sequelize';
import type { TallyDetail } from '@tallyloom/core';
import type { CampaignSnapshotFigures } from '@tallyloom/reports';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { QueueName } from '../../services/api/src/jobs/queue-names';
import { ReportJob } from '../../services/api/src/reports/report-jobs';
import { SettingsService } from '../../services/api/src/settings/settings.service';
import { createReceipt, receiptInput } from './fixtures/receipts';
import {
  differences,
  liveChapterSnapshots,
  monthsOfKey,
  periodKeysOf,
  readWorld,
  recompute,
  storedSnapshots,
  type StoredSnapshot,
} from './fixtures/report-recompute';
import {
  aTallyChapter,
  approvedTally,
  caller,
  consistentValues,
  createTally,
  type TallyChapter,
} from './fixtures/tallies';
import { queueOf } from './support/job-queues';
import { aCampaign } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(300_000);

// Months of 2018, away from the demo history and the other suites' months; consecutive (a
// chapter files its months in order) and in different quarters.
const FIRST = '2018-03';
const SECOND = '2018-04';

describe('report snapshots: rebuilt by jobs after approvals', () => {
  let testApp: TestApp;
  let sequelize: Sequelize;
  let fiscalYearStartMonth: number;
  const today = () => new Date().toISOString().slice(0, 10);

  beforeAll(async () => {
    testApp = await startTestApp();
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    ({ fiscalYearStartMonth } = await testApp.app.get(SettingsService).current());
  });
  afterAll(() => testApp.close());

  // March belongs to the fiscal year ending in 2019 when that year starts in February or March.
  const fiscalYearOfFirst = () =>
    fiscalYearStartMonth > 1 && fiscalYearStartMonth <= 3 ? 'FY2019' : 'FY2018';

  /** The region's stored rows, and the chapter's figures (read live) for the same periods. */
  const ofChapter = async (world: TallyChapter) => {
    const region = await storedSnapshots(testApp.app, "scope = 'region' AND scope_id = :regionId", {
      regionId: world.region.id,
    });
    const chapter = await liveChapterSnapshots(
      testApp.app,
      [world.chapter.id],
      periodKeysOf(region),
      fiscalYearStartMonth,
    );
    return [...region, ...chapter];
  };

  /** True while a rebuild of this chapter is still queued or running. */
  async function rebuildPending(world: TallyChapter): Promise<boolean> {
    const jobs = await queueOf(testApp.app, QueueName.Reports).getJobs([
      'waiting',
      'active',
      'delayed',
    ]);
    return jobs.some(
      (job) => (job?.data as { chapterId?: number } | undefined)?.chapterId === world.chapter.id,
    );
  }

  /**
   * Polls until `ready` holds for the chapter's snapshots and no rebuild of the chapter is left
   * (a submission and its approval each queue one): the jobs run in their own time.
   */
  async function eventually(
    world: TallyChapter,
    ready: (rows: StoredSnapshot[]) => boolean,
  ): Promise<StoredSnapshot[]> {
    const deadline = Date.now() + 120_000;
    for (;;) {
      // Asked first: once nothing is left, the rows read next are the final ones.
      const settled = !(await rebuildPending(world));
      const rows = await ofChapter(world);
      if (settled && ready(rows)) return rows;
      if (Date.now() > deadline) throw new Error('the snapshot job did not run within 2 minutes');
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
  }

  const row = (rows: StoredSnapshot[], scope: string, key: string) =>
    rows.find((each) => each.scope === scope && each.periodKey === key);

  /** A stored (region) row names the revision: the job has run (chapters are read live). */
  const names = (tally: TallyDetail, revision: number) => (rows: StoredSnapshot[]) =>
    rows.some(
      (each) =>
        each.scope === 'region' &&
        each.sourceRevisions.some(([id, rev]) => id === tally.id && rev === revision),
    );

  /**
   * Every row equals a recompute. `withCompliance: false` for network rows: other suites add
   * chapters active in these months at any time, and compliance counts every active chapter.
   */
  async function expectRecomputed(rows: StoredSnapshot[], { withCompliance = true } = {}) {
    const world = await readWorld(testApp.app);
    const problems = rows.flatMap((each) =>
      differences(
        each,
        recompute(
          world,
          each.scope,
          each.scopeId,
          monthsOfKey(each.periodKind, each.periodKey, fiscalYearStartMonth),
          today(),
        ),
      ).filter((problem) => withCompliance || !problem.includes(' compliance ')),
    );
    expect(problems).toEqual([]);
  }

  async function approve(
    world: TallyChapter,
    month: string,
    opening?: { panels: number; blankets: number },
  ) {
    const created = await createTally(testApp, world.lead.token, {
      chapterId: world.chapter.id,
      month,
      ...(opening ? { opening } : {}),
    });
    const values = consistentValues(created.values, {
      sizeId: world.size.id,
      agencyId: world.agency.id,
    });
    return approvedTally(testApp, created, values, {
      writer: world.lead.token,
      reviewer: world.coordinator.token,
    });
  }

  it('rebuilds what an approval touches, leaves the rest, follows an amendment, and credits campaigns', async () => {
    // A chapter of another region already approved for the same month: the network rows built
    // later for our region must still count it.
    const neighbour = await aTallyChapter(testApp, '2018-01-01');
    const theirs = await approve(neighbour, FIRST, { panels: 40, blankets: 1 });
    await eventually(neighbour, names(theirs, 1));
    const world = await aTallyChapter(testApp, '2018-01-01');
    const campaign = await aCampaign().running('2018-01-15', '2018-04-30').build(testApp.app);
    await createReceipt(
      testApp,
      world.lead.token,
      receiptInput(world.chapter.id, {
        receivedOn: `${FIRST}-06`,
        campaignCode: campaign.code,
        panelsAccepted: 30,
      }),
    );

    // (c) The first approval: its month, quarter and fiscal year appear for chapter and region.
    const first = await approve(world, FIRST, { panels: 60, blankets: 2 });
    const afterFirst = await eventually(world, names(first, 1));
    const fiscalYear = fiscalYearOfFirst();
    const firstKeys = [FIRST, '2018-Q1', fiscalYear];
    for (const scope of ['chapter', 'region']) {
      for (const key of firstKeys) expect(row(afterFirst, scope, key)).toBeDefined();
    }
    expect(row(afterFirst, 'chapter', FIRST)!.figures).toMatchObject({
      panelsAccepted: 30,
      volunteerHours: 6.5,
      approvedTallies: 1,
    });
    await expectRecomputed(afterFirst);
    const credited = await sequelize.query<{ figures: unknown }>(
      'SELECT figures FROM campaign_snapshots WHERE campaign_id = :id',
      { type: QueryTypes.SELECT, replacements: { id: campaign.id } },
    );
    const campaignFigures = (
      typeof credited[0].figures === 'string'
        ? JSON.parse(credited[0].figures)
        : credited[0].figures
    ) as CampaignSnapshotFigures;
    expect(campaignFigures).toMatchObject({ creditedPanels: 30, pendingPanels: 0 });
    // 2018-03-06 is 49 days after the start: the eighth campaign week.
    expect(campaignFigures.weekly[7]).toMatchObject({ panels: 30, cumulative: 30 });

    // The second approval, in another quarter: its jobs write exactly what it touches (region
    // and network × month, quarter and fiscal year), never the first month's rows. (Their
    // as-of cannot show it: another suite's full rebuild may rewrite every row meanwhile.)
    const second = await approve(world, SECOND);
    const afterSecond = await eventually(world, names(second, 1));
    const secondJobs = (await queueOf(testApp.app, QueueName.Reports).getCompleted()).filter(
      (job) => {
        const data = job.data as { chapterId?: number; month?: string };
        return data.chapterId === world.chapter.id && data.month === SECOND;
      },
    );
    expect(secondJobs.length).toBeGreaterThan(0);
    for (const job of secondJobs) expect(job.returnvalue).toMatchObject({ snapshots: 6 });
    for (const scope of ['chapter', 'region']) {
      expect(row(afterSecond, scope, SECOND)).toBeDefined();
      expect(row(afterSecond, scope, '2018-Q2')).toBeDefined();
    }
    await expectRecomputed(afterSecond);

    // (d) An amendment: while it is under way the approved revision stays in force (pending 1);
    // once approved, the snapshots follow revision 2.
    const lead = caller(testApp, world.lead.token);
    const amending = await lead.post(`/api/tallies/${second.id}/amend`, {
      version: second.version,
      reason: 'Hours were counted twice.',
    });
    expect(amending.status).toBe(200);
    const draft = amending.body as TallyDetail;
    // Starting the amendment queues its own rebuild: the region's row counts it as pending.
    const whileAmending = await eventually(
      world,
      (rows) => row(rows, 'region', SECOND)?.pendingTallies === 1,
    );
    expect(row(whileAmending, 'chapter', SECOND)!.pendingTallies).toBe(1);
    expect(row(whileAmending, 'chapter', SECOND)!.sourceRevisions).toEqual([[second.id, 1]]);
    await expectRecomputed(whileAmending);

    await approvedTally(
      testApp,
      draft,
      { ...draft.values, volunteerHours: 3.25 },
      { writer: world.lead.token, reviewer: world.coordinator.token },
    );
    const amended = await eventually(world, names(second, 2));
    expect(row(amended, 'chapter', SECOND)!.figures.volunteerHours).toBe(3.25);
    expect(row(amended, 'chapter', SECOND)!.pendingTallies).toBe(0);
    expect(row(amended, 'region', '2018-Q2')!.sourceRevisions).toEqual([[second.id, 2]]);
    await expectRecomputed(amended);
    // The network rows of an incremental rebuild (summed from the regions) equal a recompute
    // from every chapter too.
    const network = await storedSnapshots(
      testApp.app,
      "scope = 'network' AND period_key IN (:keys)",
      { keys: [FIRST, SECOND, '2018-Q1', '2018-Q2'] },
    );
    expect(network).toHaveLength(4);
    expect(network.find((each) => each.periodKey === SECOND)!.sourceRevisions).toContainEqual([
      second.id,
      2,
    ]);
    expect(network.find((each) => each.periodKey === FIRST)!.sourceRevisions).toContainEqual([
      theirs.id,
      1,
    ]);
    await expectRecomputed(network, { withCompliance: false });
  });

  it('gives the same figures when the same job runs twice (idempotent)', async () => {
    const world = await aTallyChapter(testApp, '2018-01-01');
    const tally = await approve(world, FIRST, { panels: 80, blankets: 1 });
    await eventually(world, names(tally, 1));
    const queue = queueOf(testApp.app, QueueName.Reports);
    // What this job touches; a full rebuild queued by another suite may add other months.
    const fiscalYear = fiscalYearOfFirst();
    const touched = new Set([FIRST, '2018-Q1', fiscalYear]);
    const runOnce = async () => {
      const job = await queue.add(ReportJob.ChapterMonth, {
        chapterId: world.chapter.id,
        month: FIRST,
      });
      await job.finished();
      return (await ofChapter(world)).filter((each) => touched.has(each.periodKey));
    };
    const once = await runOnce();
    const twice = await runOnce();
    const content = (rows: StoredSnapshot[]) =>
      rows
        .map(({ asOf: _asOf, ...rest }) => rest)
        .sort((a, b) => `${a.scope}${a.periodKey}`.localeCompare(`${b.scope}${b.periodKey}`));
    expect(content(twice)).toEqual(content(once));
    expect(content(once)).toHaveLength(6);
    // Recomputed, not skipped: each run wrote the stored rows anew.
    for (const each of twice.filter((row) => row.scope === 'region')) {
      expect(each.asOf.getTime()).toBeGreaterThan(
        once.find((o) => o.scope === each.scope && o.periodKey === each.periodKey)!.asOf.getTime(),
      );
    }
    expect(
      twice.find((each) => each.scope === 'chapter' && each.periodKey === FIRST)!.figures,
    ).toMatchObject({ approvedTallies: 1, panelsInStock: 60 });
  });
});
