import type { FieldProblem, TallyValues } from '@tallyloom/core';

/**
 * The rules of a saved tally that need the database, after its shape passed TallyValuesDto:
 * lines name catalogue sizes and agencies the chapter serves, each line once, and opening stock
 * is typed in only where there is no earlier closing stock to carry. Field paths are those of
 * the request body, as the validation pipe names them.
 */
export interface SaveRuleContext {
  /** Ids of the blanket sizes the values name that exist in the catalogue. */
  knownSizeIds: ReadonlySet<number>;
  /** Ids of the partner agencies the chapter serves. */
  agencyIds: ReadonlySet<number>;
  chapterName: string;
  /**
   * Null when the opening is typed in by hand. Otherwise the openings the tally may hold: the one
   * it holds now, and last month's closing stock as it is now (to take up a correction).
   */
  carriedOpenings: ReadonlyArray<{ panels: number; blankets: number }> | null;
}

export function saveRuleProblems(values: TallyValues, context: SaveRuleContext): FieldProblem[] {
  const found: FieldProblem[] = [];
  const problem = (field: string, message: string) =>
    found.push({ field: `values.${field}`, messages: [message] });

  if (context.carriedOpenings !== null) {
    const carried = context.carriedOpenings;
    for (const kind of ['panels', 'blankets'] as const) {
      const value = values[kind].opening;
      if (!carried.some((opening) => opening[kind] === value))
        problem(
          `${kind}.opening`,
          `${kind}.opening is carried from last month's closing stock (${carried
            .map((opening) => opening[kind])
            .join(' or ')}) and cannot be typed in; correct last month's tally instead.`,
        );
    }
  }

  const size = (field: string, id: number) => {
    if (!context.knownSizeIds.has(id)) problem(field, `No blanket size ${id} in the catalogue.`);
  };
  const agency = (field: string, id: number) => {
    if (!context.agencyIds.has(id))
      problem(field, `Partner agency ${id} is not one that ${context.chapterName} serves.`);
  };
  const once = <Line>(lines: Line[], path: string, keyOf: (line: Line) => string, what: string) => {
    const seen = new Map<string, number>();
    lines.forEach((line, index) => {
      const first = seen.get(keyOf(line));
      if (first !== undefined)
        problem(
          `${path}.${index}`,
          `${what} is listed twice (lines ${first + 1} and ${index + 1}).`,
        );
      else seen.set(keyOf(line), index);
    });
  };

  values.blankets.assembled.forEach((line, index) =>
    size(`blankets.assembled.${index}.blanketSizeId`, line.blanketSizeId),
  );
  once(values.blankets.assembled, 'blankets.assembled', (l) => `${l.blanketSizeId}`, 'This size');
  values.blankets.given.forEach((line, index) => {
    size(`blankets.given.${index}.blanketSizeId`, line.blanketSizeId);
    agency(`blankets.given.${index}.partnerAgencyId`, line.partnerAgencyId);
  });
  once(
    values.blankets.given,
    'blankets.given',
    (l) => `${l.blanketSizeId}/${l.partnerAgencyId}`,
    'This size for this agency',
  );
  values.peopleServed.forEach((line, index) =>
    agency(`peopleServed.${index}.partnerAgencyId`, line.partnerAgencyId),
  );
  once(
    values.peopleServed,
    'peopleServed',
    (l) => `${l.partnerAgencyId}/${l.group}`,
    'This group for this agency',
  );
  return found;
}
