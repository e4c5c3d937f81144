import type { HeadlineCount, TallyHeadline, TallyValues } from '../contract/tallies';

function sumOf(lines: ReadonlyArray<{ count: number }>): number {
  return lines.reduce((total, line) => total + line.count, 0);
}

/** The figures shown for a tally in lists and on dashboards. */
export function headlineOf(values: TallyValues): TallyHeadline {
  return {
    panelsAccepted: values.panels.accepted,
    blanketsAssembled: sumOf(values.blankets.assembled),
    blanketsGiven: sumOf(values.blankets.given),
    peopleServed: sumOf(values.peopleServed),
    volunteerHours: values.volunteerHours,
  };
}

/** Every count the plausibility check compares with the chapter's history. */
export function headlineCountsOf(values: TallyValues): Record<HeadlineCount, number> {
  return { ...headlineOf(values), panelsUsed: values.panels.usedInAssembly };
}
