import { SET_ASIDE_LABELS, SET_ASIDE_REASONS, type SetAsideReason } from '../contract/receipts';
import { PEOPLE_GROUP_LABELS, type PeopleGroup } from '../contract/tallies';

/** Labels of a tally's single figures, by their path in TallyValues, in form order. */
export const TALLY_FIELD_LABELS: Readonly<Record<string, string>> = {
  'panels.opening': 'Panel opening stock',
  'panels.accepted': 'Panels accepted',
  ...Object.fromEntries(
    SET_ASIDE_REASONS.map((reason) => [
      `panels.setAside.${reason}`,
      `Set aside: ${SET_ASIDE_LABELS[reason]}`,
    ]),
  ),
  'panels.usedInAssembly': 'Panels used in assembly',
  'panels.closing': 'Panel closing stock',
  receiptsDifferenceReason: 'Reason panels accepted differ from receipts',
  'blankets.opening': 'Blanket opening stock',
  'blankets.assembled': 'Blankets assembled',
  'blankets.received': 'Finished blankets received',
  'blankets.given': 'Blankets given out',
  'blankets.closing': 'Blanket closing stock',
  peopleServed: 'People served',
  volunteerHours: 'Volunteer hours',
  yarnDonated: 'Yarn donated',
  notes: 'Notes',
};

export function setAsideField(reason: SetAsideReason): string {
  return `panels.setAside.${reason}`;
}

/** Names of catalogue sizes and partner agencies, by id, for messages and labels. */
export interface TallyNames {
  blanketSizes?: Record<number, string>;
  agencies?: Record<number, string>;
}

export function blanketSizeName(id: number, names: TallyNames): string {
  return names.blanketSizes?.[id] ?? `blanket size #${id}`;
}

export function agencyName(id: number, names: TallyNames): string {
  return names.agencies?.[id] ?? `agency #${id}`;
}

export function peopleGroupName(group: PeopleGroup): string {
  return PEOPLE_GROUP_LABELS[group] ?? String(group);
}
