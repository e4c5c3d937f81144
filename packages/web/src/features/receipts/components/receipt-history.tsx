import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { formatDateTime } from '@/lib/format';
import type { ReceiptHistoryEntry } from '../api/get-receipt-history';

const useStyles = makeStyles({
  list: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  entry: {
    display: 'grid',
    gridTemplateColumns: '170px 1fr',
    columnGap: tokens.spacingHorizontalL,
    paddingBottom: tokens.spacingVerticalS,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  when: { color: tokens.colorNeutralForeground2, fontVariantNumeric: 'tabular-nums' },
  what: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  changed: { color: tokens.colorNeutralForeground2 },
});

const ACTION_LABELS: Record<string, string> = {
  'receipt.created': 'Logged',
  'receipt.updated': 'Corrected',
  'receipt.sender_erased': "Sender's details erased",
  'receipt.scan_added': 'Scan attached',
  'receipt.scan_removed': 'Scan deleted',
};

// The audited fields in words; the sender appears only as present or absent, never its content.
const FIELD_LABELS: Record<string, string> = {
  chapterId: 'chapter',
  receivedOn: 'received date',
  sender: 'sender',
  campaignId: 'campaign',
  campaignCode: 'campaign code',
  panelsAccepted: 'panels accepted',
  setAside: 'set aside',
  setAsideOtherNote: 'set-aside note',
  finishedBlankets: 'finished blankets',
  otherItems: 'other items',
  notes: 'notes',
  samplePanel: 'sample panel',
};

/** The fields whose value differs between before and after (the version number aside). */
export function changedFields(entry: ReceiptHistoryEntry): string[] {
  if (!entry.before || !entry.after) return [];
  const before = entry.before;
  const after = entry.after;
  return Object.keys(FIELD_LABELS).filter(
    (field) =>
      (field in before || field in after) &&
      JSON.stringify(before[field]) !== JSON.stringify(after[field]),
  );
}

function describe(entry: ReceiptHistoryEntry): string | null {
  if (entry.action === 'receipt.updated') {
    const fields = changedFields(entry).map((field) => FIELD_LABELS[field]);
    return fields.length ? `Changed: ${fields.join(', ')}` : 'No figures changed';
  }
  const scan = entry.after ?? entry.before;
  if (entry.action.startsWith('receipt.scan_') && typeof scan?.fileName === 'string') {
    return scan.fileName;
  }
  return null;
}

export interface ReceiptHistoryProps {
  entries: ReceiptHistoryEntry[] | undefined;
  error: unknown;
  onRetry: () => void;
}

/** Who did what to the parcel, and when: the audit trail, oldest first. */
export function ReceiptHistory({ entries, error, onRetry }: ReceiptHistoryProps) {
  const styles = useStyles();
  if (error) {
    return (
      <ErrorState
        title="The history could not be loaded"
        error={error}
        onRetry={onRetry}
        headingLevel={3}
      />
    );
  }
  if (!entries) return <LoadingState label="Loading the history…" />;
  if (entries.length === 0) return <Text as="p">No changes recorded.</Text>;
  return (
    <ol className={styles.list} aria-label="History">
      {entries.map((entry) => {
        const detail = describe(entry);
        return (
          <li key={entry.id} className={styles.entry}>
            <Text className={styles.when}>{formatDateTime(entry.occurredAt)}</Text>
            <div className={styles.what}>
              <Text>
                <strong>{ACTION_LABELS[entry.action] ?? entry.action}</strong> by{' '}
                {entry.actorEmail ?? 'the system'}
              </Text>
              {detail ? <Text className={styles.changed}>{detail}</Text> : null}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
