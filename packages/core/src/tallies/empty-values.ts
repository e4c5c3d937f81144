import { SET_ASIDE_REASONS, type SetAsideReason } from '../contract/receipts';
import type { TallyValues } from '../contract/tallies';

/** A tally with nothing entered yet: every count 0, no lines, no yarn, no notes. */
export function emptyTallyValues(): TallyValues {
  const setAside = Object.fromEntries(SET_ASIDE_REASONS.map((reason) => [reason, 0])) as Record<
    SetAsideReason,
    number
  >;
  return {
    panels: { opening: 0, accepted: 0, setAside, usedInAssembly: 0, closing: 0 },
    receiptsDifferenceReason: null,
    blankets: { opening: 0, assembled: [], received: 0, given: [], closing: 0 },
    peopleServed: [],
    volunteerHours: 0,
    yarnDonated: null,
    notes: null,
  };
}
