import {
  PEOPLE_GROUPS,
  SET_ASIDE_LABELS,
  SET_ASIDE_REASONS,
  type MassUnit,
  type PeopleGroup,
  type SetAsideReason,
  type TallyDetail,
  type TallyValues,
} from '@tallyloom/core';
import { parseDecimal, parseWholeNumber } from '@/lib/form-values';

/** The highest count the server takes (its TALLY_COUNT_CEILING). */
const COUNT_CEILING = 10_000_000;
const HOURS_CEILING = 1_000_000;
const YARN_CEILING = 1_000_000;

/**
 * A tally as the form holds it: every figure as typed, so a half-typed or cleared box is never
 * forced into a number. Fixed rows (one per blanket size, one per partner agency) are arrays, as
 * react-hook-form reads numeric path segments as array indexes.
 */
export interface TallyForm {
  panels: {
    opening: string;
    accepted: string;
    setAside: Record<SetAsideReason, string>;
    usedInAssembly: string;
    closing: string;
  };
  receiptsDifferenceReason: string;
  blankets: {
    opening: string;
    assembled: Array<{ blanketSizeId: number; count: string }>;
    received: string;
    given: GivenRow[];
    closing: string;
  };
  peopleServed: Array<{ partnerAgencyId: number; counts: Record<PeopleGroup, string> }>;
  volunteerHours: string;
  yarn: { value: string; unit: MassUnit };
  notes: string;
}

/** One "given out" line; an empty id means "not chosen yet". */
export interface GivenRow {
  blanketSizeId: string;
  partnerAgencyId: string;
  count: string;
}

export const emptyGivenRow: GivenRow = { blanketSizeId: '', partnerAgencyId: '', count: '0' };

const text = (value: number) => String(value);

/** What the form starts from: the stored values, with one row per catalogue size and agency. */
export function formOf(
  detail: Pick<TallyDetail, 'values' | 'checkContext' | 'agencies'>,
): TallyForm {
  const { values, checkContext, agencies } = detail;
  const sizeIds = [
    ...checkContext.blanketSizes.map((size) => size.id),
    ...values.blankets.assembled.map((line) => line.blanketSizeId),
  ];
  const agencyIds = [
    ...agencies.map((agency) => agency.id),
    ...values.peopleServed.map((line) => line.partnerAgencyId),
  ];
  return {
    panels: {
      opening: text(values.panels.opening),
      accepted: text(values.panels.accepted),
      setAside: Object.fromEntries(
        SET_ASIDE_REASONS.map((reason) => [reason, text(values.panels.setAside[reason])]),
      ) as Record<SetAsideReason, string>,
      usedInAssembly: text(values.panels.usedInAssembly),
      closing: text(values.panels.closing),
    },
    receiptsDifferenceReason: values.receiptsDifferenceReason ?? '',
    blankets: {
      opening: text(values.blankets.opening),
      assembled: [...new Set(sizeIds)].map((blanketSizeId) => ({
        blanketSizeId,
        count: text(
          values.blankets.assembled.find((line) => line.blanketSizeId === blanketSizeId)?.count ??
            0,
        ),
      })),
      received: text(values.blankets.received),
      given: values.blankets.given.map((line) => ({
        blanketSizeId: text(line.blanketSizeId),
        partnerAgencyId: text(line.partnerAgencyId),
        count: text(line.count),
      })),
      closing: text(values.blankets.closing),
    },
    peopleServed: [...new Set(agencyIds)].map((partnerAgencyId) => ({
      partnerAgencyId,
      counts: Object.fromEntries(
        PEOPLE_GROUPS.map((group) => [
          group,
          text(
            values.peopleServed.find(
              (line) => line.partnerAgencyId === partnerAgencyId && line.group === group,
            )?.count ?? 0,
          ),
        ]),
      ) as Record<PeopleGroup, string>,
    })),
    volunteerHours: text(values.volunteerHours),
    yarn: values.yarnDonated
      ? { value: text(values.yarnDonated.value), unit: values.yarnDonated.unit }
      : { value: '', unit: 'kg' },
    notes: values.notes ?? '',
  };
}

// ── Reading the typed text ───────────────────────────────────────────────────────────────────

/** "Panels used must be a whole number, 0 or more", or undefined when the text is one. */
export function wholeNumberProblem(text: string, name: string): string | undefined {
  return parseWholeNumber(text, 0, COUNT_CEILING) === undefined
    ? `${name} must be a whole number, 0 or more${text.trim() === '' ? '' : ` (up to ${COUNT_CEILING.toLocaleString('en-US')})`}`
    : undefined;
}

export function hoursProblem(text: string): string | undefined {
  return parseDecimal(text, { min: 0, max: HOURS_CEILING, decimals: 2 }) === undefined
    ? 'Volunteer hours must be a number, 0 or more, with at most 2 decimals'
    : undefined;
}

export function yarnProblem(text: string): string | undefined {
  if (text.trim() === '') return undefined;
  const value = parseDecimal(text, { min: 0, max: YARN_CEILING, decimals: 3 });
  return value === undefined || value === 0
    ? 'Yarn donated must be a weight greater than 0, with at most 3 decimals (or leave it empty)'
    : undefined;
}

export function chosenProblem(id: string, what: string): string | undefined {
  return id === '' ? `Choose ${what}` : undefined;
}

/** The words each figure is called by in messages. */
export const FIGURE_NAMES = {
  'panels.opening': 'Opening panels',
  'panels.accepted': 'Panels accepted',
  'panels.usedInAssembly': 'Panels used',
  'panels.closing': 'Closing panels',
  'blankets.opening': 'Opening blankets',
  'blankets.received': 'Finished blankets received',
  'blankets.closing': 'Closing blankets',
} as const;

export function setAsideName(reason: SetAsideReason): string {
  return `Panels set aside (${SET_ASIDE_LABELS[reason].toLowerCase()})`;
}

export interface ReadForm {
  /** The values as far as they can be read; a figure that cannot be is NaN (the checks skip it). */
  values: TallyValues;
  /** The form's field names whose text is not a valid figure, with the message for each. */
  invalid: Array<{ name: string; message: string }>;
  /**
   * The form field behind each line of `values` (lines of 0 and unfinished lines are left out of
   * the values, so positions differ): e.g. `given[2]` is the form's 'blankets.given.3.count'.
   */
  lineFields: { assembled: string[]; given: string[]; peopleServed: string[] };
}

/** Reads the form into TallyValues, and says which fields cannot be read. */
export function readForm(form: TallyForm): ReadForm {
  const invalid: ReadForm['invalid'] = [];
  const count = (name: string, typed: string, words: string) => {
    const problem = wholeNumberProblem(typed, words);
    if (problem) {
      invalid.push({ name, message: problem });
      return Number.NaN;
    }
    return Number(typed.trim());
  };

  const setAside = Object.fromEntries(
    SET_ASIDE_REASONS.map((reason) => [
      reason,
      count(`panels.setAside.${reason}`, form.panels.setAside[reason], setAsideName(reason)),
    ]),
  ) as Record<SetAsideReason, number>;

  const lineFields: ReadForm['lineFields'] = { assembled: [], given: [], peopleServed: [] };

  const assembled = form.blankets.assembled.flatMap((row, index) => {
    const name = `blankets.assembled.${index}.count`;
    const value = count(name, row.count, 'Blankets assembled');
    if (value === 0) return [];
    lineFields.assembled.push(name);
    return [{ blanketSizeId: row.blanketSizeId, count: value }];
  });

  const given = form.blankets.given.flatMap((row, index) => {
    const size = chosenProblem(row.blanketSizeId, 'a blanket size');
    const agency = chosenProblem(row.partnerAgencyId, 'a partner agency');
    if (size) invalid.push({ name: `blankets.given.${index}.blanketSizeId`, message: size });
    if (agency) invalid.push({ name: `blankets.given.${index}.partnerAgencyId`, message: agency });
    const name = `blankets.given.${index}.count`;
    const value = count(name, row.count, 'Blankets given out');
    if (size || agency) return [];
    lineFields.given.push(name);
    return [
      {
        blanketSizeId: Number(row.blanketSizeId),
        partnerAgencyId: Number(row.partnerAgencyId),
        count: value,
      },
    ];
  });

  const peopleServed = form.peopleServed.flatMap((row, index) =>
    PEOPLE_GROUPS.flatMap((group) => {
      const name = `peopleServed.${index}.counts.${group}`;
      const value = count(name, row.counts[group], 'People served');
      if (value === 0) return [];
      lineFields.peopleServed.push(name);
      return [{ partnerAgencyId: row.partnerAgencyId, group, count: value }];
    }),
  );

  const hours = hoursProblem(form.volunteerHours);
  if (hours) invalid.push({ name: 'volunteerHours', message: hours });
  const yarn = yarnProblem(form.yarn.value);
  if (yarn) invalid.push({ name: 'yarn.value', message: yarn });

  const values: TallyValues = {
    panels: {
      opening: count('panels.opening', form.panels.opening, FIGURE_NAMES['panels.opening']),
      accepted: count('panels.accepted', form.panels.accepted, FIGURE_NAMES['panels.accepted']),
      setAside,
      usedInAssembly: count(
        'panels.usedInAssembly',
        form.panels.usedInAssembly,
        FIGURE_NAMES['panels.usedInAssembly'],
      ),
      closing: count('panels.closing', form.panels.closing, FIGURE_NAMES['panels.closing']),
    },
    receiptsDifferenceReason: form.receiptsDifferenceReason.trim() || null,
    blankets: {
      opening: count('blankets.opening', form.blankets.opening, FIGURE_NAMES['blankets.opening']),
      assembled,
      received: count(
        'blankets.received',
        form.blankets.received,
        FIGURE_NAMES['blankets.received'],
      ),
      given,
      closing: count('blankets.closing', form.blankets.closing, FIGURE_NAMES['blankets.closing']),
    },
    peopleServed,
    volunteerHours: hours ? Number.NaN : Number(form.volunteerHours.trim()),
    yarnDonated:
      form.yarn.value.trim() === '' || yarn
        ? null
        : { value: Number(form.yarn.value.trim()), unit: form.yarn.unit },
    notes: form.notes.trim() || null,
  };
  return { values, invalid, lineFields };
}
