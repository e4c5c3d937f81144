import { getConnectionToken } from '@nestjs/sequelize';
import { periodsContaining } from '@tallyloom/core';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { SnapshotBuilder } from '../../services/api/src/reports/snapshot-builder.service';
import { SettingsService } from '../../services/api/src/settings/settings.service';
import {
  differences,
  liveChapterSnapshots,
  monthsOfKey,
  periodKeysOf,
  readWorld,
  recompute,
  storedSnapshots,
  worldOfSources,
  type StoredSnapshot,
  type World,
} from './fixtures/report-recompute';
import { aRegion } from './support/network-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(300_000);

const DEMO_REGIONS = ['North Ridge', 'Riverlands', 'Coastal Plain', 'High Mesa'];

/** A small seeded generator (mulberry32), so a failing random network can be built again. */
function seeded(seed: number) {
  let state = seed >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return { next, int: (min: number, max: number) => min + Math.floor(next() * (max - min + 1)) };
}

describe('report snapshots: a full rebuild equals a direct recompute', () => {
  let testApp: TestApp;
  let builder: SnapshotBuilder;
  let sequelize: Sequelize;
  let fiscalYearStartMonth: number;
  const today = () => new Date().toISOString().slice(0, 10);

  beforeAll(async () => {
    testApp = await startTestApp();
    builder = testApp.app.get(SnapshotBuilder);
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    ({ fiscalYearStartMonth } = await testApp.app.get(SettingsService).current());
  });
  afterAll(() => testApp.close());

  /** Every stored chapter and region snapshot of the regions given, against the recompute. */
  function checkScopes(world: World, stored: StoredSnapshot[], regionIds: number[]) {
    const chapterIds = new Set(
      world.chapters.filter((c) => regionIds.includes(c.regionId)).map((c) => c.id),
    );
    const mine = stored.filter((row) =>
      row.scope === 'region' ? regionIds.includes(row.scopeId) : chapterIds.has(row.scopeId),
    );
    const problems = mine.flatMap((row) => {
      const months = monthsOfKey(row.periodKind, row.periodKey, fiscalYearStartMonth);
      const bounds =
        row.periodFrom === `${months[0]}-01` && row.periodTo.slice(0, 7) === months.at(-1)
          ? []
          : [`${row.periodKey} bounds ${row.periodFrom}..${row.periodTo}`];
      return [
        ...bounds,
        ...differences(row, recompute(world, row.scope, row.scopeId, months, today())),
      ];
    });
    return { checked: mine, problems, chapterIds };
  }

  /**
   * Each revision is listed once, on its region's month; every other stored row names its
   * revisions through the region months it adds up (and `checkScopes` re-added those).
   */
  function expectSourcesListedOnRegionMonthsOnly(checked: StoredSnapshot[]) {
    const stored = checked.filter((row) => row.scope !== 'chapter');
    expect(
      stored.filter(
        (row) => row.listsOwnSources !== (row.scope === 'region' && row.periodKind === 'month'),
      ),
    ).toEqual([]);
    expect(stored.some((row) => !row.listsOwnSources && row.sourceRevisions.length > 0)).toBe(true);
  }

  /** The scope × period keys the watched chapters' tallies call for: 'scope:id:periodKey'. */
  function wantedKeys(world: World, chapterIds: Set<number>): Set<string> {
    const regionOf = new Map(world.chapters.map((c) => [c.id, c.regionId]));
    const wanted = new Set<string>();
    for (const tally of world.tallies.filter((t) => chapterIds.has(t.chapterId))) {
      const [year, month] = tally.month.split('-').map(Number);
      const quarter = `${year}-Q${Math.ceil(month / 3)}`;
      const fiscalYear = `FY${month >= fiscalYearStartMonth && fiscalYearStartMonth > 1 ? year + 1 : year}`;
      for (const key of [tally.month, quarter, fiscalYear]) {
        wanted.add(`chapter:${tally.chapterId}:${key}`);
        wanted.add(`region:${regionOf.get(tally.chapterId)}:${key}`);
        wanted.add(`network:0:${key}`);
      }
    }
    return wanted;
  }

  /**
   * The stored rows with the watched regions' chapters read live (chapters have no stored rows)
   * for every period a row is stored for.
   */
  async function withChapters(stored: StoredSnapshot[], world: World, regionIds: number[]) {
    const chapterIds = world.chapters
      .filter((c) => regionIds.includes(c.regionId))
      .map((c) => c.id);
    const periods = periodKeysOf(
      stored.filter((row) => row.scope === 'region' && regionIds.includes(row.scopeId)),
    );
    return [
      ...stored,
      ...(await liveChapterSnapshots(testApp.app, chapterIds, periods, fiscalYearStartMonth)),
    ];
  }

  /** Each watched chapter and region has a snapshot for every period in which it has tallies. */
  function missingRows(world: World, stored: StoredSnapshot[], chapterIds: Set<number>): string[] {
    const have = new Set(stored.map((row) => `${row.scope}:${row.scopeId}:${row.periodKey}`));
    return [...wantedKeys(world, chapterIds)].filter((key) => !have.has(key));
  }

  /**
   * The network is shared with suites running alongside (some write rows of far-past periods
   * by hand), so only its periods with the watched chapters' tallies are checked: its figures
   * against the revisions it names, recomputed independently, and those must include every
   * approved revision of the watched chapters.
   */
  function checkNetwork(world: World, stored: StoredSnapshot[], chapterIds: Set<number>) {
    const wanted = wantedKeys(world, chapterIds);
    return stored
      .filter((row) => row.scope === 'network' && wanted.has(`network:0:${row.periodKey}`))
      .flatMap((row) => {
        const months = monthsOfKey(row.periodKind, row.periodKey, fiscalYearStartMonth);
        const claimed = recompute(
          worldOfSources(world, row.sourceRevisions),
          'network',
          0,
          months,
          today(),
        );
        const named = new Set(row.sourceRevisions.map(([t, r]) => `${t}:${r}`));
        const missing = world.approved
          .filter((a) => chapterIds.has(a.chapterId) && months.includes(a.month))
          .filter((a) => !named.has(`${a.tallyId}:${a.revision}`));
        return [
          ...differences(row, {
            ...claimed,
            compliance: row.compliance,
            pendingTallies: row.pendingTallies,
          }),
          ...missing.map((a) => `network ${row.periodKey} lacks ${a.tallyId}:${a.revision}`),
        ];
      });
  }

  it('over the whole demo network', async () => {
    await builder.rebuildAll();
    const world = await readWorld(testApp.app);
    const regionIds = (
      await sequelize.query<{ id: number }>('SELECT id FROM regions WHERE name IN (:names)', {
        type: QueryTypes.SELECT,
        replacements: { names: DEMO_REGIONS },
      })
    ).map((row) => Number(row.id));
    expect(regionIds).toHaveLength(DEMO_REGIONS.length);
    const stored = await withChapters(await storedSnapshots(testApp.app), world, regionIds);
    // Only regions and the network are stored: a full rebuild writes no chapter rows.
    expect(
      (await storedSnapshots(testApp.app, "scope = 'chapter'")).map((row) => row.scopeId),
    ).toEqual([]);

    const { checked, problems, chapterIds } = checkScopes(world, stored, regionIds);
    expect(problems).toEqual([]);
    expect(missingRows(world, stored, chapterIds)).toEqual([]);
    expectSourcesListedOnRegionMonthsOnly(checked);
    // Two years of demo history: the check covered real figures, not empty rows.
    expect(checked.filter((row) => Number(row.figures.approvedTallies) > 0).length).toBeGreaterThan(
      300,
    );
    expect(checked.some((row) => row.pendingTallies > 0)).toBe(true);
    expect(checked.some((row) => row.compliance.late > 0)).toBe(true);
    expect(checkNetwork(world, stored, chapterIds)).toEqual([]);
  });

  it.each([20261202, 7, 424242])('over a random network (seed %i)', async (seed) => {
    const random = seeded(seed);
    const regions = [];
    for (let r = 0; r < random.int(2, 3); r++) {
      let region = aRegion().named(`Random ${seed}`);
      for (let c = 0; c < random.int(1, 4); c++) {
        const opened = `2016-${String(random.int(1, 6)).padStart(2, '0')}-${String(random.int(1, 28)).padStart(2, '0')}`;
        region = region.withChapter(`Random ${seed} ${r}.${c}`, opened, random.int(1, 31));
      }
      regions.push(await region.build(testApp.app));
    }
    const [[size1], [size2]] = [
      await sequelize.query<{ id: number }>('SELECT id FROM blanket_sizes ORDER BY id LIMIT 1', {
        type: QueryTypes.SELECT,
      }),
      await sequelize.query<{ id: number }>(
        'SELECT id FROM blanket_sizes ORDER BY id DESC LIMIT 1',
        {
          type: QueryTypes.SELECT,
        },
      ),
    ].map((rows) => rows.map((row) => Number(row.id)));
    const agencies = (
      await sequelize.query<{ id: number }>('SELECT id FROM partner_agencies ORDER BY id LIMIT 2', {
        type: QueryTypes.SELECT,
      })
    ).map((row) => Number(row.id));
    const groups = ['infants', 'children', 'adults', 'olderAdults', 'disasterAffected'];
    const states = [
      'approved',
      'approved',
      'approved',
      'amended',
      'amending',
      'submitted',
      'returned',
      'draft',
    ];

    const insert = async (sql: string, replacements: Record<string, unknown>) =>
      (await sequelize.query(sql, { type: QueryTypes.INSERT, replacements }))[0];
    const addRevision = async (tallyId: number, revision: number, state: string) => {
      const panels = random.int(0, 400);
      const revisionId = await insert(
        `INSERT INTO tally_revisions
           (tally_id, revision, state, panels_opening, panels_accepted, set_aside_off_size,
            set_aside_hard_care, set_aside_soiled, set_aside_other, panels_used, panels_closing,
            blankets_opening, blankets_received, blankets_closing, volunteer_hours, yarn_kg,
            created_at, updated_at)
         VALUES (:tallyId, :revision, :state, 0, :panels, :a, :b, :c, :d, :used, :closing, 0,
                 :received, :blanketsClosing, :hours, :yarn, NOW(), NOW())`,
        {
          tallyId,
          revision,
          state,
          panels,
          a: random.int(0, 9),
          b: random.int(0, 9),
          c: random.int(0, 9),
          d: random.int(0, 9),
          used: random.int(0, panels),
          closing: random.int(0, 900),
          received: random.int(0, 5),
          blanketsClosing: random.int(0, 40),
          hours: random.int(0, 20000) / 100,
          yarn: random.next() < 0.3 ? null : random.int(0, 9_000_000) / 1_000_000,
        },
      );
      // Several lines per table, so a join that fans out would count them twice.
      for (const sizeId of new Set([size1, size2])) {
        await insert(
          'INSERT INTO tally_blankets_assembled (revision_id, blanket_size_id, count) VALUES (:revisionId, :sizeId, :n)',
          { revisionId, sizeId, n: random.int(0, 12) },
        );
        for (const agencyId of agencies) {
          await insert(
            'INSERT INTO tally_blankets_given (revision_id, blanket_size_id, partner_agency_id, count) VALUES (:revisionId, :sizeId, :agencyId, :n)',
            { revisionId, sizeId, agencyId, n: random.int(0, 6) },
          );
        }
      }
      for (const agencyId of agencies) {
        for (const group of groups.filter(() => random.next() < 0.6)) {
          await insert(
            'INSERT INTO tally_people_served (revision_id, partner_agency_id, people_group, count) VALUES (:revisionId, :agencyId, :group, :n)',
            { revisionId, agencyId, group, n: random.int(0, 30) },
          );
        }
      }
    };

    for (const { chapters } of regions) {
      for (const chapter of chapters) {
        for (let m = 0; m < 18; m++) {
          const month = `${2016 + Math.floor(m / 12)}-${String((m % 12) + 1).padStart(2, '0')}`;
          if (month < chapter.activeFrom.slice(0, 7) || random.next() < 0.2) continue;
          const kind = states[random.int(0, states.length - 1)];
          const filed = kind !== 'draft';
          const due = `${month}-28`;
          const submittedAt = filed ? new Date(`${due}T12:00:00Z`) : null;
          if (submittedAt) submittedAt.setUTCDate(submittedAt.getUTCDate() + random.int(0, 40));
          const current = kind === 'amended' || kind === 'amending' ? 2 : 1;
          const approvedRevision =
            kind === 'approved' || kind === 'amending' ? 1 : kind === 'amended' ? 2 : null;
          const state =
            kind === 'amended' || kind === 'approved'
              ? 'approved'
              : kind === 'amending'
                ? 'draft'
                : kind;
          const tallyId = await insert(
            `INSERT INTO monthly_tallies (chapter_id, month, state, current_revision,
               approved_revision, first_submitted_at, created_at, updated_at)
             VALUES (:chapterId, :month, :state, :current, :approvedRevision, :submittedAt, NOW(), NOW())`,
            {
              chapterId: chapter.id,
              month: `${month}-01`,
              state,
              current,
              approvedRevision,
              submittedAt,
            },
          );
          if (kind === 'amended') {
            await addRevision(tallyId, 1, 'superseded');
            await addRevision(tallyId, 2, 'approved');
          } else if (kind === 'amending') {
            await addRevision(tallyId, 1, 'approved');
            await addRevision(tallyId, 2, 'draft');
          } else {
            await addRevision(tallyId, 1, kind);
          }
        }
      }
    }

    await builder.rebuildAll();
    const world = await readWorld(testApp.app);
    const regionIds = regions.map(({ region }) => region.id);
    const stored = await withChapters(await storedSnapshots(testApp.app), world, regionIds);
    const { checked, problems, chapterIds } = checkScopes(world, stored, regionIds);
    expect(problems).toEqual([]);
    expect(missingRows(world, stored, chapterIds)).toEqual([]);
    expectSourcesListedOnRegionMonthsOnly(checked);
    expect(checked.length).toBeGreaterThan(20);
    expect(checkNetwork(world, stored, chapterIds)).toEqual([]);

    // Then a few changes, each followed by the job's incremental rebuild of its chapter-month:
    // the region's month from its tallies, its quarter and fiscal year from its months and
    // each period's stock, the network from the regions. Two other months of the first
    // change's fiscal year are spoiled first: one row dropped, as if never built, and one
    // marked as built on an earlier day, with a pending count no tally has. The rebuilds must
    // roll both up from their tallies instead of adding up what is stored.
    const changedAt = new Date(Date.now() - 1000);
    const changes = await changeTallies(random, regionIds);
    expect(changes.length).toBeGreaterThan(2);
    const [first] = changes;
    const fiscalYear = periodsContaining(first.month, fiscalYearStartMonth)[2];
    const others = await sequelize.query<{ period_key: string }>(
      `SELECT period_key FROM report_snapshots
        WHERE scope = 'region' AND scope_id = :regionId AND period_kind = 'month'
          AND period_key BETWEEN :from AND :to AND period_key <> :month
        ORDER BY period_key`,
      {
        type: QueryTypes.SELECT,
        replacements: { regionId: first.regionId, ...fiscalYear, month: first.month },
      },
    );
    expect(others.length).toBeGreaterThanOrEqual(2);
    const [droppedMonth, staleMonth] = [others[0].period_key, others.at(-1)!.period_key];
    const spoil = (sql: string, month: string) =>
      sequelize.query(
        `${sql} WHERE scope = 'region' AND scope_id = :regionId AND period_kind = 'month'
            AND period_key = :month`,
        { type: QueryTypes.UPDATE, replacements: { regionId: first.regionId, month } },
      );
    await spoil('DELETE FROM report_snapshots', droppedMonth);
    await spoil(
      `UPDATE report_snapshots SET as_of = '2000-01-01 00:00:00',
              pending_tallies = pending_tallies + 7`,
      staleMonth,
    );
    for (const change of changes) {
      await builder.rebuildForChapterMonth(change.chapterId, change.month);
    }
    const changedWorld = await readWorld(testApp.app);
    const afterChanges = await withChapters(
      await storedSnapshots(testApp.app),
      changedWorld,
      regionIds,
    );
    // Every figure, stock, compliance and pending count equals a recompute, the first change's
    // quarter and year included. Only two things are left as spoiled: the stale month's own row
    // (no change was in it), and the source lists of the rows that add up the dropped month
    // (they name its revisions through its row).
    const droppedIn = periodsContaining(droppedMonth, fiscalYearStartMonth).map((p) => p.key);
    const spoiledOnly = (problem: string) =>
      problem.startsWith(`region:${first.regionId} ${staleMonth} `) ||
      droppedIn.some(
        (key) =>
          problem.startsWith(`region:${first.regionId} ${key} `) &&
          problem.endsWith(' sources differ'),
      );
    const afterProblems = checkScopes(changedWorld, afterChanges, regionIds).problems;
    expect(afterProblems.filter((problem) => !spoiledOnly(problem))).toEqual([]);
    // The spoiled stale row is still there to be ignored: the check above could have seen it.
    expect(
      afterProblems.some((problem) =>
        problem.startsWith(`region:${first.regionId} ${staleMonth} `),
      ),
    ).toBe(true);
    // The changes reached the rows: an incremental rebuild wrote each changed month's region row.
    for (const change of changes) {
      const row = afterChanges.find(
        (each) =>
          each.scope === 'region' &&
          each.scopeId === change.regionId &&
          each.periodKey === change.month,
      );
      expect(row?.asOf.getTime()).toBeGreaterThanOrEqual(changedAt.getTime());
    }
    // The spoiled months are built again by their own jobs; then every row is right and names
    // its revisions.
    for (const month of [droppedMonth, staleMonth]) {
      await builder.rebuildForChapterMonth(first.chapterId, month);
    }
    const rebuilt = await withChapters(await storedSnapshots(testApp.app), changedWorld, regionIds);
    expect(checkScopes(changedWorld, rebuilt, regionIds).problems).toEqual([]);
    expect(missingRows(changedWorld, rebuilt, chapterIds)).toEqual([]);
    expect(checkNetwork(changedWorld, rebuilt, chapterIds)).toEqual([]);
  });

  /**
   * Changes a few tallies of the regions as the tally workflow would leave them: an approved
   * revision's counts and closing stock corrected, a submitted tally approved, a draft filed.
   */
  async function changeTallies(
    random: ReturnType<typeof seeded>,
    regionIds: number[],
  ): Promise<Array<{ chapterId: number; regionId: number; month: string }>> {
    const tallies = await sequelize.query<{
      id: number;
      chapter_id: number;
      region_id: number;
      month: string;
      state: string;
      current_revision: number;
      approved_revision: number | null;
    }>(
      `SELECT t.id, t.chapter_id, c.region_id, DATE_FORMAT(t.month, '%Y-%m') AS month, t.state,
              t.current_revision, t.approved_revision
         FROM monthly_tallies t JOIN chapters c ON c.id = t.chapter_id
        WHERE c.region_id IN (:regionIds)
        ORDER BY t.id`,
      { type: QueryTypes.SELECT, replacements: { regionIds } },
    );
    const pick = (state: string, approved: boolean) => {
      const matching = tallies.filter(
        (t) => t.state === state && (t.approved_revision !== null) === approved,
      );
      return matching.length === 0 ? [] : [matching[random.int(0, matching.length - 1)]];
    };
    const update = (sql: string, replacements: Record<string, unknown>) =>
      sequelize.query(sql, { type: QueryTypes.UPDATE, replacements });
    const changes = [];
    for (const tally of [...pick('approved', true), ...pick('approved', true)]) {
      await update(
        `UPDATE tally_revisions SET panels_accepted = :panels, panels_closing = :closing,
                blankets_closing = :blankets
          WHERE tally_id = :id AND revision = :revision`,
        {
          id: tally.id,
          revision: tally.approved_revision,
          panels: random.int(0, 400),
          closing: random.int(1000, 1900),
          blankets: random.int(50, 90),
        },
      );
      changes.push(tally);
    }
    for (const tally of pick('submitted', false)) {
      await update(
        `UPDATE monthly_tallies SET state = 'approved', approved_revision = current_revision
          WHERE id = :id`,
        { id: tally.id },
      );
      await update(
        `UPDATE tally_revisions SET state = 'approved' WHERE tally_id = :id AND revision = :revision`,
        { id: tally.id, revision: tally.current_revision },
      );
      changes.push(tally);
    }
    for (const tally of pick('draft', false)) {
      await update(
        `UPDATE monthly_tallies SET state = 'submitted', first_submitted_at = :at WHERE id = :id`,
        { id: tally.id, at: new Date(`${tally.month}-20T08:00:00Z`) },
      );
      await update(
        `UPDATE tally_revisions SET state = 'submitted' WHERE tally_id = :id AND revision = :revision`,
        { id: tally.id, revision: tally.current_revision },
      );
      changes.push(tally);
    }
    return changes.map((tally) => ({
      chapterId: tally.chapter_id,
      regionId: tally.region_id,
      month: tally.month,
    }));
  }
});
