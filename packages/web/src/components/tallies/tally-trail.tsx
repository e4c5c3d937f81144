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
    alignItems: 'start',
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
  entry: {
    display: 'grid',
    gridTemplateColumns: '140px minmax(0, 1fr)',
    columnGap: tokens.spacingHorizontalL,
    paddingBottom: tokens.spacingVerticalS,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  when: { color: tokens.colorNeutralForeground2, fontVariantNumeric: 'tabular-nums' },
  what: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  comment: { margin: 0, whiteSpace: 'pre-wrap' },
  none: { margin: 0, color: tokens.colorNeutralForeground2 },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  // A header cell lays its text out in an inner box: push that to the right as well.
  numericHead: { justifyContent: 'flex-end' },
});

const TALLY_EVENT_LABELS: Record<TallyEventKind, string> = {
  created: 'Started',
  submitted: 'Submitted for review',
  returned: 'Returned to the chapter',
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

/**
 * Each step of the tally's review, oldest first (who, when, what they wrote), and its revisions
 * with links to compare each with the one before. Shown to the chapter and to reviewers alike.
 */
export function TallyTrail({
  detail,
  idPrefix = 'tally',
}: {
  detail: Pick<TallyDetail, 'id' | 'events' | 'revisions'>;
  /** Prefix of the headings' ids. */
  idPrefix?: string;
}) {
  const styles = useStyles();
  const trailId = `${idPrefix}-trail`;
  const revisionsId = `${idPrefix}-revisions`;
  const revisions = [...detail.revisions].sort((a, b) => b.revision - a.revision);

  return (
    <div className={styles.root}>
      <section className={styles.section} aria-labelledby={trailId}>
        <SectionHeading id={trailId}>Review trail</SectionHeading>
        {detail.events.length === 0 ? (
          <Text as="p" className={styles.none}>
            Nothing has happened to this tally yet.
          </Text>
        ) : (
          <ol className={styles.list} aria-labelledby={trailId}>
            {detail.events.map((event, index) => (
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
        )}
      </section>
      <section className={styles.section} aria-labelledby={revisionsId}>
        <SectionHeading id={revisionsId}>Revisions</SectionHeading>
        <Table size="small" aria-labelledby={revisionsId}>
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
