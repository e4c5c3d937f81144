import {
  Badge,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Text,
  tokens,
} from '@fluentui/react-components';
import { SET_ASIDE_LABELS, SET_ASIDE_REASONS, type ParcelReceiptDetail } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { FactList } from '@/components/ui/fact-list';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatCount, formatDate, formatDateTime } from '@/lib/format';
import { useReceiptHistory } from '../api/get-receipt-history';
import { EraseSenderButton } from './erase-sender-dialog';
import { ReceiptHistory } from './receipt-history';
import { SAFE_SLEEP_CAUTION } from './labels';
import { isBabySize } from './receipt-draft';
import { ScansPanel } from './scans-panel';
import { SenderBlock } from './sender-block';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(320px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
  },
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  senderHeader: {
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    flexWrap: 'wrap',
  },
  number: { fontVariantNumeric: 'tabular-nums' },
  caution: { margin: 0, color: tokens.colorNeutralForeground2, maxWidth: '60ch' },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalL },
});

function Section({ id, children }: { id: string; children: ReactNode }) {
  const styles = useStyles();
  return (
    <section className={styles.section} aria-labelledby={id}>
      {children}
    </section>
  );
}

export interface ReceiptDetailProps {
  receipt: ParcelReceiptDetail;
  /** 'receipts.write': may attach and delete scans. */
  mayChange: boolean;
  /** 'senders.read': sees senders' details where the parcel has them. */
  mayReadSenders: boolean;
  /** 'senders.erase': may erase the sender's details. */
  mayEraseSender: boolean;
}

/** Everything about one parcel: its figures, sender, scans and history. */
export function ReceiptDetail({
  receipt,
  mayChange,
  mayReadSenders,
  mayEraseSender,
}: ReceiptDetailProps) {
  const styles = useStyles();
  const history = useReceiptHistory(receipt.id);
  const erasure = history.data?.filter((entry) => entry.action === 'receipt.sender_erased').at(-1);
  const count = (value: number) => <span className={styles.number}>{formatCount(value)}</span>;
  const hasBaby = receipt.finishedBlankets.some(
    (row) => row.count > 0 && isBabySize({ id: row.blanketSizeId, name: row.name }),
  );

  return (
    <div className={styles.root}>
      {receipt.warnings.length > 0 ? (
        <MessageBar intent="warning" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>Worth a second look</MessageBarTitle>
            <ul className={styles.list}>
              {receipt.warnings.map((warning) => (
                <li key={warning}>{warning}</li>
              ))}
            </ul>
          </MessageBarBody>
        </MessageBar>
      ) : null}

      <div className={styles.columns}>
        <Section id="parcel-received">
          <SectionHeading id="parcel-received">Received</SectionHeading>
          <FactList
            rows={[
              ['Chapter', `${receipt.chapterName} (${receipt.regionName})`],
              ['Received on', formatDate(receipt.receivedOn)],
              [
                'Campaign code',
                receipt.campaignCode ? (
                  <>
                    {receipt.campaignCode}{' '}
                    {receipt.credited ? (
                      <Badge appearance="tint" color="success" size="small">
                        Credited
                      </Badge>
                    ) : (
                      <Badge appearance="outline" color="warning" size="small">
                        Uncredited
                      </Badge>
                    )}
                  </>
                ) : (
                  'None'
                ),
              ],
              ['Logged', formatDateTime(receipt.createdAt)],
              ...(receipt.importBatchId !== null
                ? ([['Imported', `Batch ${receipt.importBatchId}`]] as Array<[string, string]>)
                : []),
            ]}
          />
        </Section>

        <Section id="parcel-sender">
          <div className={styles.senderHeader}>
            <SectionHeading id="parcel-sender">Sender</SectionHeading>
            {mayEraseSender && receipt.sender !== null && !receipt.senderErased ? (
              <EraseSenderButton receipt={receipt} />
            ) : null}
          </div>
          <SenderBlock
            sender={receipt.sender}
            erased={receipt.senderErased}
            erasedAt={erasure?.occurredAt}
            mayReadSenders={mayReadSenders}
          />
        </Section>
      </div>

      <div className={styles.columns}>
        <Section id="parcel-panels">
          <SectionHeading id="parcel-panels">Panels</SectionHeading>
          <FactList
            rows={[
              ['Accepted', count(receipt.panelsAccepted)],
              ...SET_ASIDE_REASONS.map((reason): [string, ReactNode] => [
                `Set aside: ${SET_ASIDE_LABELS[reason].toLowerCase()}`,
                count(receipt.setAside[reason]),
              ]),
              ...(receipt.setAsideOtherNote
                ? ([['Why “other”', receipt.setAsideOtherNote]] as Array<[string, string]>)
                : []),
              ['Set aside in all', count(receipt.setAsideTotal)],
            ]}
          />
        </Section>

        <Section id="parcel-finished">
          <SectionHeading id="parcel-finished">Finished items</SectionHeading>
          <FactList
            rows={[
              ...receipt.finishedBlankets.map((row): [string, ReactNode] => [
                `${row.name} blankets`,
                count(row.count),
              ]),
              ['Blankets in all', count(receipt.finishedBlanketsTotal)],
              ['Other items', count(receipt.otherItems)],
            ]}
          />
          {hasBaby ? (
            <Text as="p" size={200} className={styles.caution}>
              {SAFE_SLEEP_CAUTION}
            </Text>
          ) : null}
        </Section>
      </div>

      <div className={styles.columns}>
        <Section id="parcel-sample">
          <SectionHeading id="parcel-sample">Sample panel</SectionHeading>
          {receipt.samplePanel ? (
            <FactList
              rows={[
                [
                  'Measured',
                  `${receipt.samplePanel.width} × ${receipt.samplePanel.height} ${receipt.samplePanel.unit}`,
                ],
                [
                  'Check',
                  receipt.samplePanel.withinTolerance
                    ? 'Within tolerance'
                    : receipt.samplePanel.messages.join(' '),
                ],
              ]}
            />
          ) : (
            <Text as="p">Not measured.</Text>
          )}
        </Section>
        <Section id="parcel-notes">
          <SectionHeading id="parcel-notes">Notes</SectionHeading>
          <Text as="p">{receipt.notes ?? 'None.'}</Text>
        </Section>
      </div>

      <Section id="parcel-scans">
        <SectionHeading id="parcel-scans">Scans</SectionHeading>
        <ScansPanel receiptId={receipt.id} scans={receipt.scans} mayChange={mayChange} />
      </Section>

      <Section id="parcel-history">
        <SectionHeading id="parcel-history">History</SectionHeading>
        <ReceiptHistory
          entries={history.data}
          error={history.error}
          onRetry={() => void history.refetch()}
        />
      </Section>
    </div>
  );
}
