import { toKilograms, type TallyValues } from '@tallyloom/core';
import type { TallyBlanketsAssembled } from './models/tally-blankets-assembled.model';
import type { TallyBlanketsGiven } from './models/tally-blankets-given.model';
import type { TallyPeopleServed } from './models/tally-people-served.model';
import type { TallyRevision } from './models/tally-revision.model';

/** A revision's child lines, as loaded for one or more revisions. */
export interface RevisionLines {
  assembled: TallyBlanketsAssembled[];
  given: TallyBlanketsGiven[];
  peopleServed: TallyPeopleServed[];
}

/** The revision columns that hold figures (everything but identity, state and review fields). */
export type RevisionFigures = Pick<
  TallyRevision,
  | 'panelsOpening'
  | 'panelsAccepted'
  | 'setAsideOffSize'
  | 'setAsideHardCareYarn'
  | 'setAsideSoiledOrDamaged'
  | 'setAsideOther'
  | 'panelsUsed'
  | 'panelsClosing'
  | 'receiptsDifferenceReason'
  | 'blanketsOpening'
  | 'blanketsReceived'
  | 'blanketsClosing'
  | 'volunteerHours'
  | 'yarnValue'
  | 'yarnUnit'
  | 'yarnKg'
  | 'notes'
>;

const numberOrNull = (value: string | number | null) => (value === null ? null : Number(value));

const GROUP_ORDER = {
  infants: 0,
  children: 1,
  adults: 2,
  olderAdults: 3,
  disasterAffected: 4,
} as const;

/**
 * A plain copy of `values` in one canonical form: absent text is null, lines sorted by their
 * keys. Stored and sent values compare equal when they say the same.
 */
export function normalizedValues(values: TallyValues): TallyValues {
  const { panels, blankets, yarnDonated } = values;
  return {
    panels: {
      opening: panels.opening,
      accepted: panels.accepted,
      setAside: {
        offSize: panels.setAside.offSize,
        hardCareYarn: panels.setAside.hardCareYarn,
        soiledOrDamaged: panels.setAside.soiledOrDamaged,
        other: panels.setAside.other,
      },
      usedInAssembly: panels.usedInAssembly,
      closing: panels.closing,
    },
    receiptsDifferenceReason: values.receiptsDifferenceReason ?? null,
    blankets: {
      opening: blankets.opening,
      assembled: blankets.assembled
        .map(({ blanketSizeId, count }) => ({ blanketSizeId, count }))
        .sort((a, b) => a.blanketSizeId - b.blanketSizeId),
      received: blankets.received,
      given: blankets.given
        .map(({ blanketSizeId, partnerAgencyId, count }) => ({
          blanketSizeId,
          partnerAgencyId,
          count,
        }))
        .sort((a, b) => a.blanketSizeId - b.blanketSizeId || a.partnerAgencyId - b.partnerAgencyId),
      closing: blankets.closing,
    },
    peopleServed: values.peopleServed
      .map(({ partnerAgencyId, group, count }) => ({ partnerAgencyId, group, count }))
      .sort(
        (a, b) =>
          a.partnerAgencyId - b.partnerAgencyId || GROUP_ORDER[a.group] - GROUP_ORDER[b.group],
      ),
    volunteerHours: values.volunteerHours,
    yarnDonated: yarnDonated ? { value: yarnDonated.value, unit: yarnDonated.unit } : null,
    notes: values.notes ?? null,
  };
}

/** The stored figures of a revision as TallyValues, in canonical form. */
export function valuesOf(revision: TallyRevision, lines: RevisionLines): TallyValues {
  const yarnValue = numberOrNull(revision.yarnValue);
  const own = <Line extends { revisionId: number }>(rows: Line[]) =>
    rows.filter((line) => line.revisionId === revision.id);
  return normalizedValues({
    panels: {
      opening: revision.panelsOpening,
      accepted: revision.panelsAccepted,
      setAside: {
        offSize: revision.setAsideOffSize,
        hardCareYarn: revision.setAsideHardCareYarn,
        soiledOrDamaged: revision.setAsideSoiledOrDamaged,
        other: revision.setAsideOther,
      },
      usedInAssembly: revision.panelsUsed,
      closing: revision.panelsClosing,
    },
    receiptsDifferenceReason: revision.receiptsDifferenceReason,
    blankets: {
      opening: revision.blanketsOpening,
      assembled: own(lines.assembled),
      received: revision.blanketsReceived,
      given: own(lines.given),
      closing: revision.blanketsClosing,
    },
    peopleServed: own(lines.peopleServed).map(({ partnerAgencyId, peopleGroup, count }) => ({
      partnerAgencyId,
      group: peopleGroup,
      count,
    })),
    volunteerHours: Number(revision.volunteerHours),
    yarnDonated:
      yarnValue === null || revision.yarnUnit === null
        ? null
        : { value: yarnValue, unit: revision.yarnUnit },
    notes: revision.notes,
  });
}

/** The revision columns for `values`; the yarn weight is also kept in kg so sums need no units. */
export function figuresOf(values: TallyValues): RevisionFigures {
  const yarn = values.yarnDonated;
  return {
    panelsOpening: values.panels.opening,
    panelsAccepted: values.panels.accepted,
    setAsideOffSize: values.panels.setAside.offSize,
    setAsideHardCareYarn: values.panels.setAside.hardCareYarn,
    setAsideSoiledOrDamaged: values.panels.setAside.soiledOrDamaged,
    setAsideOther: values.panels.setAside.other,
    panelsUsed: values.panels.usedInAssembly,
    panelsClosing: values.panels.closing,
    receiptsDifferenceReason: values.receiptsDifferenceReason,
    blanketsOpening: values.blankets.opening,
    blanketsReceived: values.blankets.received,
    blanketsClosing: values.blankets.closing,
    volunteerHours: values.volunteerHours,
    yarnValue: yarn ? yarn.value : null,
    yarnUnit: yarn ? yarn.unit : null,
    // DECIMAL(14, 6): a microgram is far below any scale a chapter weighs yarn on.
    yarnKg: yarn ? Number(toKilograms(yarn, 'yarnDonated').toFixed(6)) : null,
    notes: values.notes,
  };
}

/** The child rows of `values` for the revision `revisionId`. */
export function linesOf(values: TallyValues, revisionId: number) {
  return {
    assembled: values.blankets.assembled.map(({ blanketSizeId, count }) => ({
      revisionId,
      blanketSizeId,
      count,
    })),
    given: values.blankets.given.map(({ blanketSizeId, partnerAgencyId, count }) => ({
      revisionId,
      blanketSizeId,
      partnerAgencyId,
      count,
    })),
    peopleServed: values.peopleServed.map(({ partnerAgencyId, group, count }) => ({
      revisionId,
      partnerAgencyId,
      peopleGroup: group,
      count,
    })),
  };
}
