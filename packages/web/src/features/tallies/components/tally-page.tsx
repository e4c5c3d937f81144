import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Text,
  tokens,
} from '@fluentui/react-components';
import { DocumentEdit20Regular, Print20Regular } from '@fluentui/react-icons';
import { monthLabel, type TallyDetail } from '@tallyloom/core';
import { useState } from 'react';
import { TallySummary } from '@/components/tallies/tally-summary';
import { TallyTrail } from '@/components/tallies/tally-trail';
import { useNotify } from '@/components/ui/app-toaster';
import { describeProblem, ErrorState } from '@/components/ui/error-state';
import { FactList } from '@/components/ui/fact-list';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { useAmendTally } from '../api/amend-tally';
import { useTally } from '../api/get-tally';
import { AmendTallyDialog } from './amend-tally-dialog';
import { reportingText } from './tally-labels';
import { TallyEditor } from './tally-editor';
import { TallyStateBadge } from '@/components/tallies/tally-state-badge';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  meta: {
    display: 'inline-flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
  },
  noPrint: { '@media print': { display: 'none' } },
  comment: { whiteSpace: 'pre-wrap' },
  acknowledged: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
});

function backLink() {
  return <RouterLink to={paths.tallies.getHref()}>Monthly tallies</RouterLink>;
}

/** The return comment, the amendment under way, or who approved it: above the figures. */
function StateBanner({ detail }: { detail: TallyDetail }) {
  const styles = useStyles();
  if (detail.state === 'returned' && detail.returnComment) {
    return (
      <MessageBar intent="warning" layout="multiline">
        <MessageBarBody>
          <MessageBarTitle>Returned for changes</MessageBarTitle>
          <span className={styles.comment}>{detail.returnComment}</span>
        </MessageBarBody>
      </MessageBar>
    );
  }
  if (detail.amendmentPending) {
    return (
      <MessageBar intent="info" layout="multiline">
        <MessageBarBody>
          <MessageBarTitle>Amendment in progress</MessageBarTitle>
          {detail.amendmentReason ? `Reason: ${detail.amendmentReason}. ` : ''}
          Revision {detail.approvedRevision} stays in force in every report until this amendment is
          approved.
        </MessageBarBody>
      </MessageBar>
    );
  }
  return null;
}

function Acknowledged({ detail }: { detail: TallyDetail }) {
  const styles = useStyles();
  if (detail.acknowledgedWarnings.length === 0 && !detail.acknowledgementNote) return null;
  const messages = new Map(
    detail.checks.warnings.map((warning) => [warning.code, warning.message]),
  );
  return (
    <section className={styles.acknowledged} aria-labelledby="tally-acknowledged">
      <SectionHeading id="tally-acknowledged">Warnings acknowledged on submission</SectionHeading>
      <ul>
        {detail.acknowledgedWarnings.map((code) => (
          <li key={code}>{messages.get(code) ?? code}</li>
        ))}
      </ul>
      {detail.acknowledgementNote ? (
        <Text as="p" className={styles.comment}>
          Note: {detail.acknowledgementNote}
        </Text>
      ) : null}
    </section>
  );
}

function Loaded({ detail }: { detail: TallyDetail }) {
  const styles = useStyles();
  const notify = useNotify();
  const amend = useAmendTally();
  const [amending, setAmending] = useState(false);
  const editable = detail.allowedActions.includes('edit');
  const mayAmend = detail.allowedActions.includes('amend');
  const mayReview =
    detail.allowedActions.includes('approve') || detail.allowedActions.includes('return');

  return (
    <div className={styles.page}>
      <PageHeader
        title={`${monthLabel(detail.month)} tally`}
        description={
          <>
            {detail.chapterName} · {detail.regionName} ·{' '}
            {reportingText(detail.reporting, detail.dueOn)}
            <span className={styles.noPrint}> · {backLink()}</span>
          </>
        }
        actions={
          <span className={styles.meta}>
            <TallyStateBadge state={detail.state} amendmentPending={detail.amendmentPending} />
            {mayAmend ? (
              <Button
                className={styles.noPrint}
                icon={<DocumentEdit20Regular />}
                onClick={() => setAmending(true)}
              >
                Amend
              </Button>
            ) : null}
            <Button
              className={styles.noPrint}
              icon={<Print20Regular />}
              onClick={() => window.print()}
            >
              Print
            </Button>
          </span>
        }
      />
      <StateBanner detail={detail} />
      {mayReview ? (
        <Text as="p" className={styles.noPrint}>
          This tally waits for review:{' '}
          <RouterLink to={paths.tallyReviewItem.getHref(detail.id)}>
            review it: approve or return it
          </RouterLink>
          .
        </Text>
      ) : null}
      {editable ? (
        <TallyEditor key={`${detail.id}:${detail.revision}`} detail={detail} />
      ) : (
        <>
          <FactList
            rows={[
              ['Revision', String(detail.revision)],
              ['Submitted', formatDateTime(detail.submittedAt, 'Not yet')],
              [
                'Approved',
                detail.approvedAt
                  ? `${formatDateTime(detail.approvedAt)}${detail.approvedByName ? ` by ${detail.approvedByName}` : ''}`
                  : 'Not yet',
              ],
              ...(detail.openingEnteredByHand
                ? ([['Opening stock', "Entered by hand: the chapter's first tally"]] as Array<
                    [string, string]
                  >)
                : []),
            ]}
          />
          <TallySummary values={detail.values} detail={detail} />
          <Acknowledged detail={detail} />
        </>
      )}
      <div className={styles.noPrint}>
        <TallyTrail detail={detail} />
      </div>
      <AmendTallyDialog
        key={amending ? 'open' : 'closed'}
        open={amending}
        pending={amend.isPending}
        problems={amend.error ? [describeProblem(amend.error).message] : []}
        onClose={() => {
          setAmending(false);
          amend.reset();
        }}
        onAmend={(reason) =>
          amend.mutate(
            { id: detail.id, version: detail.version, reason },
            {
              onSuccess: () => {
                setAmending(false);
                notify('Amendment started: change the figures, then submit it for approval.');
              },
            },
          )
        }
      />
    </div>
  );
}

/** One monthly tally: the form while it may be edited, else its figures; the trail below. */
export function TallyPage({ id }: { id: number }) {
  const tally = useTally(id);
  if (tally.isPending) {
    return (
      <>
        <PageHeader title="Monthly tally" description={backLink()} />
        <LoadingState label="Loading the tally…" />
      </>
    );
  }
  if (tally.isError) {
    return (
      <>
        <PageHeader title="Monthly tally" description={backLink()} />
        <ErrorState
          title="The tally could not be loaded"
          error={tally.error}
          onRetry={() => void tally.refetch()}
          retrying={tally.isFetching}
        />
      </>
    );
  }
  return <Loaded detail={tally.data} />;
}
