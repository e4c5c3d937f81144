import { SNAPSHOT_MEASURES, type SnapshotFigures } from '../contract/reports';
import { PEOPLE_GROUPS, type PeopleGroup } from '../contract/tallies';

// Combining snapshot figures. Two different roll-ups:
// - across scopes (chapters of one period into a region): every measure sums, stock included,
//   because each chapter holds its own stock;
// - across time (months into a quarter): flows sum, but stock is a level, not a flow, so the
//   period's stock is the last month's.

type FlowMeasure = Exclude<
  keyof SnapshotFigures,
  'peopleServedByGroup' | 'panelsInStock' | 'blanketsInStock'
>;

// Stock is a level, not a flow: every other single-number measure sums over time.
const FLOW_MEASURES = SNAPSHOT_MEASURES.filter(
  (measure): measure is FlowMeasure => measure !== 'panelsInStock' && measure !== 'blanketsInStock',
);

function emptyGroups(): Record<PeopleGroup, number> {
  return { infants: 0, children: 0, adults: 0, olderAdults: 0, disasterAffected: 0 };
}

/** Figures of a scope and period with no approved tally: every measure 0. */
export function emptySnapshotFigures(): SnapshotFigures {
  // Written out, not built from SNAPSHOT_MEASURES: every figures object then has one shape, which
  // keeps the roll-up's additions fast. The spec checks it against SNAPSHOT_MEASURES.
  return {
    panelsAccepted: 0,
    panelsSetAside: 0,
    panelsUsed: 0,
    blanketsAssembled: 0,
    blanketsReceived: 0,
    blanketsGiven: 0,
    peopleServed: 0,
    peopleServedByGroup: emptyGroups(),
    volunteerHours: 0,
    yarnKg: 0,
    panelsInStock: 0,
    blanketsInStock: 0,
    approvedTallies: 0,
  };
}

function sumFlows(a: SnapshotFigures, b: SnapshotFigures): SnapshotFigures {
  const sum = emptySnapshotFigures();
  for (const measure of FLOW_MEASURES) sum[measure] = a[measure] + b[measure];
  // Hours and kg are stored with 2 and 6 decimals; a sum of such values has no more, so rounding
  // to 6 only removes binary floating-point noise and never moves a figure (display rounds later).
  sum.volunteerHours = roundToStored(sum.volunteerHours);
  sum.yarnKg = roundToStored(sum.yarnKg);
  for (const group of PEOPLE_GROUPS) {
    sum.peopleServedByGroup[group] =
      (a.peopleServedByGroup[group] ?? 0) + (b.peopleServedByGroup[group] ?? 0);
  }
  return sum;
}

function roundToStored(value: number): number {
  return Math.round(value * 1e6) / 1e6;
}

/**
 * Adds the flows of `source` into `target` in place (stock untouched): for roll-ups that add
 * tens of thousands of months, where a new figures object per addition would cost more than the
 * sums. Rounds hours and kg like `addSnapshotFigures`.
 */
export function addFlowsInPlace(target: SnapshotFigures, source: SnapshotFigures): void {
  // Each measure by name, not by a loop over FLOW_MEASURES: keyed access to many property names
  // is several times slower, and this runs for every chapter-month of a rebuild. The spec checks
  // that every flow measure is here.
  target.panelsAccepted += source.panelsAccepted;
  target.panelsSetAside += source.panelsSetAside;
  target.panelsUsed += source.panelsUsed;
  target.blanketsAssembled += source.blanketsAssembled;
  target.blanketsReceived += source.blanketsReceived;
  target.blanketsGiven += source.blanketsGiven;
  target.peopleServed += source.peopleServed;
  target.volunteerHours = roundToStored(target.volunteerHours + source.volunteerHours);
  target.yarnKg = roundToStored(target.yarnKg + source.yarnKg);
  target.approvedTallies += source.approvedTallies;
  const into = target.peopleServedByGroup;
  const from = source.peopleServedByGroup;
  into.infants += from.infants ?? 0;
  into.children += from.children ?? 0;
  into.adults += from.adults ?? 0;
  into.olderAdults += from.olderAdults ?? 0;
  into.disasterAffected += from.disasterAffected ?? 0;
}

/** Adds the figures of two scopes for the same period (e.g. two chapters of a region). */
export function addSnapshotFigures(a: SnapshotFigures, b: SnapshotFigures): SnapshotFigures {
  const sum = sumFlows(a, b);
  sum.panelsInStock = a.panelsInStock + b.panelsInStock;
  sum.blanketsInStock = a.blanketsInStock + b.blanketsInStock;
  return sum;
}

/**
 * Rolls consecutive periods of ONE chapter (oldest first) into one longer period: flows sum, and
 * the stock is that of the last period with an approved tally (the chapter's latest known
 * closing stock). For a region or the network, roll each chapter up in time first and then add
 * the chapters: a region's month may lack a late chapter whose stock is still known from an
 * earlier month. Empty input gives empty figures.
 */
export function combineMonthsInto(periodFigures: ReadonlyArray<SnapshotFigures>): SnapshotFigures {
  let combined = emptySnapshotFigures();
  for (const figures of periodFigures) {
    const stock =
      figures.approvedTallies > 0
        ? { panels: figures.panelsInStock, blankets: figures.blanketsInStock }
        : { panels: combined.panelsInStock, blankets: combined.blanketsInStock };
    combined = sumFlows(combined, figures);
    combined.panelsInStock = stock.panels;
    combined.blanketsInStock = stock.blankets;
  }
  return combined;
}
