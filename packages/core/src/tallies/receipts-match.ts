import type { TallyCheckContext, TallyProblem, TallyValues } from '../contract/tallies';
import { formatDifference, formatNumber, isUsable, plural } from './format';
import { problem } from './problem';

/**
 * Panels accepted should equal the sum of the month's parcel receipts, so that every reported
 * panel traces back to a receipt. A difference is allowed only with a written reason.
 */
export function receiptsMatchProblems(
  values: TallyValues,
  context: Pick<TallyCheckContext, 'receipts'>,
): TallyProblem[] {
  const accepted = values.panels.accepted;
  const fromReceipts = context.receipts.panelsAccepted;
  if (!isUsable(accepted) || accepted === fromReceipts) return [];
  const difference = accepted - fromReceipts;
  const statement = `Panels accepted (${formatNumber(accepted)}) differ from this month's parcel receipts (${formatNumber(fromReceipts)} in ${plural(context.receipts.count, 'receipt', 'receipts')}) by ${formatDifference(difference)}`;
  const reason =
    typeof values.receiptsDifferenceReason === 'string'
      ? values.receiptsDifferenceReason.trim()
      : '';
  if (reason === '') {
    return [
      problem(
        'error',
        'receipts-difference',
        'receiptsDifferenceReason',
        `${statement}; write down the reason for the difference, or log the missing receipts.`,
      ),
    ];
  }
  return [
    problem(
      'info',
      'receipts-difference-explained',
      'panels.accepted',
      `${statement}. Reason given: ${reason}`,
    ),
  ];
}
