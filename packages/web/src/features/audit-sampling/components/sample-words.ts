import {
  monthLabel,
  type ChapterView,
  type RegionView,
  type SamplePopulation,
  type SamplePopulationKind,
  type WorksheetResultView,
} from '@tallyloom/core';

export const POPULATION_LABELS: Record<SamplePopulationKind, string> = {
  'parcel-receipts': 'Parcel receipts',
  tallies: 'Approved monthly tallies',
};

/** 0.95 → "95 %". */
export function confidenceWords(confidence: number): string {
  return `${Math.round(confidence * 100)} %`;
}

/** "Mar 2026" or "Jan 2026 – Mar 2026". */
export function monthsWords(from: string, to: string): string {
  return from === to ? monthLabel(from) : `${monthLabel(from)} – ${monthLabel(to)}`;
}

/** "Whole network", "Region North Ridge", "Chapter Alder Falls" (or its id while names load). */
export function scopeWords(
  population: Pick<SamplePopulation, 'scope' | 'scopeId'>,
  regions: readonly RegionView[] = [],
  chapters: readonly ChapterView[] = [],
): string {
  if (population.scope === 'network') return 'Whole network';
  const list = population.scope === 'region' ? regions : chapters;
  const name = list.find((each) => each.id === population.scopeId)?.name;
  const noun = population.scope === 'region' ? 'Region' : 'Chapter';
  return `${noun} ${name ?? `#${population.scopeId ?? '?'}`}`;
}

/** "3 of 11 recorded". */
export function progressWords(worksheet: WorksheetResultView, items: number): string {
  return `${worksheet.examined} of ${items} recorded`;
}
