import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  tokens,
} from '@fluentui/react-components';
import { ArrowUndo20Regular, Checkmark20Regular } from '@fluentui/react-icons';
import type { TallyDetail } from '@tallyloom/core';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { tallyKeys } from '@/features/tallies/api';
import { ReviewDecisionDialog, type ReviewDecision } from './review-decision-dialog';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  buttons: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
});

/**
 * Approve and Return, each shown only when the server says the person may take it now; a
 * change made meanwhile by someone else is shown, not overwritten.
 */
export function ReviewActions({ tally }: { tally: TallyDetail }) {
  const styles = useStyles();
  const queryClient = useQueryClient();
  const [decision, setDecision] = useState<ReviewDecision | null>(null);
  const [changedMeanwhile, setChangedMeanwhile] = useState(false);
  const [decided, setDecided] = useState<ReviewDecision | null>(null);
  const outcome = useRef<HTMLDivElement>(null);
  // The buttons go once the decision is made: keep the keyboard on the page, at its outcome.
  useEffect(() => {
    if (decided) outcome.current?.focus();
  }, [decided]);
  const mayApprove = tally.allowedActions.includes('approve');
  const mayReturn = tally.allowedActions.includes('return');

  if (!mayApprove && !mayReturn && !changedMeanwhile && !decided) return null;
  return (
    <div className={styles.root}>
      {decided ? (
        <div ref={outcome} tabIndex={-1} role="status">
          <MessageBar intent="success" layout="multiline">
            <MessageBarBody>
              <MessageBarTitle>
                {decided === 'approve' ? 'Approved' : 'Returned to the chapter'}
              </MessageBarTitle>
              <RouterLink inline to={paths.tallyReview.getHref()}>
                Back to the review queue
              </RouterLink>
            </MessageBarBody>
          </MessageBar>
        </div>
      ) : null}
      {changedMeanwhile ? (
        <div role="alert">
          <MessageBar intent="warning" layout="multiline">
            <MessageBarBody>
              <MessageBarTitle>Changed while you were reading</MessageBarTitle>
              Someone changed this tally after you opened it. The page now shows it as it is: read
              it again before you decide.
            </MessageBarBody>
          </MessageBar>
        </div>
      ) : null}
      {mayApprove || mayReturn ? (
        <div className={styles.buttons}>
          {mayApprove ? (
            <Button
              appearance="primary"
              icon={<Checkmark20Regular />}
              onClick={() => setDecision('approve')}
            >
              Approve
            </Button>
          ) : null}
          {mayReturn ? (
            <Button icon={<ArrowUndo20Regular />} onClick={() => setDecision('return')}>
              Return to chapter
            </Button>
          ) : null}
        </div>
      ) : null}
      <ReviewDecisionDialog
        tally={tally}
        decision={decision}
        onClose={() => setDecision(null)}
        onDone={(made) => {
          setChangedMeanwhile(false);
          setDecided(made);
        }}
        onConflict={(current) => {
          queryClient.setQueryData(tallyKeys.detail(current.id), current);
          setDecided(null);
          setChangedMeanwhile(true);
        }}
      />
    </div>
  );
}
