import type { TallyCheckContext } from '../contract/tallies';
import { emptyTallyValues } from './empty-values';
import { receiptsMatchProblems } from './receipts-match';

const RECEIPTS: Pick<TallyCheckContext, 'receipts'> = {
  receipts: {
    count: 4,
    panelsAccepted: 120,
    setAside: { offSize: 3, hardCareYarn: 1, soiledOrDamaged: 0, other: 0 },
    finishedBlankets: 1,
  },
};

function accepting(accepted: number, reason: string | null = null) {
  const values = emptyTallyValues();
  values.panels.accepted = accepted;
  values.receiptsDifferenceReason = reason;
  return values;
}

describe('receiptsMatchProblems', () => {
  it('is silent when the tally matches the receipts', () => {
    expect(receiptsMatchProblems(accepting(120), RECEIPTS)).toEqual([]);
  });

  it('refuses a difference without a reason', () => {
    expect(receiptsMatchProblems(accepting(130), RECEIPTS)).toEqual([
      {
        code: 'receipts-difference',
        severity: 'error',
        field: 'receiptsDifferenceReason',
        message:
          "Panels accepted (130) differ from this month's parcel receipts (120 in 4 receipts) by +10; write down the reason for the difference, or log the missing receipts.",
      },
    ]);
  });

  it('treats a blank reason as no reason', () => {
    const [problem] = receiptsMatchProblems(accepting(110, '   \n '), RECEIPTS);
    expect(problem.severity).toBe('error');
    expect(problem.message).toContain('by −10');
  });

  it('shows an explained difference as information', () => {
    expect(
      receiptsMatchProblems(accepting(118, '  Two panels unravelled when washed. '), RECEIPTS),
    ).toEqual([
      {
        code: 'receipts-difference-explained',
        severity: 'info',
        field: 'panels.accepted',
        message:
          "Panels accepted (118) differ from this month's parcel receipts (120 in 4 receipts) by −2. Reason given: Two panels unravelled when washed.",
      },
    ]);
  });

  it('says "1 receipt" for a single receipt', () => {
    const single = { receipts: { ...RECEIPTS.receipts, count: 1, panelsAccepted: 40 } };
    expect(receiptsMatchProblems(accepting(41), single)[0].message).toContain('(40 in 1 receipt)');
  });

  it('leaves a figure that is not a number to the value rules', () => {
    expect(receiptsMatchProblems(accepting(Number.NaN), RECEIPTS)).toEqual([]);
  });
});
