import {
  PEOPLE_GROUP_LABELS,
  PEOPLE_GROUPS,
  SET_ASIDE_LABELS,
  SET_ASIDE_REASONS,
  type TallyValues,
} from '@tallyloom/core';
import { formatFigure } from '@/lib/format';

export type TallySection = 'panels' | 'blankets' | 'peopleServed' | 'other';

export const TALLY_SECTION_LABELS: Record<TallySection, string> = {
  panels: 'Panels',
  blankets: 'Blankets',
  peopleServed: 'People served',
  other: 'Hours, yarn and notes',
};

/** One figure of a tally, in words: what the summary lists and the comparison lines up. */
export interface TallyField {
  section: TallySection;
  /** Stable path, e.g. 'panels.opening' or 'blankets.given.3.31' (size 3 to agency 31). */
  field: string;
  label: string;
  value: number | string | null;
  /** Counts are right-aligned and compared as numbers; text is shown as written. */
  kind: 'count' | 'text';
}

/** Names of the catalogue's sizes and the chapter's agencies, by id. */
export interface TallyNames {
  blanketSizes: Record<number, string>;
  agencies: Record<number, string>;
}

function nameOf(names: Record<number, string>, id: number, what: string): string {
  return names[id] ?? `${what} #${id}`;
}

/**
 * Every figure of a tally as a flat list, section by section, in the order the form asks for
 * them. Lines (blankets by size, people by agency and group) appear only where the tally has one.
 */
export function tallyFields(values: TallyValues, names: TallyNames): TallyField[] {
  const size = (id: number) => nameOf(names.blanketSizes, id, 'Size');
  const agency = (id: number) => nameOf(names.agencies, id, 'Agency');
  const count = (section: TallySection, field: string, label: string, value: number) =>
    ({ section, field, label, value, kind: 'count' }) satisfies TallyField;
  const text = (section: TallySection, field: string, label: string, value: string | null) =>
    ({ section, field, label, value, kind: 'text' }) satisfies TallyField;

  const peopleServed = [...values.peopleServed].sort(
    (a, b) =>
      agency(a.partnerAgencyId).localeCompare(agency(b.partnerAgencyId)) ||
      PEOPLE_GROUPS.indexOf(a.group) - PEOPLE_GROUPS.indexOf(b.group),
  );

  return [
    count('panels', 'panels.opening', 'Opening stock', values.panels.opening),
    count('panels', 'panels.accepted', 'Accepted', values.panels.accepted),
    ...SET_ASIDE_REASONS.map((reason) =>
      count(
        'panels',
        `panels.setAside.${reason}`,
        `Set aside: ${SET_ASIDE_LABELS[reason].toLowerCase()}`,
        values.panels.setAside[reason],
      ),
    ),
    count('panels', 'panels.usedInAssembly', 'Used in assembly', values.panels.usedInAssembly),
    count('panels', 'panels.closing', 'Closing stock', values.panels.closing),
    text(
      'panels',
      'receiptsDifferenceReason',
      'Why accepted differs from the parcels',
      values.receiptsDifferenceReason,
    ),
    count('blankets', 'blankets.opening', 'Opening stock', values.blankets.opening),
    ...values.blankets.assembled.map((line) =>
      count(
        'blankets',
        `blankets.assembled.${line.blanketSizeId}`,
        `Assembled: ${size(line.blanketSizeId)}`,
        line.count,
      ),
    ),
    count('blankets', 'blankets.received', 'Finished blankets received', values.blankets.received),
    ...values.blankets.given.map((line) =>
      count(
        'blankets',
        `blankets.given.${line.blanketSizeId}.${line.partnerAgencyId}`,
        `Given out: ${size(line.blanketSizeId)} to ${agency(line.partnerAgencyId)}`,
        line.count,
      ),
    ),
    count('blankets', 'blankets.closing', 'Closing stock', values.blankets.closing),
    ...peopleServed.map((line) =>
      count(
        'peopleServed',
        `peopleServed.${line.partnerAgencyId}.${line.group}`,
        `${agency(line.partnerAgencyId)}: ${PEOPLE_GROUP_LABELS[line.group].toLowerCase()}`,
        line.count,
      ),
    ),
    count('other', 'volunteerHours', 'Volunteer hours', values.volunteerHours),
    text(
      'other',
      'yarnDonated',
      'Yarn donated',
      values.yarnDonated
        ? `${formatFigure(values.yarnDonated.value)} ${values.yarnDonated.unit}`
        : null,
    ),
    text('other', 'notes', 'Notes', values.notes),
  ];
}
