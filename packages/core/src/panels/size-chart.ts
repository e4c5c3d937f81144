/**
 * Target sizes of the blanket size catalogue, from a published size chart. The demo seed turns
 * each target into the nearest grid of 7 × 9 in panels with `closestGrid`, and the catalogue test
 * checks the same values, so the two never drift apart.
 */

// from memory: the chart's sizes are recalled, not copied from the publication.
export const SIZE_CHART_SOURCE = 'Craft Yarn Council, Standard Blanket Sizes chart (from memory)';

export interface SizeChartTarget {
  /** The catalogue entry the target is for. */
  name: string;
  /** The chart's own name for the size. */
  chartSize: string;
  widthIn: number;
  heightIn: number;
}

export const BLANKET_SIZE_CHART_TARGETS: readonly SizeChartTarget[] = [
  { name: 'Baby', chartSize: 'baby', widthIn: 36, heightIn: 36 },
  { name: 'Child', chartSize: 'crib/child', widthIn: 45, heightIn: 60 },
  { name: 'Lap', chartSize: 'lap', widthIn: 36, heightIn: 48 },
  { name: 'Adult throw', chartSize: 'throw', widthIn: 50, heightIn: 60 },
];
