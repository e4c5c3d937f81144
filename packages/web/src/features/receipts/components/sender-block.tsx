import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { LockClosed16Regular } from '@fluentui/react-icons';
import type { SenderDetails } from '@tallyloom/core';
import { FactList } from '@/components/ui/fact-list';
import { formatDate } from '@/lib/format';

const useStyles = makeStyles({
  quiet: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    margin: 0,
    color: tokens.colorNeutralForeground2,
  },
  address: { whiteSpace: 'pre-line' },
});

export interface SenderBlockProps {
  sender: SenderDetails | null;
  erased: boolean;
  /** When the details were erased, from the parcel's history; undefined until it loads. */
  erasedAt: string | undefined;
  /** Whether the reader's role sees senders' details at all ('senders.read'). */
  mayReadSenders: boolean;
}

/** The sender's details, or why they are not shown: hidden from this role, erased, or never given. */
export function SenderBlock({ sender, erased, erasedAt, mayReadSenders }: SenderBlockProps) {
  const styles = useStyles();
  if (erased) {
    return (
      <Text as="p" className={styles.quiet}>
        {erasedAt
          ? `Erased on ${formatDate(erasedAt.slice(0, 10))}. The counts were kept.`
          : 'Erased. The counts were kept.'}
      </Text>
    );
  }
  if (!mayReadSenders) {
    return (
      <Text as="p" className={styles.quiet}>
        <LockClosed16Regular aria-hidden="true" />
        Hidden for your role: a sender&apos;s details are shown only to the receiving chapter,
        national staff, network admins and auditors.
      </Text>
    );
  }
  if (sender === null) {
    return (
      <Text as="p" className={styles.quiet}>
        No sender details were given.
      </Text>
    );
  }
  return (
    <FactList
      rows={[
        ['Name', sender.name ?? '—'],
        ['E-mail', sender.email ?? '—'],
        ['Postal address', <span className={styles.address}>{sender.address ?? '—'}</span>],
      ]}
    />
  );
}
