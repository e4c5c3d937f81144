import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { Send20Regular } from '@fluentui/react-icons';
import type { TallyDetail, TallyProblem } from '@tallyloom/core';
import { useCallback, useEffect, useId, useMemo, useState } from 'react';
import { useForm, type FieldPath } from 'react-hook-form';
import { TallySummary } from '@/components/tallies/tally-summary';
import { useNotify } from '@/components/ui/app-toaster';
import { FormAlert } from '@/components/ui/form-alert';
import { newIdempotencyKey, useSubmitTally } from '../api/submit-tally';
import { useTallyAutosave } from '../hooks/use-tally-autosave';
import { BlanketsSection } from './blankets-section';
import { CheckPanel } from './check-panel';
import { liveCheck } from './live-check';
import { MoreSection } from './more-section';
import { PanelsSection } from './panels-section';
import { PeopleServedSection } from './people-served-section';
import { focusTargetOf } from './problem-target';
import { SaveStatus } from './save-status';
import { serverProblems } from './server-problems';
import { SubmitTallyDialog, type Acknowledgement } from './submit-tally-dialog';
import { TallyConflict } from './tally-conflict';
import { formOf, readForm, type TallyForm } from './tally-form-model';

const useStyles = makeStyles({
  layout: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) 360px',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
    '@media (max-width: 1200px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
    '@media print': { display: 'none' },
  },
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL, minWidth: 0 },
  side: {
    position: 'sticky',
    top: tokens.spacingVerticalL,
    maxHeight: `calc(100vh - 2 * ${tokens.spacingVerticalL})`,
    overflowY: 'auto',
    '@media (max-width: 1200px)': { position: 'static', maxHeight: 'none' },
  },
  actions: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
  },
  blocked: { margin: 0, color: tokens.colorNeutralForeground2 },
  printOnly: { display: 'none', '@media print': { display: 'block' } },
});

export interface TallyEditorProps {
  detail: TallyDetail;
}

/**
 * The tally form of a draft or returned tally: saved a moment after each change, checked live
 * by core's own checks beside it, and submitted once the errors are fixed and the warnings
 * acknowledged. Give it a new `key` when the revision changes, so it starts afresh.
 */
export function TallyEditor({ detail }: TallyEditorProps) {
  const styles = useStyles();
  const notify = useNotify();
  const blockedId = useId();
  const [opened] = useState(() => formOf(detail));
  const openedValues = useMemo(() => readForm(opened).values, [opened]);
  const form = useForm<TallyForm>({ defaultValues: opened, mode: 'onChange' });
  const typed = form.watch();
  const read = readForm(typed);
  const result = liveCheck(read, detail.checkContext);

  const autosave = useTallyAutosave({
    id: detail.id,
    version: detail.version,
    openedValues,
    values: read.values,
    invalidMessage: read.invalid[0]?.message,
    enabled: true,
  });
  const { status } = autosave;

  const submit = useSubmitTally();
  // One key for this revision's submission: sending it again after an answer that never arrived
  // still makes one submission. A refused attempt stores nothing, so the key may be sent again.
  const [submissionKey] = useState(newIdempotencyKey);
  const [dialogKey, setDialogKey] = useState(0);
  const [dialogOpen, setDialogOpen] = useState(false);

  const isFormName = useCallback(
    (name: string) =>
      /^[\w.]+$/.test(name) && form.getValues(name as FieldPath<TallyForm>) !== undefined,
    [form],
  );
  const submitProblems = submit.error ? serverProblems(submit.error, isFormName) : undefined;
  const saveProblems =
    status.kind === 'failed' ? serverProblems(status.error, isFormName) : undefined;

  // The server's word on a figure goes beside its box, as the form's own messages do.
  useEffect(() => {
    const refusals = [
      ...(status.kind === 'failed' ? [status.error] : []),
      ...(submit.error ? [submit.error] : []),
    ];
    for (const refusal of refusals) {
      for (const { name, message } of serverProblems(refusal, isFormName).fields) {
        form.setError(name as FieldPath<TallyForm>, { type: 'server', message });
      }
    }
  }, [form, isFormName, status, submit.error]);

  useEffect(() => {
    const unsaved =
      status.kind === 'waiting' || status.kind === 'saving' || status.kind === 'invalid';
    if (!unsaved) return undefined;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [status.kind]);

  const showField = (problem: TallyProblem) => {
    const target = focusTargetOf(problem.field, typed, read);
    if (target) form.setFocus(target as FieldPath<TallyForm>, { shouldSelect: true });
  };

  const mayAct = detail.allowedActions.includes('submit');
  const errorCount = result.errors.length;
  const blockedReason =
    status.kind === 'conflict'
      ? 'Choose which figures to keep (above) before submitting.'
      : errorCount > 0
        ? `Fix the ${errorCount === 1 ? 'error' : `${errorCount} errors`} in the check panel before submitting.`
        : undefined;

  const send = (ack: Acknowledgement) => {
    submit.mutate(
      {
        id: detail.id,
        version: autosave.version(),
        acknowledgedWarnings: ack.acknowledgedWarnings,
        acknowledgementNote: ack.acknowledgementNote,
        idempotencyKey: submissionKey,
      },
      {
        onSuccess: () => {
          setDialogOpen(false);
          notify('Tally submitted for review.');
        },
      },
    );
  };

  const startSubmit = async () => {
    if (blockedReason) return;
    submit.reset();
    // Submit what is on screen: anything typed since the last save is saved first.
    const saved = await autosave.flush();
    if (!saved) return;
    if (result.warnings.length === 0) {
      send({ acknowledgedWarnings: [], acknowledgementNote: null });
      return;
    }
    setDialogKey((key) => key + 1);
    setDialogOpen(true);
  };

  return (
    <>
      <div className={styles.layout}>
        <form
          className={styles.form}
          noValidate
          aria-label="Monthly tally"
          onSubmit={(event) => {
            event.preventDefault();
            void startSubmit();
          }}
        >
          {status.kind === 'conflict' ? (
            <TallyConflict
              current={status.current}
              mine={status.mine}
              onTakeCurrent={() => {
                const next = formOf(status.current);
                autosave.takeCurrent(status.current, readForm(next).values);
                form.reset(next);
              }}
              onKeepMine={() => autosave.keepMine(status.current)}
            />
          ) : null}
          <PanelsSection
            control={form.control}
            context={detail.checkContext}
            openingEnteredByHand={detail.openingEnteredByHand}
          />
          <BlanketsSection
            control={form.control}
            context={detail.checkContext}
            agencies={detail.agencies}
            openingEnteredByHand={detail.openingEnteredByHand}
          />
          <PeopleServedSection control={form.control} agencies={detail.agencies} />
          <MoreSection control={form.control} />

          <FormAlert title="The figures were not saved" messages={saveProblems?.general ?? []} />
          {!dialogOpen ? (
            <FormAlert
              title="The tally was not submitted"
              messages={submitProblems?.general ?? []}
            />
          ) : null}
          <SaveStatus
            status={status}
            lastSavedAt={detail.updatedAt}
            onRetry={() => void autosave.retry()}
          />
          {mayAct ? (
            <div className={styles.actions}>
              <Button
                type="submit"
                appearance="primary"
                icon={<Send20Regular />}
                disabledFocusable={!!blockedReason || submit.isPending}
                aria-describedby={blockedReason ? blockedId : undefined}
              >
                {submit.isPending ? 'Submitting…' : 'Submit for review'}
              </Button>
              {blockedReason ? (
                <Text as="p" id={blockedId} className={styles.blocked}>
                  {blockedReason}
                </Text>
              ) : null}
            </div>
          ) : null}
        </form>
        <div className={styles.side}>
          <CheckPanel result={result} onShowField={showField} />
        </div>
      </div>

      <div className={styles.printOnly}>
        <TallySummary values={read.values} detail={detail} />
      </div>

      <SubmitTallyDialog
        key={dialogKey}
        open={dialogOpen}
        result={result}
        previous={{
          acknowledgedWarnings: detail.acknowledgedWarnings,
          acknowledgementNote: detail.acknowledgementNote,
        }}
        pending={submit.isPending}
        problems={dialogOpen ? (submitProblems?.general ?? []) : []}
        onSubmit={send}
        onClose={() => setDialogOpen(false)}
      />
    </>
  );
}
