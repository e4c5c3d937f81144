/**
 * Rolls chapter-month facts up into tally snapshots: each chapter over the months of a period
 * (flows sum, stock is the last approved month's), then chapters into regions and the network.
 * Pure, so the job and its tests share one roll-up.
 */
import {
  monthsBetween,
  addCompliance,
  addSnapshotFigures,
  combineMonthsInto,
  complianceOf,
  emptyCompliance,
  emptySnapshotFigures,
  monthsOf,
  periodsContaining,
  type ComplianceFigures,
  type MonthKey,
  type Period,
  type SnapshotFigures,
  type SnapshotScope,
} from '@tallyloom/core';
import type { ChapterMonthFact } from './chapter-month-facts';

export interface ChapterInfo {
  chapterId: number;
  regionId: number;
  dueDay: number;
  /** ISO dates; a chapter is expected to report in each month it is active in. */
  activeFrom: string;
  activeTo: string | null;
}

export interface TallyStatus {
  chapterId: number;
  month: MonthKey;
  /** ISO timestamp, or null when never submitted. */
  firstSubmittedAt: string | null;
  pending: boolean;
}

export interface SnapshotTarget {
  scope: SnapshotScope;
  /** 0 for the network. */
  scopeId: number;
  period: Period;
}

export interface BuiltSnapshot extends SnapshotTarget {
  figures: SnapshotFigures;
  compliance: ComplianceFigures;
  pendingTallies: number;
  /** [tallyId, revision] of every approved revision in the figures, sorted. */
  sourceRevisions: Array<[number, number]>;
}

export interface RollupInput {
  facts: readonly ChapterMonthFact[];
  chapters: readonly ChapterInfo[];
  statuses: readonly TallyStatus[];
  /** ISO date: compliance is judged on this day, and later months are not expected yet. */
  today: string;
}

interface ChapterPeriod {
  figures: SnapshotFigures;
  compliance: ComplianceFigures;
  pendingTallies: number;
  sources: Array<[number, number]>;
}

/** True when the chapter is active on some day of the month. */
export function isActiveIn(chapter: ChapterInfo, month: MonthKey): boolean {
  return (
    chapter.activeFrom.slice(0, 7) <= month &&
    (chapter.activeTo === null || chapter.activeTo.slice(0, 7) >= month)
  );
}

const targetKey = (target: SnapshotTarget) =>
  `${target.scope}:${target.scopeId}:${target.period.kind}:${target.period.key}`;

/** Builds the snapshots asked for from the facts, chapters and statuses given. */
export function rollUpSnapshots(
  input: RollupInput,
  targets: readonly SnapshotTarget[],
): BuiltSnapshot[] {
  const currentMonth = input.today.slice(0, 7);
  const factOf = new Map(input.facts.map((fact) => [`${fact.chapterId}:${fact.month}`, fact]));
  const statusOf = new Map(input.statuses.map((s) => [`${s.chapterId}:${s.month}`, s]));
  // Indexed once: a full rebuild asks for the chapters of a scope for every scope × period.
  const byRegion = new Map<number, ChapterInfo[]>();
  const byId = new Map<number, ChapterInfo>();
  for (const chapter of input.chapters) {
    byId.set(chapter.chapterId, chapter);
    const list = byRegion.get(chapter.regionId);
    if (list) list.push(chapter);
    else byRegion.set(chapter.regionId, [chapter]);
  }
  const chaptersOf = (scope: SnapshotScope, scopeId: number): readonly ChapterInfo[] => {
    if (scope === 'network') return input.chapters;
    if (scope === 'region') return byRegion.get(scopeId) ?? [];
    const chapter = byId.get(scopeId);
    return chapter ? [chapter] : [];
  };

  const cache = new Map<string, ChapterPeriod>();
  const chapterPeriod = (chapter: ChapterInfo, period: Period): ChapterPeriod => {
    const key = `${chapter.chapterId}:${period.kind}:${period.key}`;
    const cached = cache.get(key);
    if (cached) return cached;
    const months = monthsOf(period);
    const monthly: SnapshotFigures[] = [];
    const sources: Array<[number, number]> = [];
    let compliance = emptyCompliance();
    let pendingTallies = 0;
    for (const month of months) {
      const fact = factOf.get(`${chapter.chapterId}:${month}`);
      monthly.push(fact ? fact.figures : emptySnapshotFigures());
      if (fact) sources.push([fact.tallyId, fact.revision]);
      const status = statusOf.get(`${chapter.chapterId}:${month}`);
      if (status?.pending) pendingTallies += 1;
      if (isActiveIn(chapter, month) && month <= currentMonth) {
        compliance = addCompliance(
          compliance,
          complianceOf(
            [
              {
                month,
                dueDay: chapter.dueDay,
                firstSubmittedAt: status?.firstSubmittedAt ?? null,
              },
            ],
            input.today,
          ),
        );
      }
    }
    const built = { figures: combineMonthsInto(monthly), compliance, pendingTallies, sources };
    cache.set(key, built);
    return built;
  };

  const built = new Map<string, BuiltSnapshot>();
  for (const target of targets) {
    if (built.has(targetKey(target))) continue;
    let figures = emptySnapshotFigures();
    let compliance = emptyCompliance();
    let pendingTallies = 0;
    const sources: Array<[number, number]> = [];
    for (const chapter of chaptersOf(target.scope, target.scopeId)) {
      const part = chapterPeriod(chapter, target.period);
      figures = addSnapshotFigures(figures, part.figures);
      compliance = addCompliance(compliance, part.compliance);
      pendingTallies += part.pendingTallies;
      sources.push(...part.sources);
    }
    sources.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
    built.set(targetKey(target), {
      ...target,
      figures,
      compliance,
      pendingTallies,
      sourceRevisions: sources,
    });
  }
  return [...built.values()];
}

/** A stored or freshly built region snapshot, as far as the network needs it. */
export type RegionPart = Pick<
  BuiltSnapshot,
  'scopeId' | 'figures' | 'compliance' | 'pendingTallies' | 'sourceRevisions'
>;

/**
 * The network for one period as the sum of its regions (every chapter is in exactly one region,
 * and every measure adds across scopes), so a change in one region needs only that region's
 * facts and the other regions' stored rows, not every chapter of the network.
 */
export function networkFromRegions(period: Period, regions: readonly RegionPart[]): BuiltSnapshot {
  let figures = emptySnapshotFigures();
  let compliance = emptyCompliance();
  let pendingTallies = 0;
  const sources: Array<[number, number]> = [];
  for (const region of regions) {
    figures = addSnapshotFigures(figures, region.figures);
    compliance = addCompliance(compliance, region.compliance);
    pendingTallies += region.pendingTallies;
    sources.push(...region.sourceRevisions);
  }
  sources.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  return {
    scope: 'network',
    scopeId: 0,
    period,
    figures,
    compliance,
    pendingTallies,
    sourceRevisions: sources,
  };
}

/**
 * The snapshots a change of one chapter-month touches: that chapter, its region and the network,
 * each for the month, its quarter and its fiscal year.
 */
export function targetsOfChapterMonth(
  chapter: Pick<ChapterInfo, 'chapterId' | 'regionId'>,
  month: MonthKey,
  fiscalYearStartMonth: number,
): SnapshotTarget[] {
  const periods = periodsContaining(month, fiscalYearStartMonth);
  return periods.flatMap((period) => [
    { scope: 'chapter' as const, scopeId: chapter.chapterId, period },
    { scope: 'region' as const, scopeId: chapter.regionId, period },
    { scope: 'network' as const, scopeId: 0, period },
  ]);
}

/**
 * Every scope × every period in which that scope has a tally (in any state): a chapter for the
 * periods of its own tallies, a region for those of its chapters, the network for all. Scopes
 * without a tally in a period get no row there (readers show empty figures).
 */
export function targetsOfMonths(
  chapters: readonly Pick<ChapterInfo, 'chapterId' | 'regionId'>[],
  tallied: ReadonlyArray<{ chapterId: number; month: MonthKey }>,
  fiscalYearStartMonth: number,
): SnapshotTarget[] {
  const regionOf = new Map(chapters.map((chapter) => [chapter.chapterId, chapter.regionId]));
  const targets = new Map<string, SnapshotTarget>();
  const add = (scope: SnapshotScope, scopeId: number, period: Period) => {
    const target = { scope, scopeId, period };
    targets.set(targetKey(target), target);
  };
  const periodsOf = new Map<MonthKey, Period[]>();
  for (const { chapterId, month } of tallied) {
    const regionId = regionOf.get(chapterId);
    if (regionId === undefined) continue;
    let periods = periodsOf.get(month);
    if (!periods) {
      periods = periodsContaining(month, fiscalYearStartMonth);
      periodsOf.set(month, periods);
    }
    for (const period of periods) {
      add('chapter', chapterId, period);
      add('region', regionId, period);
      add('network', 0, period);
    }
  }
  return [...targets.values()];
}

/**
 * Every month each chapter was expected to report in, from `from` to `to` ('YYYY-MM', both
 * inclusive) and within its active dates: a month without any tally still gets its snapshot, so
 * the chapter's own dashboard shows that month as missing or open instead of nothing.
 */
export function expectedChapterMonths(
  chapters: readonly ChapterInfo[],
  from: MonthKey,
  to: MonthKey,
): Array<{ chapterId: number; month: MonthKey }> {
  return chapters.flatMap((chapter) => {
    const first = chapter.activeFrom.slice(0, 7) > from ? chapter.activeFrom.slice(0, 7) : from;
    const activeTo = chapter.activeTo?.slice(0, 7) ?? to;
    const last = activeTo < to ? activeTo : to;
    return first > last
      ? []
      : monthsBetween(first, last).map((month) => ({ chapterId: chapter.chapterId, month }));
  });
}

/** The months a set of periods covers: what facts and statuses the roll-up must be given. */
export function monthRangeOf(
  targets: readonly SnapshotTarget[],
): { from: MonthKey; to: MonthKey } | null {
  if (targets.length === 0) return null;
  let from = targets[0].period.from;
  let to = targets[0].period.to;
  for (const { period } of targets) {
    if (period.from < from) from = period.from;
    if (period.to > to) to = period.to;
  }
  return { from, to };
}
