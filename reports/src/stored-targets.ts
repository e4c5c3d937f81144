/**
 * The snapshots a full rebuild stores, worked out from months per region rather than per
 * chapter-month: a network of 600 chapters and ten years has 72,000 chapter-months but only a
 * few thousand region-months.
 */
import {
  addMonths,
  monthsBetween,
  periodsContaining,
  type MonthKey,
  type Period,
  type SnapshotScope,
} from '@tallyloom/core';
import { entryOf } from './map-entry';
import { targetKey, type ChapterInfo, type SnapshotTarget } from './tally-snapshot-rollup';

/** Months from `from` to `to` as one run ('YYYY-MM', both inclusive). */
interface MonthRun {
  from: MonthKey;
  to: MonthKey;
}

/** Overlapping or adjacent runs joined, in order. */
function joinRuns(runs: MonthRun[]): MonthRun[] {
  const sorted = [...runs].sort((a, b) => (a.from < b.from ? -1 : a.from > b.from ? 1 : 0));
  const joined: MonthRun[] = [];
  for (const run of sorted) {
    const last = joined.at(-1);
    if (last && run.from <= addMonths(last.to, 1)) {
      if (run.to > last.to) last.to = run.to;
    } else joined.push({ ...run });
  }
  return joined;
}

/**
 * Every region and the network, for each period containing a month in which one of their
 * chapters has a tally (`tallied`, in any state) or was expected to report (its active months
 * from `from` to `to`). The same targets as `targetsOfMonths` over the tallies and
 * `expectedChapterMonths` with STORED_SCOPES: each chapter's expected months are added as one
 * run, not month by month.
 */
export function storedTargetsOf(
  chapters: readonly ChapterInfo[],
  tallied: ReadonlyArray<{ chapterId: number; month: MonthKey }>,
  range: MonthRun,
  fiscalYearStartMonth: number,
): SnapshotTarget[] {
  const regionOf = new Map(chapters.map((chapter) => [chapter.chapterId, chapter.regionId]));
  const monthsOfRegion = new Map<number, Set<MonthKey>>();
  const monthsIn = (regionId: number) => entryOf(monthsOfRegion, regionId, () => new Set());
  for (const { chapterId, month } of tallied) {
    const regionId = regionOf.get(chapterId);
    if (regionId !== undefined) monthsIn(regionId).add(month);
  }
  const runsOfRegion = new Map<number, MonthRun[]>();
  for (const chapter of chapters) {
    const activeFrom = chapter.activeFrom.slice(0, 7);
    const activeTo = chapter.activeTo?.slice(0, 7) ?? range.to;
    const run = {
      from: activeFrom > range.from ? activeFrom : range.from,
      to: activeTo < range.to ? activeTo : range.to,
    };
    if (run.from > run.to) continue;
    entryOf(runsOfRegion, chapter.regionId, () => []).push(run);
  }
  for (const [regionId, runs] of runsOfRegion) {
    const months = monthsIn(regionId);
    for (const run of joinRuns(runs))
      for (const month of monthsBetween(run.from, run.to)) months.add(month);
  }

  const periodsOf = new Map<MonthKey, Period[]>();
  const targets = new Map<string, SnapshotTarget>();
  const add = (scope: SnapshotScope, scopeId: number, months: Iterable<MonthKey>) => {
    for (const month of months) {
      const periods = entryOf(periodsOf, month, () =>
        periodsContaining(month, fiscalYearStartMonth),
      );
      for (const period of periods) {
        const target = { scope, scopeId, period };
        targets.set(targetKey(target), target);
      }
    }
  };
  const networkMonths = new Set<MonthKey>();
  for (const [regionId, months] of monthsOfRegion) {
    add('region', regionId, months);
    for (const month of months) networkMonths.add(month);
  }
  add('network', 0, networkMonths);
  return [...targets.values()];
}
