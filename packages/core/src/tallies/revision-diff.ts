import { SET_ASIDE_REASONS } from '../contract/receipts';
import type { TallyValues } from '../contract/tallies';
import { formatNumber } from './format';
import {
  TALLY_FIELD_LABELS,
  agencyName,
  blanketSizeName,
  peopleGroupName,
  setAsideField,
  type TallyNames,
} from './labels';

export interface TallyValueChange {
  /** Path into the values of the newer revision (the older one for a removed line). */
  field: string;
  label: string;
  /** null when the line was added. */
  before: number | string | null;
  /** null when the line was removed. */
  after: number | string | null;
}

type Leaf = number | string | null;

function single(field: string, before: Leaf, after: Leaf): TallyValueChange[] {
  return before === after ? [] : [{ field, label: TALLY_FIELD_LABELS[field], before, after }];
}

function text(value: string | null | undefined): string | null {
  const trimmed = typeof value === 'string' ? value.trim() : '';
  return trimmed === '' ? null : trimmed;
}

function yarn(value: TallyValues['yarnDonated']): string | null {
  return value ? `${formatNumber(value.value)} ${value.unit}` : null;
}

/** Lines matched by their key (size, agency, group), not their position in the list. */
function lineChanges<Line extends { count: number }>(
  path: string,
  before: readonly Line[],
  after: readonly Line[],
  keyOf: (line: Line) => string,
  labelOf: (line: Line) => string,
): TallyValueChange[] {
  const index = (lines: readonly Line[]) => {
    const byKey = new Map<string, { line: Line; position: number; count: number }>();
    lines.forEach((line, position) => {
      const key = keyOf(line);
      const seen = byKey.get(key);
      // A repeated line (refused by the checks) still diffs by its total.
      if (seen) seen.count += line.count;
      else byKey.set(key, { line, position, count: line.count });
    });
    return byKey;
  };
  const old = index(before);
  const now = index(after);
  const changes: TallyValueChange[] = [];
  for (const [key, entry] of now) {
    const was = old.get(key);
    if (was?.count !== entry.count) {
      changes.push({
        field: `${path}[${entry.position}].count`,
        label: labelOf(entry.line),
        before: was ? was.count : null,
        after: entry.count,
      });
    }
  }
  for (const [key, entry] of old) {
    if (!now.has(key)) {
      changes.push({
        field: `${path}[${entry.position}].count`,
        label: labelOf(entry.line),
        before: entry.count,
        after: null,
      });
    }
  }
  return changes;
}

/**
 * Every figure that differs between two revisions of a tally, in form order, labelled for a
 * person ("Given out: Lap blanket → Maple Street Family Shelter").
 */
export function diffTallyValues(
  before: TallyValues,
  after: TallyValues,
  names: TallyNames = {},
): TallyValueChange[] {
  const size = (id: number) => blanketSizeName(id, names);
  const agency = (id: number) => agencyName(id, names);
  return [
    ...single('panels.opening', before.panels.opening, after.panels.opening),
    ...single('panels.accepted', before.panels.accepted, after.panels.accepted),
    ...SET_ASIDE_REASONS.flatMap((reason) =>
      single(
        setAsideField(reason),
        before.panels.setAside[reason] ?? null,
        after.panels.setAside[reason] ?? null,
      ),
    ),
    ...single('panels.usedInAssembly', before.panels.usedInAssembly, after.panels.usedInAssembly),
    ...single('panels.closing', before.panels.closing, after.panels.closing),
    ...single(
      'receiptsDifferenceReason',
      text(before.receiptsDifferenceReason),
      text(after.receiptsDifferenceReason),
    ),
    ...single('blankets.opening', before.blankets.opening, after.blankets.opening),
    ...lineChanges(
      'blankets.assembled',
      before.blankets.assembled,
      after.blankets.assembled,
      (line) => String(line.blanketSizeId),
      (line) => `Assembled: ${size(line.blanketSizeId)}`,
    ),
    ...single('blankets.received', before.blankets.received, after.blankets.received),
    ...lineChanges(
      'blankets.given',
      before.blankets.given,
      after.blankets.given,
      (line) => `${line.blanketSizeId}/${line.partnerAgencyId}`,
      (line) => `Given out: ${size(line.blanketSizeId)} → ${agency(line.partnerAgencyId)}`,
    ),
    ...single('blankets.closing', before.blankets.closing, after.blankets.closing),
    ...lineChanges(
      'peopleServed',
      before.peopleServed,
      after.peopleServed,
      (line) => `${line.partnerAgencyId}/${line.group}`,
      (line) => `People served: ${peopleGroupName(line.group)} at ${agency(line.partnerAgencyId)}`,
    ),
    ...single('volunteerHours', before.volunteerHours, after.volunteerHours),
    ...single('yarnDonated', yarn(before.yarnDonated), yarn(after.yarnDonated)),
    ...single('notes', text(before.notes), text(after.notes)),
  ];
}
