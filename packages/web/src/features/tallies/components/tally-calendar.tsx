import {
  makeStyles,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import { CalendarLtr24Regular } from '@fluentui/react-icons';
import { monthLabel, type TallyCalendarEntry } from '@tallyloom/core';
import { useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { describeProblem, ErrorState } from '@/components/ui/error-state';
import { FormAlert } from '@/components/ui/form-alert';
import { LinkButton } from '@/components/ui/link-button';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { paths } from '@/config/paths';
import { useTallyCalendar } from '../api/get-tally-calendar';
import { StartTallyButton } from './start-tally-button';
import { reportingText } from './tally-labels';
import { TallyStateBadge } from '@/components/tallies/tally-state-badge';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  returned: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  comment: { whiteSpace: 'pre-wrap' },
  late: { color: tokens.colorStatusDangerForeground1, fontWeight: tokens.fontWeightSemibold },
  returnedCell: { maxWidth: '44ch', whiteSpace: 'pre-wrap' },
  muted: { color: tokens.colorNeutralForeground2 },
  // Read out, not shown: the row already says which month it is.
  hidden: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    overflow: 'hidden',
    clip: 'rect(0 0 0 0)',
    whiteSpace: 'nowrap',
  },
});

export interface TallyCalendarProps {
  /** Without it, the person's own chapter(s). */
  chapterId?: number;
  /** May start and edit tallies (else every filed month just opens). */
  mayWrite: boolean;
}

function needsWork(entry: TallyCalendarEntry): boolean {
  return entry.state === 'draft' || entry.state === 'returned';
}

function Action({
  entry,
  mayWrite,
  onError,
}: {
  entry: TallyCalendarEntry;
  mayWrite: boolean;
  onError: (error: unknown) => void;
}) {
  const styles = useStyles();
  const label = monthLabel(entry.month);
  if (entry.tallyId === null) {
    return mayWrite ? (
      <StartTallyButton chapterId={entry.chapterId} month={entry.month} onError={onError} />
    ) : (
      <Text className={styles.muted}>Not started</Text>
    );
  }
  const carryOn = mayWrite && needsWork(entry);
  return (
    <LinkButton
      to={paths.tally.getHref(entry.tallyId)}
      size="small"
      appearance={carryOn ? 'primary' : 'secondary'}
    >
      {carryOn ? 'Continue' : 'Open'} <span className={styles.hidden}>the {label} tally</span>
    </LinkButton>
  );
}

/** The months a chapter reports on, newest first: how each stands and what to do next. */
export function TallyCalendar({ chapterId, mayWrite }: TallyCalendarProps) {
  const styles = useStyles();
  const calendar = useTallyCalendar(chapterId);
  const [startError, setStartError] = useState<unknown>(null);

  if (calendar.isPending) return <LoadingState label="Loading the months…" />;
  if (calendar.isError) {
    return (
      <ErrorState
        title="The months could not be loaded"
        error={calendar.error}
        onRetry={() => void calendar.refetch()}
        retrying={calendar.isFetching}
      />
    );
  }

  const { entries } = calendar.data;
  if (entries.length === 0) {
    return (
      <EmptyState title="No months to report on yet" icon={<CalendarLtr24Regular />}>
        A chapter reports on each calendar month from the month it started. The first month appears
        here once it has begun.
      </EmptyState>
    );
  }
  const manyChapters = new Set(entries.map((entry) => entry.chapterId)).size > 1;
  const returned = entries.filter((entry) => entry.state === 'returned');

  return (
    <div className={styles.root}>
      {returned.length > 0 ? (
        <section className={styles.returned} aria-label="Returned for changes">
          {returned.map((entry) => (
            <MessageBar
              key={`${entry.chapterId}:${entry.month}`}
              intent="warning"
              layout="multiline"
            >
              <MessageBarBody>
                <MessageBarTitle>
                  {monthLabel(entry.month)}
                  {manyChapters ? ` · ${entry.chapterName}` : ''} was returned for changes
                </MessageBarTitle>
                <span className={styles.comment}>
                  {entry.returnComment ?? 'No comment was given.'}
                </span>
              </MessageBarBody>
              {entry.tallyId !== null && mayWrite ? (
                <MessageBarActions>
                  <LinkButton to={paths.tally.getHref(entry.tallyId)} size="small">
                    Fix it
                  </LinkButton>
                </MessageBarActions>
              ) : null}
            </MessageBar>
          ))}
        </section>
      ) : null}
      <FormAlert
        title="The tally could not be started"
        messages={startError ? [describeProblem(startError).message] : []}
      />
      <section aria-labelledby="tally-months">
        <SectionHeading id="tally-months">Months</SectionHeading>
        <Table size="small" aria-labelledby="tally-months">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Month</TableHeaderCell>
              {manyChapters ? <TableHeaderCell>Chapter</TableHeaderCell> : null}
              <TableHeaderCell>State</TableHeaderCell>
              <TableHeaderCell>Reporting</TableHeaderCell>
              <TableHeaderCell>Returned because</TableHeaderCell>
              <TableHeaderCell>Action</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {entries.map((entry) => (
              <TableRow key={`${entry.chapterId}:${entry.month}`}>
                <TableCell>{monthLabel(entry.month)}</TableCell>
                {manyChapters ? <TableCell>{entry.chapterName}</TableCell> : null}
                <TableCell>
                  <TallyStateBadge state={entry.state} amendmentPending={entry.amendmentPending} />
                </TableCell>
                <TableCell
                  className={
                    entry.reporting === 'late' || entry.reporting === 'missing'
                      ? styles.late
                      : undefined
                  }
                >
                  {reportingText(entry.reporting, entry.dueOn)}
                </TableCell>
                <TableCell className={styles.returnedCell}>
                  {entry.state === 'returned' ? (entry.returnComment ?? '—') : ''}
                </TableCell>
                <TableCell>
                  <Action
                    entry={entry}
                    mayWrite={mayWrite}
                    onError={(error) => setStartError(error)}
                  />
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </section>
    </div>
  );
}
