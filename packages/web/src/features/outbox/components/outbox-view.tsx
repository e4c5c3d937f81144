import {
  Button,
  makeStyles,
  mergeClasses,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ArrowClockwise20Regular, MailInbox20Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { ApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { useOutbox } from '../api/get-outbox';
import { OutboxMessageView } from './outbox-message-view';

const listHeadingId = 'outbox-list-heading';

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
  },
  note: { margin: 0, color: tokens.colorNeutralForeground2 },
  layout: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 3fr) minmax(0, 4fr)',
    gap: tokens.spacingHorizontalXL,
    alignItems: 'start',
    '@media (max-width: 1100px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  headerRow: { backgroundColor: tokens.colorNeutralBackground2 },
  headerCell: { fontWeight: tokens.fontWeightSemibold, whiteSpace: 'nowrap' },
  subjectButton: {
    justifyContent: 'flex-start',
    textAlign: 'start',
    minWidth: 0,
    padding: 0,
    height: 'auto',
    fontWeight: tokens.fontWeightRegular,
  },
  selectedRow: { backgroundColor: tokens.colorBrandBackground2 },
  selectedSubject: { fontWeight: tokens.fontWeightSemibold },
  nowrap: { whiteSpace: 'nowrap' },
  address: { overflowWrap: 'anywhere' },
});

/** The messages the app sent while in development, to read them and follow their links. */
export function OutboxView() {
  const styles = useStyles();
  const outbox = useOutbox();
  const [selectedId, setSelectedId] = useState<string | null>(null);

  if (outbox.isPending) return <LoadingState label="Loading captured e-mails…" />;

  if (outbox.isError) {
    if (outbox.error instanceof ApiError && outbox.error.statusCode === 404) {
      return (
        <EmptyState title="The dev outbox is switched off" icon={<MailInbox20Regular />}>
          This server sends e-mail through a real mail server, so messages go to their recipients
          and are not kept here.
        </EmptyState>
      );
    }
    return (
      <ErrorState
        title="The captured e-mails could not be loaded"
        error={outbox.error}
        onRetry={() => void outbox.refetch()}
        retrying={outbox.isFetching}
      />
    );
  }

  const refresh = (
    <Button
      size="small"
      icon={<ArrowClockwise20Regular />}
      onClick={() => void outbox.refetch()}
      disabledFocusable={outbox.isFetching}
    >
      {outbox.isFetching ? 'Checking…' : 'Check for new'}
    </Button>
  );

  if (outbox.data.length === 0) {
    return (
      <EmptyState title="No e-mails yet" icon={<MailInbox20Regular />} action={refresh}>
        E-mails the app sends in development — invitations, password reset links — appear here
        instead of going out. Invite someone from People to see one.
      </EmptyState>
    );
  }

  const selected = outbox.data.find((message) => message.id === selectedId) ?? null;

  return (
    <>
      <div className={styles.toolbar}>
        <Text as="p" className={styles.note}>
          {outbox.data.length === 1 ? '1 message' : `${outbox.data.length} messages`}, newest first.
          Nothing here reached a real inbox.
        </Text>
        {refresh}
      </div>
      <div className={styles.layout}>
        <section aria-labelledby={listHeadingId}>
          <SectionHeading id={listHeadingId}>Captured e-mails</SectionHeading>
          <Table size="small" aria-labelledby={listHeadingId}>
            <TableHeader>
              <TableRow className={styles.headerRow}>
                <TableHeaderCell className={styles.headerCell}>Subject</TableHeaderCell>
                <TableHeaderCell className={styles.headerCell}>To</TableHeaderCell>
                <TableHeaderCell className={styles.headerCell}>Received</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {outbox.data.map((message) => {
                const isSelected = message.id === selected?.id;
                return (
                  <TableRow
                    key={message.id}
                    className={isSelected ? styles.selectedRow : undefined}
                  >
                    <TableCell>
                      <Button
                        appearance="transparent"
                        className={mergeClasses(
                          styles.subjectButton,
                          isSelected && styles.selectedSubject,
                        )}
                        aria-pressed={isSelected}
                        onClick={() => setSelectedId(message.id)}
                      >
                        {message.subject || '(no subject)'}
                      </Button>
                    </TableCell>
                    <TableCell className={styles.address}>{message.to.join(', ')}</TableCell>
                    <TableCell className={styles.nowrap}>
                      {formatDateTime(message.receivedAt)}
                    </TableCell>
                  </TableRow>
                );
              })}
            </TableBody>
          </Table>
        </section>
        {selected ? (
          <OutboxMessageView message={selected} />
        ) : (
          <EmptyState title="Choose a message" headingLevel={2}>
            Pick a subject on the left to read the message and follow its links.
          </EmptyState>
        )}
      </div>
    </>
  );
}
