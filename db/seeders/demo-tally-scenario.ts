/**
 * The story of the demo tallies (BRIEF §7): which chapter-months stand out and why. Months are
 * counted back from the month the seed runs in (1 = last month), so the story stays true later.
 */

export type LatestTallyState = 'approved' | 'submitted' | 'returned' | 'draft';

export interface ChapterEnding {
  /** The chapter's latest tally is this many months back; the months after it have none. */
  monthsBack: number;
  state: LatestTallyState;
}

/** Chapters not named here have last month's tally approved. */
export const TALLY_ENDINGS: Record<string, ChapterEnding> = {
  // Last month is left for the chapter lead to file (a browser journey does it).
  'Alder Falls': { monthsBack: 2, state: 'approved' },
  Elkhorn: { monthsBack: 1, state: 'approved' },
  Glenmoor: { monthsBack: 1, state: 'submitted' },
  'Kestrel Point': { monthsBack: 1, state: 'submitted' },
  'Cedar Hollow': { monthsBack: 1, state: 'approved' },
  Dunmore: { monthsBack: 1, state: 'draft' },
  // Returned the month before last, not fixed yet, so last month is not filed either.
  Fernwick: { monthsBack: 2, state: 'returned' },
  Ivybridge: { monthsBack: 1, state: 'submitted' },
  'Millbrook Crossing': { monthsBack: 1, state: 'draft' },
  'Brindle Bay': { monthsBack: 1, state: 'returned' },
  Harrowgate: { monthsBack: 1, state: 'approved' },
  'Juniper Flats': { monthsBack: 1, state: 'returned' },
  // Behind: two months with no tally, the earlier one past its due date.
  Larkspur: { monthsBack: 3, state: 'approved' },
  'Sagebrush Gap': { monthsBack: 2, state: 'approved' },
};

/** Approved tallies that were amended later: revision 1 superseded, revision 2 approved. */
export const AMENDED_TALLIES: Array<{ chapter: string; monthsBack: number }> = [
  { chapter: 'Alder Falls', monthsBack: 5 },
  { chapter: 'Cedar Hollow', monthsBack: 9 },
  { chapter: 'Dunmore', monthsBack: 7 },
  { chapter: 'Harrowgate', monthsBack: 15 },
];

/** Tallies returned once, fixed, submitted again and approved. */
export const RETURNED_THEN_APPROVED: Array<{ chapter: string; monthsBack: number }> = [
  { chapter: 'Elkhorn', monthsBack: 4 },
  { chapter: 'Ivybridge', monthsBack: 12 },
];

/** About this share of each chapter's tallies were first submitted after the due date. */
export const LATE_SHARE = 0.08;

export const RETURN_COMMENTS = [
  'Please check the people served against the blankets given: is anyone counted twice?',
  'How many blankets are still on the frames? Please say so in the notes.',
  'Do the volunteer hours include the autumn fair stall? Please count sorting and sewing time only.',
  'Please add a note on the largest parcel this month so the auditors can find it.',
];

export const APPROVAL_COMMENTS = [
  'Thank you, figures match the parcel log.',
  'Approved. Lovely to see the stock coming down.',
  'Approved after a look at the receipts.',
];

/** An amendment corrects panels used after a recount; `{n}` is the panels found. */
export const AMENDMENT_REASONS = [
  'Stock recount found {n} more panels on the shelves than the first figure; panels used corrected.',
  'Two bags of sorted panels ({n}) were counted as used by mistake; panels used corrected.',
  'The sewing group returned {n} panels they had not used; panels used and closing stock corrected.',
];

export const ACKNOWLEDGEMENT_NOTES = [
  'Checked against the parcel log: a large parcel from a knitting circle this month.',
  'A sewing day at the library this month; the figures are right.',
  'Quiet month over the holidays; counted twice.',
  'Counts checked by a second volunteer.',
];

export const MONTH_NOTES = [
  'Sewing bee at the community hall on the second Saturday.',
  'Two new volunteers joined the sorting table.',
  'Stock moved to the new cupboard at the library.',
  'Short of dark yarn for edging; asked for donations.',
  'Delivered to the partner agencies in one run this month.',
  'Labels printed with the safe-sleep reminder for baby blankets.',
];
