/**
 * Rolls approved tallies up into tally snapshots: flows summed over a period's months (per
 * chapter, or already per region), stock from each chapter's last approved month, compliance
 * and pending counts from every tally's status. Pure, so the job, the live chapter figures and
 * their tests share one roll-up.
 */
import {
  COMPLIANCE_FIELD,
  addCompliance,
  addFlowsInPlace,
  emptyCompliance,
  emptySnapshotFigures,
  monthsBetween,
  monthsOf,
  periodsContaining,
  reportingStatus,
  submissionStatus,
  tallyDueOn,
  utcDateOf,
  type ComplianceFigures,
  type MonthKey,
  type Period,
  type ReportingStatus,
  type SnapshotFigures,
  type SnapshotScope,
} from '@tallyloom/core';
import type { ChapterMonthFact, MonthFlows } from './chapter-month-facts';
import { entryOf } from './map-entry';
import { namesOwnSources, type SourceRevision } from './snapshot-sources';

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
  /** The revision in force, when the tally has one approved: what the snapshot counts. */
  approved: ApprovedRevision | null;
}

export interface ApprovedRevision {
  tallyId: number;
  revision: number;
  /** Its closing stocks: a period's stock is each chapter's in its last approved month. */
  panelsClosing: number;
  blanketsClosing: number;
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
  /**
   * [tallyId, revision] of every approved revision in the figures, sorted; null for a snapshot
   * that adds up region months and names its revisions through them (see `namesOwnSources`).
   */
  sourceRevisions: SourceRevision[] | null;
}

/**
 * The scopes whose snapshots are stored. A chapter's figures are read live from its own facts
 * (a few hundred rows at most), so a full rebuild writes a row per region and period, not one
 * per chapter and period: the writes, not the reads, were what made rebuilds slow.
 */
export const STORED_SCOPES: readonly SnapshotScope[] = ['region', 'network'];
const ALL_SCOPES: readonly SnapshotScope[] = ['chapter', 'region', 'network'];

export interface RollupInput {
  /**
   * Flows of approved revisions by month: per chapter (for chapter snapshots) or already summed
   * per region (enough for regions and the network).
   */
  flows: readonly MonthFlows[];
  chapters: readonly ChapterInfo[];
  /** Every tally in any state: compliance, pending, stock and sources. */
  statuses: readonly TallyStatus[];
  /** ISO date: compliance is judged on this day, and later months are not expected yet. */
  today: string;
}

/** Chapter-month facts as the roll-up's flows: one row per chapter and month. */
export function flowsOfFacts(facts: readonly ChapterMonthFact[]): MonthFlows[] {
  return facts.map((fact) => ({
    chapterId: fact.chapterId,
    regionId: fact.regionId,
    month: fact.month,
    figures: fact.figures,
  }));
}

/**
 * The roll-up's input from chapter-month facts alone, with statuses that do not carry the
 * approved revision (the unit tests' worked examples): each fact becomes its month's approved
 * revision, and a fact without a status row counts as approved and never submitted.
 */
export function inputFromFacts(input: {
  facts: readonly ChapterMonthFact[];
  chapters: readonly ChapterInfo[];
  statuses: ReadonlyArray<Omit<TallyStatus, 'approved'> & Partial<Pick<TallyStatus, 'approved'>>>;
  today: string;
}): RollupInput {
  const key = (chapterId: number, month: MonthKey) => `${chapterId}:${month}`;
  const factOf = new Map(input.facts.map((fact) => [key(fact.chapterId, fact.month), fact]));
  const approvedOf = (fact: ChapterMonthFact | undefined): ApprovedRevision | null =>
    fact
      ? {
          tallyId: fact.tallyId,
          revision: fact.revision,
          panelsClosing: fact.figures.panelsInStock,
          blanketsClosing: fact.figures.blanketsInStock,
        }
      : null;
  const statuses: TallyStatus[] = input.statuses.map((status) => ({
    ...status,
    approved: approvedOf(factOf.get(key(status.chapterId, status.month))),
  }));
  const withStatus = new Set(statuses.map((status) => key(status.chapterId, status.month)));
  for (const fact of input.facts) {
    if (withStatus.has(key(fact.chapterId, fact.month))) continue;
    statuses.push({
      chapterId: fact.chapterId,
      month: fact.month,
      firstSubmittedAt: null,
      pending: false,
      approved: approvedOf(fact),
    });
  }
  return {
    flows: flowsOfFacts(input.facts),
    chapters: input.chapters,
    statuses,
    today: input.today,
  };
}

/** What one scope's chapters' tallies add up to in one month: compliance, pending, sources. */
interface StatusBucket {
  compliance: ComplianceFigures;
  pendingTallies: number;
  sources: SourceRevision[];
}

/** 'scope:id:kind:key', one per snapshot. */
export const targetKey = (target: SnapshotTarget) =>
  `${target.scope}:${target.scopeId}:${target.period.kind}:${target.period.key}`;
const periodId = (period: Pick<Period, 'kind' | 'key'>) => `${period.kind}:${period.key}`;
const scopeKey = (scope: SnapshotScope, id: number) => `${scope}:${id}`;

function groupBy<T>(items: readonly T[], keyOf: (item: T) => number): Map<number, T[]> {
  const groups = new Map<number, T[]>();
  for (const item of items) entryOf(groups, keyOf(item), () => []).push(item);
  return groups;
}

/**
 * Builds the snapshots asked for from the flows, chapters and statuses given. Each row of flows
 * and each chapter-month's status is added once into its scopes' month buckets (flows,
 * compliance, pending, sources); a target then adds up the buckets of its period's months.
 * Stock is a level, not a flow: each chapter's closing stock of its last approved month in the
 * period is added to the period's targets directly. Sums grow in place: a full rebuild adds
 * tens of thousands of months.
 */
export function rollUpSnapshots(
  input: RollupInput,
  targets: readonly SnapshotTarget[],
): BuiltSnapshot[] {
  const rollup = new SnapshotRollup(targets, input.today);
  rollup.addFlows(input.flows);
  rollup.addStatuses(input.chapters, input.statuses);
  return rollup.snapshots();
}

/**
 * `rollUpSnapshots` in steps, in any order: a full rebuild adds the statuses while the database
 * is still summing the flows, and then only the flows are left to add when they come.
 */
export class SnapshotRollup {
  private readonly currentMonth: MonthKey;
  private readonly built = new Map<string, BuiltSnapshot>();
  /**
   * The months any target covers, and their positions: the per-chapter loops of a full rebuild
   * (tens of thousands of chapter-months) index arrays by position instead of keying maps.
   */
  private readonly months: MonthKey[] = [];
  private readonly monthIndex = new Map<MonthKey, number>();
  /** The distinct periods asked for, each with the positions of its months, in month order. */
  private readonly periodMonths: number[][] = [];
  private readonly periodIndex = new Map<string, number>();
  /** Each scope's snapshots by period position. */
  private readonly snapshotsOfScope = new Map<string, Array<BuiltSnapshot | undefined>>();
  /** The scopes with a target that lists its own source revisions. */
  private readonly sourcedScopes = new Set<string>();
  /** Flows by scope and month, added to the targets in `snapshots()`. */
  private readonly flowBuckets = new Map<string, Map<MonthKey, SnapshotFigures>>();
  /** Each month's due date and status when never submitted, per due day. */
  private readonly dueMemo = new Map<MonthKey, Map<number, MonthDue>>();

  constructor(
    targets: readonly SnapshotTarget[],
    /** ISO date: compliance is judged on this day, and later months are not expected yet. */
    private readonly today: string,
  ) {
    this.currentMonth = today.slice(0, 7);
    for (const target of targets) {
      const key = targetKey(target);
      if (this.built.has(key)) continue;
      const snapshot: BuiltSnapshot = {
        ...target,
        figures: emptySnapshotFigures(),
        compliance: emptyCompliance(),
        pendingTallies: 0,
        sourceRevisions: namesOwnSources(target) ? [] : null,
      };
      this.built.set(key, snapshot);
      const scope = scopeKey(target.scope, target.scopeId);
      entryOf(this.snapshotsOfScope, scope, () => [])[this.indexOfPeriod(target.period)] = snapshot;
      if (snapshot.sourceRevisions) this.sourcedScopes.add(scope);
    }
  }

  /** The position of a period, its months registered the first time it is seen. */
  private indexOfPeriod(period: Period): number {
    const id = periodId(period);
    let index = this.periodIndex.get(id);
    if (index === undefined) {
      index = this.periodMonths.length;
      this.periodIndex.set(id, index);
      this.periodMonths.push(
        monthsOf(period).map((month) =>
          entryOf(this.monthIndex, month, () => this.months.push(month) - 1),
        ),
      );
    }
    return index;
  }

  /**
   * Flows into the month buckets of the scopes each row covers (a region's sum has no chapter;
   * a chapter's month counts for its chapter, region and the network).
   */
  addFlows(flows: readonly MonthFlows[]): void {
    for (const row of flows) {
      if (!this.monthIndex.has(row.month)) continue;
      const covered = [scopeKey('region', row.regionId), scopeKey('network', 0)];
      if (row.chapterId !== null) covered.push(scopeKey('chapter', row.chapterId));
      for (const scope of covered) {
        if (!this.snapshotsOfScope.has(scope)) continue;
        const months = entryOf(this.flowBuckets, scope, () => new Map<MonthKey, SnapshotFigures>());
        addFlowsInPlace(entryOf(months, row.month, emptySnapshotFigures), row.figures);
      }
    }
  }

  /**
   * Compliance, pending, sources and stock of the chapters given, from their tallies' states,
   * added to the targets at once: month buckets per scope first, then each target's months.
   */
  addStatuses(chapters: readonly ChapterInfo[], statuses: readonly TallyStatus[]): void {
    const { months, monthIndex, periodMonths } = this;
    const buckets = new Map<string, Array<StatusBucket | undefined>>();
    const bucketsOf = (scope: string) => entryOf(buckets, scope, () => []);
    const bucketAt = (inScope: Array<StatusBucket | undefined>, index: number) =>
      (inScope[index] ??= { compliance: emptyCompliance(), pendingTallies: 0, sources: [] });
    const statusesOf = groupBy(statuses, (status) => status.chapterId);
    for (const chapter of chapters) {
      const scopes = [
        scopeKey('chapter', chapter.chapterId),
        scopeKey('region', chapter.regionId),
        scopeKey('network', 0),
      ].filter((scope) => this.snapshotsOfScope.has(scope));
      if (scopes.length === 0) continue;
      const monthBuckets = scopes.map(bucketsOf);
      const sourcedBuckets = scopes.filter((scope) => this.sourcedScopes.has(scope)).map(bucketsOf);

      // The chapter's tallies by month position: first submission, and the approved revision.
      const submittedAt = new Array<string | null | undefined>(months.length);
      const approvedAt = new Array<ApprovedRevision | undefined>(months.length);
      for (const status of statusesOf.get(chapter.chapterId) ?? []) {
        const index = monthIndex.get(status.month);
        if (index === undefined) continue;
        submittedAt[index] = status.firstSubmittedAt;
        if (status.pending) {
          for (const inScope of monthBuckets) bucketAt(inScope, index).pendingTallies += 1;
        }
        const { approved } = status;
        if (!approved) continue;
        approvedAt[index] = approved;
        if (sourcedBuckets.length > 0) {
          const source: SourceRevision = [approved.tallyId, approved.revision];
          for (const inScope of sourcedBuckets) bucketAt(inScope, index).sources.push(source);
        }
      }
      // Stock is a level: the chapter's closing stock of its last approved month in each period.
      const snapshotsOf = scopes.map((scope) => this.snapshotsOfScope.get(scope)!);
      for (let period = 0; period < periodMonths.length; period += 1) {
        const inPeriod = periodMonths[period];
        let approved: ApprovedRevision | undefined;
        for (let at = inPeriod.length - 1; at >= 0 && !approved; at -= 1) {
          approved = approvedAt[inPeriod[at]];
        }
        if (!approved) continue;
        for (const inScope of snapshotsOf) {
          const snapshot = inScope[period];
          if (!snapshot) continue;
          snapshot.figures.panelsInStock += approved.panelsClosing;
          snapshot.figures.blanketsInStock += approved.blanketsClosing;
        }
      }

      const activeFrom = chapter.activeFrom.slice(0, 7);
      const activeTo = chapter.activeTo?.slice(0, 7) ?? this.currentMonth;
      const lastExpected = activeTo < this.currentMonth ? activeTo : this.currentMonth;
      for (let index = 0; index < months.length; index += 1) {
        const month = months[index];
        if (month < activeFrom || month > lastExpected) continue;
        const field =
          COMPLIANCE_FIELD[this.statusOf(month, chapter.dueDay, submittedAt[index] ?? null)];
        for (const inScope of monthBuckets) {
          const { compliance } = bucketAt(inScope, index);
          compliance.expected += 1;
          compliance[field] += 1;
        }
      }
    }

    for (const [scope, inScope] of buckets) {
      const snapshots = this.snapshotsOfScope.get(scope)!;
      snapshots.forEach((snapshot, period) => {
        if (!snapshot) return;
        const sources = snapshot.sourceRevisions;
        for (const index of periodMonths[period]) {
          const bucket = inScope[index];
          if (!bucket) continue;
          snapshot.compliance = addCompliance(snapshot.compliance, bucket.compliance);
          snapshot.pendingTallies += bucket.pendingTallies;
          if (sources) for (const source of bucket.sources) sources.push(source);
        }
        // A snapshot counts one revision per tally, so the tally id alone orders them.
        sources?.sort((a, b) => a[0] - b[0]);
      });
    }
  }

  /** Every target's snapshot, with the flows of its period's months added up. */
  snapshots(): BuiltSnapshot[] {
    for (const snapshot of this.built.values()) {
      const inScope = this.flowBuckets.get(scopeKey(snapshot.scope, snapshot.scopeId));
      if (!inScope) continue;
      for (const month of monthsOf(snapshot.period)) {
        const figures = inScope.get(month);
        if (figures) addFlowsInPlace(snapshot.figures, figures);
      }
    }
    this.flowBuckets.clear();
    return [...this.built.values()];
  }

  /**
   * The reporting status of a chapter-month (see core's `reportingStatus`), with the due date
   * and the never-submitted status worked out once per month and due day: a full rebuild asks
   * for every chapter-month of the network.
   */
  private statusOf(month: MonthKey, dueDay: number, submittedAt: string | null): ReportingStatus {
    const byDueDay = entryOf(this.dueMemo, month, () => new Map<number, MonthDue>());
    const due = entryOf(byDueDay, dueDay, () => ({
      dueOn: tallyDueOn(month, dueDay),
      unsubmitted: reportingStatus({ month, dueDay, firstSubmittedAt: null, today: this.today }),
    }));
    if (submittedAt === null) return due.unsubmitted;
    // A UTC timestamp's first ten characters are its UTC date.
    const submittedOn = submittedAt.endsWith('Z')
      ? submittedAt.slice(0, 10)
      : utcDateOf(submittedAt, 'firstSubmittedAt');
    return submissionStatus(submittedOn, due.dueOn);
  }
}

/** A month's due date for one due day, and its status should nothing be submitted. */
interface MonthDue {
  dueOn: string;
  unsubmitted: ReportingStatus;
}

/** The target of `scope` that holds the chapter (the network has id 0). */
function holding(
  scope: SnapshotScope,
  chapter: Pick<ChapterInfo, 'chapterId' | 'regionId'>,
): number {
  return scope === 'chapter' ? chapter.chapterId : scope === 'region' ? chapter.regionId : 0;
}

/**
 * The snapshots a change of one chapter-month touches: that chapter, its region and the network
 * (those of `scopes`), each for the month, its quarter and its fiscal year.
 */
export function targetsOfChapterMonth(
  chapter: Pick<ChapterInfo, 'chapterId' | 'regionId'>,
  month: MonthKey,
  fiscalYearStartMonth: number,
  scopes: readonly SnapshotScope[] = ALL_SCOPES,
): SnapshotTarget[] {
  const periods = periodsContaining(month, fiscalYearStartMonth);
  return periods.flatMap((period) =>
    scopes.map((scope) => ({ scope, scopeId: holding(scope, chapter), period })),
  );
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
  scopes: readonly SnapshotScope[] = ALL_SCOPES,
): SnapshotTarget[] {
  const regionOf = new Map(chapters.map((chapter) => [chapter.chapterId, chapter.regionId]));
  // The months of each scope once (a full rebuild passes every chapter-month of the network),
  // keyed by number: no key text is built per chapter-month.
  const monthsOfScope = new Map<SnapshotScope, Map<number, Set<MonthKey>>>(
    scopes.map((scope) => [scope, new Map()]),
  );
  for (const { chapterId, month } of tallied) {
    const regionId = regionOf.get(chapterId);
    if (regionId === undefined) continue;
    for (const [scope, byId] of monthsOfScope) {
      const scopeId = holding(scope, { chapterId, regionId });
      entryOf(byId, scopeId, () => new Set<MonthKey>()).add(month);
    }
  }
  const periodsOf = new Map<MonthKey, Period[]>();
  const targets = new Map<string, SnapshotTarget>();
  for (const [scope, byId] of monthsOfScope) {
    for (const [scopeId, months] of byId) {
      for (const month of months) {
        const periods = entryOf(periodsOf, month, () =>
          periodsContaining(month, fiscalYearStartMonth),
        );
        for (const period of periods) {
          const target = { scope, scopeId, period };
          targets.set(targetKey(target), target);
        }
      }
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
