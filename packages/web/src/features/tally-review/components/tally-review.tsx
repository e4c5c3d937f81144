import {
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  tokens,
} from '@fluentui/react-components';
import { monthLabel, type TallyDetail } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { TallyStateBadge } from '@/components/tallies/tally-state-badge';
import { TallySummary } from '@/components/tallies/tally-summary';
import { TallyTrail } from '@/components/tallies/tally-trail';
import { FactList } from '@/components/ui/fact-list';
import { RouterLink } from '@/components/ui/router-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { paths } from '@/config/paths';
import { formatDate, formatDateTime } from '@/lib/format';
import { HeadlineHistory } from './headline-history';
import { ReviewActions } from './review-actions';
import { AmendmentBadge, ReportingText } from './tally-badges';
import { TallyChecks } from './tally-checks';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXL },
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(320px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
  },
  state: { display: 'inline-flex', gap: tokens.spacingHorizontalXS, alignItems: 'center' },
  quoted: { whiteSpace: 'pre-wrap' },
});

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  const styles = useStyles();
  return (
    <section aria-labelledby={id} className={styles.section}>
      <SectionHeading id={id}>{title}</SectionHeading>
      {children}
    </section>
  );
}

/**
 * One tally as a reviewer reads it: where it stands, the checks and the lead's note, each count
 * against the chapter's history, every figure, the review trail, and Approve / Return.
 */
export function TallyReview({ tally }: { tally: TallyDetail }) {
  const styles = useStyles();
  const current = tally.revisions.find((revision) => revision.revision === tally.revision);
  const comparable = tally.approvedRevision !== null && tally.approvedRevision !== tally.revision;

  return (
    <div className={styles.root}>
      <ReviewActions tally={tally} />

      {tally.amendmentReason ? (
        <MessageBar intent="info" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>Amendment of an approved tally</MessageBarTitle>
            <span className={styles.quoted}>Reason given: “{tally.amendmentReason}”</span>{' '}
            {comparable ? (
              <RouterLink
                inline
                to={paths.tallyRevisions.getHref(tally.id, {
                  left: tally.approvedRevision ?? undefined,
                  right: tally.revision,
                })}
              >
                Compare with approved revision {tally.approvedRevision}
              </RouterLink>
            ) : null}
          </MessageBarBody>
        </MessageBar>
      ) : null}

      {tally.state === 'returned' && tally.returnComment ? (
        <MessageBar intent="warning" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>Returned to the chapter</MessageBarTitle>
            <span className={styles.quoted}>“{tally.returnComment}”</span>
          </MessageBarBody>
        </MessageBar>
      ) : null}

      <div className={styles.columns}>
        <Section id="review-standing" title="Where it stands">
          <FactList
            rows={[
              ['Chapter', `${tally.chapterName} (${tally.regionName})`],
              ['Month', monthLabel(tally.month)],
              [
                'State',
                <span key="state" className={styles.state}>
                  <TallyStateBadge state={tally.state} />
                  {tally.amendmentPending ? <AmendmentBadge /> : null}
                </span>,
              ],
              [
                'Revision',
                tally.approvedRevision !== null && tally.approvedRevision !== tally.revision
                  ? `${tally.revision} (approved: ${tally.approvedRevision})`
                  : String(tally.revision),
              ],
              ['Due', formatDate(tally.dueOn)],
              ['Reporting', <ReportingText key="reporting" status={tally.reporting} />],
              [
                'Submitted',
                tally.submittedAt
                  ? `${formatDateTime(tally.submittedAt)}${current?.submittedByName ? ` by ${current.submittedByName}` : ''}`
                  : 'Not yet',
              ],
              ...(tally.openingEnteredByHand
                ? ([['Opening stock', 'Entered by hand: the chapter’s first tally']] as Array<
                    [string, string]
                  >)
                : []),
            ]}
          />
        </Section>
        <Section id="review-checks" title="Checks">
          <TallyChecks
            checks={tally.checks}
            acknowledgedWarnings={tally.acknowledgedWarnings}
            acknowledgementNote={tally.acknowledgementNote}
          />
        </Section>
      </div>

      <Section id="review-history" title="Against the chapter’s history">
        <HeadlineHistory tally={tally} labelledBy="review-history" />
      </Section>

      <section aria-label="Figures">
        <TallySummary values={tally.values} detail={tally} idPrefix="review-figures" />
      </section>

      <TallyTrail detail={tally} idPrefix="review" />
    </div>
  );
}
