import { diffTallyValues, type TallyValueChange, type TallyValues } from '@tallyloom/core';
import { tallyFields, type TallyField, type TallyNames } from './tally-fields';

/** One figure side by side in two revisions; null where the revision has no such line. */
export interface CompareRow {
  section: TallyField['section'];
  field: string;
  label: string;
  kind: TallyField['kind'];
  left: number | string | null;
  right: number | string | null;
  changed: boolean;
}

const LINE_PATH = /^(blankets\.assembled|blankets\.given|peopleServed)\[(\d+)\]\.count$/;

/**
 * The row a change from `diffTallyValues` belongs to. The diff names a line by its position in
 * one revision (`blankets.given[2].count`); the rows name it by what it counts (size, agency,
 * group), so the same line lines up across revisions whatever its position.
 */
export function rowFieldOf(change: TallyValueChange, left: TallyValues, right: TallyValues) {
  const match = LINE_PATH.exec(change.field);
  if (!match) return change.field;
  // A removed line is named by its position in the earlier revision.
  const values = change.after === null ? left : right;
  const position = Number(match[2]);
  switch (match[1]) {
    case 'blankets.assembled': {
      const line = values.blankets.assembled[position];
      return line ? `blankets.assembled.${line.blanketSizeId}` : change.field;
    }
    case 'blankets.given': {
      const line = values.blankets.given[position];
      return line ? `blankets.given.${line.blanketSizeId}.${line.partnerAgencyId}` : change.field;
    }
    default: {
      const line = values.peopleServed[position];
      return line ? `peopleServed.${line.partnerAgencyId}.${line.group}` : change.field;
    }
  }
}

/**
 * Every figure of two revisions side by side, in form order; a line only one revision has
 * stays where that revision lists it. `changed` comes from the core's diff, the one definition
 * of what counts as a change.
 */
export function compareRows(
  left: TallyValues,
  right: TallyValues,
  names: TallyNames,
): CompareRow[] {
  const leftFields = tallyFields(left, names);
  const rightFields = tallyFields(right, names);
  const changed = new Set(
    diffTallyValues(left, right, names).map((change) => rowFieldOf(change, left, right)),
  );

  // Start from the later revision's order; slot each line only the earlier one has in after
  // the field it followed there.
  const order = rightFields.map((field) => field.field);
  leftFields.forEach((field, index) => {
    if (order.includes(field.field)) return;
    const previous = leftFields
      .slice(0, index)
      .reverse()
      .find((candidate) => order.includes(candidate.field));
    order.splice(previous ? order.indexOf(previous.field) + 1 : 0, 0, field.field);
  });

  const leftByField = new Map(leftFields.map((field) => [field.field, field]));
  const rightByField = new Map(rightFields.map((field) => [field.field, field]));
  return order.flatMap((key): CompareRow[] => {
    const leftField = leftByField.get(key);
    const rightField = rightByField.get(key);
    const shape = rightField ?? leftField;
    if (!shape) return [];
    return [
      {
        section: shape.section,
        field: key,
        label: shape.label,
        kind: shape.kind,
        left: leftField ? leftField.value : null,
        right: rightField ? rightField.value : null,
        changed: changed.has(key),
      },
    ];
  });
}
