import {
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import type { TallyDetail, TallyEventKind, TallyRevisionState } from '@tallyloom/core';
import { RouterLink } from '@/components/ui/router-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';

const useStyles = makeStyles({
  root: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(360px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
    rowGap: tokens.spacingVerticalXL,
  },
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  list: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  event: {
    paddingLeft: tokens.spacingHorizontalM,
    borderLeft: `3px solid ${tokens.colorNeutralStroke1}`,
  },
  when: { color: tokens.colorNeutralForeground2 },
  comment: { margin: 0, whiteSpace: 'pre-wrap' },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  // A header cell lays its text out in an inner box: push that to the right as well.
  numericHead: { justifyContent: 'flex-end' },
});

const EVENT_WORDS: Record<TallyEventKind, string> = {
  created: 'Started',
  submitted: 'Submitted',
  returned: 'Returned',
  approved: 'Approved',
  amendment_started: 'Amendment started',
};

const REVISION_STATE_WORDS: Record<TallyRevisionState, string> = {
  draft: 'Draft',
  submitted: 'Submitted',
  returned: 'Returned',
  approved: 'Approved',
  superseded: 'Replaced by an amendment',
};

/** Who did what to the tally and when, and its revisions with links to compare them. */
export function TallyTrail({
  detail,
}: {
  detail: Pick<TallyDetail, 'id' | 'events' | 'revisions'>;
}) {
  const styles = useStyles();
  const events = [...detail.events].reverse();
  const revisions = [...detail.revisions].sort((a, b) => b.revision - a.revision);

  return (
    <div className={styles.root}>
      <section className={styles.section} aria-labelledby="tally-trail">
        <SectionHeading id="tally-trail">Review trail</SectionHeading>
        {events.length === 0 ? (
          <Text as="p">Nothing has happened to this tally yet.</Text>
        ) : (
          <ol className={styles.list} aria-labelledby="tally-trail">
            {events.map((event, index) => (
              <li key={`${event.at}-${index}`} className={styles.event}>
                <Text weight="semibold">{EVENT_WORDS[event.kind]}</Text>{' '}
                <Text className={styles.when}>
                  revision {event.revision} · {formatDateTime(event.at)}
                  {event.byName ? ` · ${event.byName}` : ''}
                </Text>
                {event.comment ? <p className={styles.comment}>{event.comment}</p> : null}
              </li>
            ))}
          </ol>
        )}
      </section>
      <section className={styles.section} aria-labelledby="tally-revisions">
        <SectionHeading id="tally-revisions">Revisions</SectionHeading>
        <Table size="small" aria-labelledby="tally-revisions">
          <TableHeader>
            <TableRow>
              <TableHeaderCell
                className={styles.numeric}
                button={{ className: styles.numericHead }}
              >
                Revision
              </TableHeaderCell>
              <TableHeaderCell>State</TableHeaderCell>
              <TableHeaderCell>Started</TableHeaderCell>
              <TableHeaderCell>Compare</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {revisions.map((revision) => (
              <TableRow key={revision.revision}>
                <TableCell className={styles.numeric}>{revision.revision}</TableCell>
                <TableCell>
                  {REVISION_STATE_WORDS[revision.state]}
                  {revision.amendmentReason ? ` (amendment: ${revision.amendmentReason})` : ''}
                </TableCell>
                <TableCell>
                  {formatDateTime(revision.createdAt)}
                  {revision.createdByName ? ` · ${revision.createdByName}` : ''}
                </TableCell>
                <TableCell>
                  {revision.revision > 1 ? (
                    <RouterLink
                      to={paths.tallyRevisions.getHref(detail.id, {
                        left: revision.revision - 1,
                        right: revision.revision,
                      })}
                    >
                      Compare with revision {revision.revision - 1}
                    </RouterLink>
                  ) : (
                    '—'
                  )}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </section>
    </div>
  );
}
