import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { TallyEvent, TallyEventKind } from '@tallyloom/core';
import { formatDateTime } from '@/lib/format';

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
  comment: { margin: 0, whiteSpace: 'pre-wrap' },
  none: { margin: 0, color: tokens.colorNeutralForeground2 },
});

export const TALLY_EVENT_LABELS: Record<TallyEventKind, string> = {
  created: 'Started',
  submitted: 'Submitted for review',
  returned: 'Returned to the chapter',
  approved: 'Approved',
  amendment_started: 'Amendment started',
};

/** Each step of the tally's review, oldest first: who, when, and what they wrote. */
export function ReviewTrail({ events }: { events: TallyEvent[] }) {
  const styles = useStyles();
  if (events.length === 0) {
    return (
      <Text as="p" className={styles.none}>
        Nothing recorded yet.
      </Text>
    );
  }
  return (
    <ol className={styles.list}>
      {events.map((event, index) => (
        <li key={`${event.at}-${index}`} className={styles.entry}>
          <span className={styles.when}>{formatDateTime(event.at)}</span>
          <div className={styles.what}>
            <Text weight="semibold">
              {TALLY_EVENT_LABELS[event.kind]} · revision {event.revision}
            </Text>
            <Text size={200}>by {event.byName ?? 'someone no longer listed'}</Text>
            {event.comment ? (
              <Text as="p" className={styles.comment}>
                “{event.comment}”
              </Text>
            ) : null}
          </div>
        </li>
      ))}
    </ol>
  );
}
