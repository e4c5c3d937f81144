import type { SnapshotFigures } from '@tallyloom/core';

/** The five headline figures, in card order, with one colour each wherever they are drawn. */
export const KPI_MEASURES = [
  'panelsAccepted',
  'blanketsAssembled',
  'blanketsGiven',
  'peopleServed',
  'volunteerHours',
] as const satisfies ReadonlyArray<keyof SnapshotFigures>;

export type KpiMeasure = (typeof KPI_MEASURES)[number];

export const MEASURE_LABELS: Record<KpiMeasure, string> = {
  panelsAccepted: 'Panels received',
  blanketsAssembled: 'Blankets made',
  blanketsGiven: 'Blankets given',
  peopleServed: 'People served',
  volunteerHours: 'Volunteer hours',
};

/**
 * One meaning per colour across every chart of the dashboards. Picked to stay apart for the
 * common red-green colour blindness and to read on white; each chart also names its series in words.
 */
export const MEASURE_COLOURS: Record<KpiMeasure, string> = {
  panelsAccepted: '#0F5C5E',
  blanketsAssembled: '#7A4E9C',
  blanketsGiven: '#C0661A',
  peopleServed: '#2A6FB0',
  volunteerHours: '#5F6B2E',
};

/** The measures the trend and comparison charts draw: the flow from panels to people. */
export const CHART_MEASURES = ['panelsAccepted', 'blanketsAssembled', 'blanketsGiven'] as const;
