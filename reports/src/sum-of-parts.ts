/**
 * Stored snapshots as sums of other stored snapshots, so a change in one chapter-month reads
 * rows already built instead of every tally behind them: the network's from its regions', a
 * region's quarter or fiscal year from its months'. Flows, compliance and pending counts add
 * across chapters and across months. Stock is a level: it adds across regions, but a longer
 * period's stock is each chapter's closing of its last approved month in it (`periodStockSql`),
 * not a sum over months.
 */
import {
  addCompliance,
  addFlowsInPlace,
  addSnapshotFigures,
  emptyCompliance,
  emptySnapshotFigures,
  type MonthKey,
  type Period,
} from '@tallyloom/core';
import { namesOwnSources } from './snapshot-sources';
import type { BuiltSnapshot, SnapshotTarget } from './tally-snapshot-rollup';
import type { PeriodStock } from './tally-status';

/** What a stored snapshot adds to a longer or wider one. */
export type SnapshotPart = Pick<BuiltSnapshot, 'figures' | 'compliance' | 'pendingTallies'>;

/** A stored or freshly built region snapshot, as far as the network needs it. */
export type RegionPart = SnapshotPart & Pick<BuiltSnapshot, 'scopeId'>;

/** A stored or freshly built month of one region. */
export type MonthPart = SnapshotPart & { month: MonthKey };

/**
 * The network for one period as the sum of its regions (every chapter is in exactly one region,
 * and every measure adds across scopes), so a change in one region needs only that region's
 * facts and the other regions' stored rows, not every chapter of the network.
 */
export function networkFromRegions(period: Period, regions: readonly RegionPart[]): BuiltSnapshot {
  let figures = emptySnapshotFigures();
  let compliance = emptyCompliance();
  let pendingTallies = 0;
  for (const region of regions) {
    figures = addSnapshotFigures(figures, region.figures);
    compliance = addCompliance(compliance, region.compliance);
    pendingTallies += region.pendingTallies;
  }
  return {
    scope: 'network',
    scopeId: 0,
    period,
    figures,
    compliance,
    pendingTallies,
    // Its regions' months name them.
    sourceRevisions: null,
  };
}

/**
 * A region's quarter or fiscal year as the sum of its months in the period (the others are
 * ignored), with the period's stock given. Every month in which the region's chapters were
 * expected or filed must be among `months`: a month left out counts as nothing at all.
 */
export function regionPeriodFromMonths(
  target: SnapshotTarget,
  months: readonly MonthPart[],
  stock: PeriodStock,
): BuiltSnapshot {
  if (target.scope !== 'region' || namesOwnSources(target)) {
    throw new RangeError(
      `only a region's quarter or fiscal year adds up months; got ${target.scope} ${target.period.kind}`,
    );
  }
  const figures = emptySnapshotFigures();
  let compliance = emptyCompliance();
  let pendingTallies = 0;
  for (const part of months) {
    if (part.month < target.period.from || part.month > target.period.to) continue;
    addFlowsInPlace(figures, part.figures);
    compliance = addCompliance(compliance, part.compliance);
    pendingTallies += part.pendingTallies;
  }
  figures.panelsInStock = stock.panels;
  figures.blanketsInStock = stock.blankets;
  // Its months name the revisions.
  return { ...target, figures, compliance, pendingTallies, sourceRevisions: null };
}
