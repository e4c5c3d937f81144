import {
  addSnapshotFigures,
  emptySnapshotFigures,
  monthPeriod,
  quarterPeriod,
  type SnapshotFigures,
} from '@tallyloom/core';
import type { ChapterMonthFact, MonthFlows } from './chapter-month-facts';
import { networkFromRegions, regionPeriodFromMonths } from './sum-of-parts';
import {
  expectedChapterMonths,
  inputFromFacts,
  rollUpSnapshots,
  SnapshotRollup,
  targetsOfChapterMonth,
  targetsOfMonths,
  type ChapterInfo,
  type TallyStatus,
} from './tally-snapshot-rollup';

// Invented figures: a worked example small enough to add up by hand.
const fact = (
  chapterId: number,
  month: string,
  tallyId: number,
  figures: Partial<SnapshotFigures>,
): ChapterMonthFact => ({
  chapterId,
  regionId: chapterId === 3 ? 2 : 1,
  month,
  tallyId,
  revision: 1,
  figures: { ...emptySnapshotFigures(), approvedTallies: 1, ...figures },
});

const chapters: ChapterInfo[] = [
  { chapterId: 1, regionId: 1, dueDay: 10, activeFrom: '2024-01-01', activeTo: null },
  { chapterId: 2, regionId: 1, dueDay: 10, activeFrom: '2026-03-01', activeTo: null },
  { chapterId: 3, regionId: 2, dueDay: 10, activeFrom: '2025-01-01', activeTo: null },
];
const facts = [
  fact(1, '2026-01', 11, { panelsAccepted: 10, panelsInStock: 5, volunteerHours: 1.1 }),
  fact(1, '2026-02', 12, {
    panelsAccepted: 20,
    panelsInStock: 8,
    blanketsInStock: 3,
    volunteerHours: 2.2,
  }),
  fact(2, '2026-03', 21, { panelsAccepted: 1, panelsInStock: 100 }),
];
const statuses: Array<Omit<TallyStatus, 'approved'>> = [
  { chapterId: 1, month: '2026-01', firstSubmittedAt: '2026-02-05T09:00:00Z', pending: false },
  { chapterId: 1, month: '2026-02', firstSubmittedAt: '2026-03-15T09:00:00Z', pending: false },
  { chapterId: 1, month: '2026-03', firstSubmittedAt: '2026-04-20T09:00:00Z', pending: true },
  { chapterId: 2, month: '2026-03', firstSubmittedAt: '2026-04-01T09:00:00Z', pending: false },
];
const q1 = quarterPeriod('2026-Q1');
const input = { facts, chapters, statuses, today: '2026-05-20' };
/** The roll-up from chapter-month facts, as the live chapter figures call it. */
const rollUp = (from: typeof input, targets: Parameters<typeof rollUpSnapshots>[1]) =>
  rollUpSnapshots(inputFromFacts(from), targets);

/**
 * The full rebuild's targets over the example, fiscal years from July: every tallied month plus
 * every month a chapter was expected from `from` to `to`.
 */
const fullRebuildTargets = (
  from: string,
  to: string,
  scopes?: Parameters<typeof targetsOfMonths>[3],
) =>
  targetsOfMonths(
    chapters,
    [
      ...facts.map(({ chapterId, month }) => ({ chapterId, month })),
      ...expectedChapterMonths(chapters, from, to),
    ],
    7,
    scopes,
  );

describe('rollUpSnapshots', () => {
  it("keeps a chapter's stock from its last approved month when a later month is not approved", () => {
    const [chapter1] = rollUp(input, [{ scope: 'chapter', scopeId: 1, period: q1 }]);
    expect(chapter1.figures).toMatchObject({
      panelsAccepted: 30,
      panelsInStock: 8,
      volunteerHours: 3.3,
      approvedTallies: 2,
    });
    expect(chapter1.pendingTallies).toBe(1);
    expect(chapter1.compliance).toEqual({ expected: 3, onTime: 1, late: 2, missing: 0, open: 0 });
    expect(chapter1.sourceRevisions).toEqual([
      [11, 1],
      [12, 1],
    ]);
  });

  it('adds the chapters of a region, stock included, and expects only active months', () => {
    const [region1] = rollUp(input, [{ scope: 'region', scopeId: 1, period: q1 }]);
    expect(region1.figures).toMatchObject({ panelsAccepted: 31, panelsInStock: 108 });
    // Chapter 2 opened in March: one month expected of it.
    expect(region1.compliance).toEqual({ expected: 4, onTime: 2, late: 2, missing: 0, open: 0 });
  });

  it('counts missing months of a silent chapter in the network and leaves future months out', () => {
    const [network] = rollUp({ ...input, today: '2026-03-05' }, [
      { scope: 'network', scopeId: 0, period: q1 },
    ]);
    // Chapter 3 never reported: Jan missing (due Feb 10); Feb still due until Mar 10; Mar upcoming.
    expect(network.compliance.expected).toBe(3 + 3 + 1);
    expect(network.compliance.missing).toBe(1);
    expect(network.figures.panelsAccepted).toBe(31);
  });

  it('gives empty figures to a scope with nothing approved', () => {
    const [region2, region2January] = rollUp(input, [
      { scope: 'region', scopeId: 2, period: q1 },
      { scope: 'region', scopeId: 2, period: monthPeriod('2026-01') },
    ]);
    expect(region2.figures).toEqual(emptySnapshotFigures());
    expect(region2January.sourceRevisions).toEqual([]);
  });

  it("lists source revisions on a region's months and a chapter's periods, and nowhere else", () => {
    const built = rollUp(input, [
      { scope: 'region', scopeId: 1, period: monthPeriod('2026-01') },
      { scope: 'region', scopeId: 1, period: monthPeriod('2026-03') },
      { scope: 'region', scopeId: 1, period: q1 },
      { scope: 'network', scopeId: 0, period: monthPeriod('2026-01') },
      { scope: 'network', scopeId: 0, period: q1 },
      { scope: 'chapter', scopeId: 1, period: q1 },
    ]);
    expect(built.map((snapshot) => snapshot.sourceRevisions)).toEqual([
      [[11, 1]],
      [[21, 1]],
      null,
      null,
      null,
      [
        [11, 1],
        [12, 1],
      ],
    ]);
  });
});

describe('snapshot targets', () => {
  it('touches chapter, region and network × month, quarter and fiscal year for one change', () => {
    const targets = targetsOfChapterMonth({ chapterId: 5, regionId: 2 }, '2026-02', 7);
    expect(targets.map((t) => `${t.scope}:${t.scopeId}:${t.period.key}`).sort()).toEqual(
      [
        'chapter:5:2026-02',
        'chapter:5:2026-Q1',
        'chapter:5:FY2026',
        'network:0:2026-02',
        'network:0:2026-Q1',
        'network:0:FY2026',
        'region:2:2026-02',
        'region:2:2026-Q1',
        'region:2:FY2026',
      ].sort(),
    );
  });

  it('covers each scope × the periods in which it has tallies, once each', () => {
    const targets = targetsOfMonths(
      chapters,
      [
        { chapterId: 1, month: '2026-01' },
        { chapterId: 1, month: '2026-02' },
        { chapterId: 3, month: '2026-04' },
      ],
      1,
    );
    const keys = targets.map((t) => `${t.scope}:${t.scopeId}:${t.period.key}`).sort();
    expect(keys).toEqual(
      [
        ...['2026-01', '2026-02', '2026-Q1', 'FY2026'].map((key) => `chapter:1:${key}`),
        ...['2026-01', '2026-02', '2026-Q1', 'FY2026'].map((key) => `region:1:${key}`),
        ...['2026-04', '2026-Q2', 'FY2026'].map((key) => `chapter:3:${key}`),
        ...['2026-04', '2026-Q2', 'FY2026'].map((key) => `region:2:${key}`),
        ...['2026-01', '2026-02', '2026-04', '2026-Q1', '2026-Q2', 'FY2026'].map(
          (key) => `network:0:${key}`,
        ),
      ].sort(),
    );
  });
});

describe('expectedChapterMonths', () => {
  it('lists each chapter-month inside both the range and the chapter’s active dates', () => {
    const closing: ChapterInfo[] = [
      ...chapters,
      { chapterId: 4, regionId: 2, dueDay: 10, activeFrom: '2025-01-01', activeTo: '2026-02-14' },
      { chapterId: 5, regionId: 2, dueDay: 10, activeFrom: '2026-06-01', activeTo: null },
    ];
    const expected = expectedChapterMonths(closing, '2026-01', '2026-03');
    expect(expected.map(({ chapterId, month }) => `${chapterId}:${month}`)).toEqual([
      '1:2026-01',
      '1:2026-02',
      '1:2026-03',
      // Chapter 2 opened in March; chapter 4 closed during February; chapter 5 opens later.
      '2:2026-03',
      '3:2026-01',
      '3:2026-02',
      '3:2026-03',
      '4:2026-01',
      '4:2026-02',
    ]);
  });

  it('gives a silent chapter its own snapshot, which shows the month as missing', () => {
    const targets = targetsOfMonths(
      chapters,
      expectedChapterMonths(chapters, '2026-03', '2026-03'),
      1,
    ).filter((target) => target.scope === 'chapter' && target.scopeId === 3);
    const [march] = rollUp(input, targets).filter((snapshot) => snapshot.period.key === '2026-03');
    expect(march.figures.approvedTallies).toBe(0);
    // Due 10 April, judged on 20 May: missing.
    expect(march.compliance).toMatchObject({ onTime: 0, late: 0, missing: 1, open: 0 });
  });
});

describe('rollUpSnapshots from flows summed per region (the full rebuild)', () => {
  it('gives every region and network snapshot the chapter-by-chapter roll-up gives', () => {
    const targets = fullRebuildTargets('2026-01', '2026-05', ['region', 'network']);
    const byChapter = rollUp(input, targets);
    // What the database's GROUP BY region, month returns: flows only, one row per region-month.
    const sums = new Map<string, MonthFlows>();
    for (const fact of facts) {
      const key = `${fact.regionId}:${fact.month}`;
      const flows = { ...fact.figures, panelsInStock: 0, blanketsInStock: 0 };
      const seen = sums.get(key);
      sums.set(key, {
        chapterId: null,
        regionId: fact.regionId,
        month: fact.month,
        figures: seen ? addSnapshotFigures(seen.figures, flows) : flows,
      });
    }
    const { statuses: withApproved } = inputFromFacts(input);
    const byRegion = rollUpSnapshots(
      { flows: [...sums.values()], chapters, statuses: withApproved, today: input.today },
      targets,
    );
    expect(byRegion.length).toBeGreaterThan(6);
    expect(byRegion).toEqual(byChapter);

    // In steps, as the rebuild adds them: statuses while the flows are still being summed,
    // the flows in two parts of the chapters (a region's month in both), then the snapshots.
    const rollup = new SnapshotRollup(targets, input.today);
    rollup.addStatuses(chapters, withApproved);
    const flows = [...sums.values()];
    const regionOneMarch = flows.find((row) => row.regionId === 1 && row.month === '2026-03')!;
    const split = {
      ...regionOneMarch,
      figures: { ...emptySnapshotFigures(), panelsAccepted: 1, approvedTallies: 1 },
    };
    const rest = {
      ...regionOneMarch,
      figures: {
        ...regionOneMarch.figures,
        panelsAccepted: regionOneMarch.figures.panelsAccepted - 1,
        approvedTallies: regionOneMarch.figures.approvedTallies - 1,
      },
    };
    rollup.addFlows([split]);
    rollup.addFlows([...flows.filter((row) => row !== regionOneMarch), rest]);
    expect(rollup.snapshots()).toEqual(byChapter);
  });
});

describe('compliance read from the day of the first submission', () => {
  it('judges two submissions on the same UTC day alike, and one a day later apart', () => {
    // common practice: a tally is on time when first submitted by its due day (the 10th here).
    const march = quarterPeriod('2026-Q1');
    const targets = [{ scope: 'region' as const, scopeId: 1, period: march }];
    const withTimes = (first: string, second: string) =>
      rollUpSnapshots(
        {
          flows: [],
          chapters: chapters.slice(0, 1),
          statuses: [
            {
              chapterId: 1,
              month: '2026-01',
              firstSubmittedAt: first,
              pending: false,
              approved: null,
            },
            {
              chapterId: 1,
              month: '2026-02',
              firstSubmittedAt: second,
              pending: false,
              approved: null,
            },
          ],
          today: '2026-05-20',
        },
        targets,
      )[0].compliance;
    const sameDay = withTimes('2026-02-10T00:00:01.000Z', '2026-03-10T23:59:59.000Z');
    expect([sameDay.onTime, sameDay.late]).toEqual([2, 0]);
    const dayLate = withTimes('2026-02-10T23:59:59.000Z', '2026-03-11T00:00:00.000Z');
    expect([dayLate.onTime, dayLate.late]).toEqual([1, 1]);
  });
});

describe('networkFromRegions', () => {
  it('equals the network rolled up from every chapter, given every expected month its rows', () => {
    // The full rebuild's targets: tallied months plus every month a chapter was expected.
    const targets = fullRebuildTargets('2026-01', '2026-05');
    const built = rollUp(input, targets);
    const networks = built.filter((snapshot) => snapshot.scope === 'network');
    expect(networks.length).toBeGreaterThan(3);
    for (const network of networks) {
      const regions = built.filter(
        (snapshot) =>
          snapshot.scope === 'region' &&
          snapshot.period.kind === network.period.kind &&
          snapshot.period.key === network.period.key,
      );
      expect(networkFromRegions(network.period, regions)).toEqual(network);
    }
  });
});

describe('regionPeriodFromMonths', () => {
  it("equals the region's quarter and fiscal year rolled up from every chapter, given its months and stock", () => {
    // Fiscal years from July: FY2026 is 2025-07..2026-06, and the example's months all fall in it.
    const targets = fullRebuildTargets('2025-07', '2026-05', ['region']);
    const built = rollUp(input, targets);
    const longer = built.filter((snapshot) => snapshot.period.kind !== 'month');
    expect(longer.map((snapshot) => `${snapshot.scopeId}:${snapshot.period.key}`)).toEqual(
      expect.arrayContaining(['1:2026-Q1', '1:FY2026', '2:2026-Q1', '2:FY2026']),
    );
    for (const period of longer) {
      const months = built
        .filter((each) => each.scopeId === period.scopeId && each.period.kind === 'month')
        .map((each) => ({ ...each, month: each.period.key }));
      // Stock by hand: each of the region's chapters' closing in its last approved month.
      const stockOf = (measure: 'panelsInStock' | 'blanketsInStock') =>
        chapters
          .filter((chapter) => chapter.regionId === period.scopeId)
          .reduce((sum, chapter) => {
            const last = facts
              .filter((f) => f.chapterId === chapter.chapterId)
              .filter((f) => f.month >= period.period.from && f.month <= period.period.to)
              .sort((a, b) => a.month.localeCompare(b.month))
              .at(-1);
            return sum + (last?.figures[measure] ?? 0);
          }, 0);
      const stock = { panels: stockOf('panelsInStock'), blankets: stockOf('blanketsInStock') };
      expect(regionPeriodFromMonths(period, months, stock)).toEqual(period);
    }
    // Region 1's first quarter: chapter 1's February closing (8) and chapter 2's March (100).
    expect(built.find((s) => s.scopeId === 1 && s.period.key === '2026-Q1')!.figures).toMatchObject(
      {
        panelsInStock: 108,
        panelsAccepted: 31,
      },
    );
  });

  it('ignores months outside the period and refuses a month or a wider scope', () => {
    const quarter = { scope: 'region' as const, scopeId: 1, period: q1 };
    const part = (month: string, panelsAccepted: number) => ({
      month,
      figures: { ...emptySnapshotFigures(), panelsAccepted },
      compliance: { expected: 1, onTime: 1, late: 0, missing: 0, open: 0 },
      pendingTallies: 1,
    });
    const sum = regionPeriodFromMonths(
      quarter,
      [part('2025-12', 1000), part('2026-01', 3), part('2026-03', 4), part('2026-04', 1000)],
      { panels: 7, blankets: 2 },
    );
    expect(sum.figures).toMatchObject({ panelsAccepted: 7, panelsInStock: 7, blanketsInStock: 2 });
    expect([sum.compliance.expected, sum.pendingTallies, sum.sourceRevisions]).toEqual([
      2,
      2,
      null,
    ]);
    expect(() =>
      regionPeriodFromMonths({ ...quarter, period: monthPeriod('2026-01') }, [], {
        panels: 0,
        blankets: 0,
      }),
    ).toThrow(/quarter or fiscal year/);
    expect(() =>
      regionPeriodFromMonths({ ...quarter, scope: 'network', scopeId: 0 }, [], {
        panels: 0,
        blankets: 0,
      }),
    ).toThrow(/quarter or fiscal year/);
  });
});
