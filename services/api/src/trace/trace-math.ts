import {
  addSnapshotFigures,
  combineMonthsInto,
  emptySnapshotFigures,
  type MonthKey,
  type SnapshotFigures,
  type TraceFigures,
  type TraceMeasure,
} from '@tallyloom/core';

/** One counted tally revision with the figures it adds to a snapshot. */
export interface FigureLine {
  chapterId: number;
  month: MonthKey;
  figures: SnapshotFigures;
}

/**
 * Re-adds the lines the way the snapshot roll-up does: each chapter over its months first (flows
 * sum, stock is its last month's), then the chapters together (everything sums).
 */
export function recomputeFigures(lines: readonly FigureLine[]): SnapshotFigures {
  const byChapter = new Map<number, FigureLine[]>();
  for (const line of lines) {
    const list = byChapter.get(line.chapterId);
    if (list) list.push(line);
    else byChapter.set(line.chapterId, [line]);
  }
  let total = emptySnapshotFigures();
  for (const chapterLines of byChapter.values()) {
    const inOrder = [...chapterLines].sort((a, b) => a.month.localeCompare(b.month));
    total = addSnapshotFigures(total, combineMonthsInto(inOrder.map((line) => line.figures)));
  }
  return total;
}

/** The values of `measures` only. */
export function pickMeasures(
  figures: SnapshotFigures,
  measures: readonly TraceMeasure[],
): TraceFigures {
  return Object.fromEntries(measures.map((measure) => [measure, figures[measure]]));
}

/** True when both hold the same number for every measure. */
export function sameFigures(
  a: TraceFigures,
  b: TraceFigures,
  measures: readonly TraceMeasure[],
): boolean {
  return measures.every((measure) => a[measure] === b[measure]);
}
