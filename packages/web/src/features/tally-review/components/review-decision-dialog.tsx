import { Dialog, DialogSurface, Field, Textarea } from '@fluentui/react-components';
import type { TallyDetail } from '@tallyloom/core';
import { monthLabel } from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { DialogForm } from '@/components/ui/dialog-form';
import { conflictingTally, useApproveTally, useReturnTally } from '@/features/tallies/api';
import { reviewProblem } from './review-problem';

export type ReviewDecision = 'approve' | 'return';

const COMMENT_LIMIT = 2000;

const WORDING: Record<
  ReviewDecision,
  { title: string; submit: string; pending: string; label: string; hint: string }
> = {
  approve: {
    title: 'Approve this tally?',
    submit: 'Approve',
    pending: 'Approving…',
    label: 'Comment (optional)',
    hint: 'Kept in the review trail, for the chapter to read.',
  },
  return: {
    title: 'Return this tally to the chapter',
    submit: 'Return to chapter',
    pending: 'Returning…',
    label: 'What should the chapter fix?',
    hint: 'The chapter lead sees this comment beside the tally.',
  },
};

interface DecisionFormProps {
  tally: TallyDetail;
  decision: ReviewDecision;
  onDone: (decision: ReviewDecision) => void;
  /** The tally changed since it was read: the page shows it as it is now, the dialog closes. */
  onConflict: (current: TallyDetail) => void;
}

function DecisionForm({ tally, decision, onDone, onConflict }: DecisionFormProps) {
  const approve = useApproveTally();
  const giveBack = useReturnTally();
  const mutation = decision === 'approve' ? approve : giveBack;
  const notify = useNotify();
  const [comment, setComment] = useState('');
  const [submitted, setSubmitted] = useState(false);
  const wording = WORDING[decision];
  const which = `${tally.chapterName}, ${monthLabel(tally.month)}`;

  const trimmed = comment.trim();
  const missing = decision === 'return' && !trimmed;
  const tooLong = trimmed.length > COMMENT_LIMIT;
  const commentProblem = missing
    ? 'Say what the chapter should fix, so the lead knows what to change.'
    : tooLong
      ? `Keep the comment within ${COMMENT_LIMIT.toLocaleString('en-US')} characters.`
      : undefined;

  const submit = () => {
    setSubmitted(true);
    if (commentProblem) return;
    const onError = (error: Error) => {
      const current = conflictingTally(error);
      if (current) onConflict(current);
    };
    if (decision === 'approve') {
      approve.mutate(
        { id: tally.id, version: tally.version, comment: trimmed || null },
        {
          onSuccess: () => {
            notify(`Approved: ${which}.`);
            onDone('approve');
          },
          onError,
        },
      );
    } else {
      giveBack.mutate(
        { id: tally.id, version: tally.version, comment: trimmed },
        {
          onSuccess: () => {
            notify(`Returned to the chapter: ${which}.`);
            onDone('return');
          },
          onError,
        },
      );
    }
  };

  return (
    <DialogForm
      title={wording.title}
      intro={
        decision === 'approve'
          ? `${which}, revision ${tally.revision}. Once approved, reports read these figures; a later change needs an amendment.`
          : `${which}, revision ${tally.revision}. The chapter lead can correct it and submit it again.`
      }
      problems={mutation.isError ? [reviewProblem(mutation.error)] : []}
      submitLabel={wording.submit}
      pendingLabel={wording.pending}
      pending={mutation.isPending}
      onSubmit={submit}
    >
      <Field
        label={wording.label}
        required={decision === 'return'}
        hint={wording.hint}
        validationMessage={submitted ? commentProblem : undefined}
      >
        <Textarea
          name="comment"
          resize="vertical"
          rows={4}
          value={comment}
          onChange={(_event, data) => setComment(data.value)}
        />
      </Field>
    </DialogForm>
  );
}

export interface ReviewDecisionDialogProps extends Omit<DecisionFormProps, 'decision'> {
  /** The decision being made; null keeps the dialog closed. */
  decision: ReviewDecision | null;
  onClose: () => void;
}

/** Approve (comment optional) or return (comment required), sending the version that was read. */
export function ReviewDecisionDialog({
  tally,
  decision,
  onClose,
  onDone,
  onConflict,
}: ReviewDecisionDialogProps) {
  return (
    <Dialog open={decision !== null} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        {decision ? (
          <DecisionForm
            tally={tally}
            decision={decision}
            onDone={(made) => {
              onClose();
              onDone(made);
            }}
            onConflict={(current) => {
              onClose();
              onConflict(current);
            }}
          />
        ) : null}
      </DialogSurface>
    </Dialog>
  );
}
