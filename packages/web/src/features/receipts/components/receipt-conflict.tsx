import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  tokens,
} from '@fluentui/react-components';
import { ArrowClockwise20Regular } from '@fluentui/react-icons';
import { SET_ASIDE_REASONS, SET_ASIDE_LABELS, type ParcelReceiptDetail } from '@tallyloom/core';
import { FactList } from '@/components/ui/fact-list';
import { formatCount, formatDate } from '@/lib/format';

const useStyles = makeStyles({
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  facts: { marginTop: tokens.spacingVerticalXS },
});

/** The parcel's figures in a few lines, for comparing with what the person typed. */
export function receiptFacts(receipt: ParcelReceiptDetail): Array<[string, string]> {
  return [
    ['Chapter', receipt.chapterName],
    ['Received on', formatDate(receipt.receivedOn)],
    ['Campaign code', receipt.campaignCode ?? '—'],
    ['Panels accepted', formatCount(receipt.panelsAccepted)],
    [
      'Set aside',
      SET_ASIDE_REASONS.map(
        (reason) => `${SET_ASIDE_LABELS[reason]} ${formatCount(receipt.setAside[reason])}`,
      ).join(', '),
    ],
    [
      'Finished blankets',
      receipt.finishedBlankets.length
        ? receipt.finishedBlankets.map((row) => `${row.name} ${formatCount(row.count)}`).join(', ')
        : 'None',
    ],
    ['Other items', formatCount(receipt.otherItems)],
    ['Notes', receipt.notes ?? '—'],
  ];
}

export interface ReceiptConflictProps {
  current: ParcelReceiptDetail;
  onReload: () => void;
}

/** A correction was refused: someone saved a newer version first. Shows it and offers to load it. */
export function ReceiptConflict({ current, onReload }: ReceiptConflictProps) {
  const styles = useStyles();
  return (
    <div role="alert">
      <MessageBar intent="warning" layout="multiline">
        <MessageBarBody className={styles.body}>
          <MessageBarTitle>Someone else changed this parcel</MessageBarTitle>
          <span>
            Your changes were not saved: the parcel was changed since you opened it. These are its
            values now (version {current.version}). Load them into the form, make your change again,
            and save.
          </span>
          <FactList rows={receiptFacts(current)} className={styles.facts} />
        </MessageBarBody>
        <MessageBarActions>
          <Button icon={<ArrowClockwise20Regular />} onClick={onReload}>
            Load the current values
          </Button>
        </MessageBarActions>
      </MessageBar>
    </div>
  );
}
