import { TRACE_MEASURES, type TraceMeasure } from '@tallyloom/core';

/** The snapshot measures in words, as the dashboards and the impact pack name them. */
export const TRACE_MEASURE_LABELS: Record<TraceMeasure, string> = {
  panelsAccepted: 'Panels received',
  panelsSetAside: 'Panels set aside',
  panelsUsed: 'Panels used in assembly',
  blanketsAssembled: 'Blankets made',
  blanketsReceived: 'Finished blankets received',
  blanketsGiven: 'Blankets given',
  peopleServed: 'People served',
  volunteerHours: 'Volunteer hours',
  yarnKg: 'Yarn donated (kg)',
  panelsInStock: 'Panels in stock',
  blanketsInStock: 'Blankets in stock',
  approvedTallies: 'Approved tallies',
};

export function isTraceMeasure(value: string | null | undefined): value is TraceMeasure {
  return (TRACE_MEASURES as readonly string[]).includes(value ?? '');
}
