import {
  Checkbox,
  Dialog,
  DialogSurface,
  Field,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { submissionProblems, type TallyCheckResult } from '@tallyloom/core';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { DialogForm } from '@/components/ui/dialog-form';
import { TextAreaField } from './text-area-field';

const useStyles = makeStyles({
  list: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
});

export interface Acknowledgement {
  acknowledgedWarnings: string[];
  acknowledgementNote: string | null;
}

interface AckForm {
  /** One tick per warning, in the order of `result.warnings`. */
  ticks: boolean[];
  note: string;
}

export interface SubmitTallyDialogProps {
  open: boolean;
  result: TallyCheckResult;
  /** What was acknowledged when the tally was last submitted, if it was. */
  previous: Acknowledgement;
  pending: boolean;
  /** The server's refusal, in words. */
  problems: string[];
  onSubmit: (ack: Acknowledgement) => void;
  onClose: () => void;
}

/**
 * Before submitting with warnings: acknowledge each one and say why, in a note. Give it a new
 * `key` each time it opens, so it starts from `previous`.
 */
export function SubmitTallyDialog({
  open,
  result,
  previous,
  pending,
  problems,
  onSubmit,
  onClose,
}: SubmitTallyDialogProps) {
  const styles = useStyles();
  const { warnings } = result;
  // The parent gives the dialog a new key each time it opens, so it starts from these.
  const { control, handleSubmit } = useForm<AckForm>({
    defaultValues: {
      ticks: warnings.map((warning) => previous.acknowledgedWarnings.includes(warning.code)),
      note: previous.acknowledgementNote ?? '',
    },
  });
  const [tried, setTried] = useState(false);
  const [missing, setMissing] = useState<Record<string, string>>({});

  const send = handleSubmit(({ ticks, note }) => {
    const ack: Acknowledgement = {
      acknowledgedWarnings: warnings.filter((_warning, index) => ticks[index]).map((w) => w.code),
      acknowledgementNote: note.trim() || null,
    };
    // The same rule the server applies, with the errors already fixed (the button needs that).
    const refused = submissionProblems({ ...result, errors: [] }, ack);
    setTried(true);
    setMissing(Object.fromEntries(refused.map((problem) => [problem.code, problem.message])));
    if (refused.length === 0) onSubmit(ack);
  });

  return (
    <Dialog
      open={open}
      onOpenChange={(_event, data) => {
        if (!data.open) onClose();
      }}
    >
      <DialogSurface>
        <DialogForm
          title="Submit with warnings"
          intro="The checks found figures worth a second look. Tick each warning to say you have checked it, and write a note for the reviewer."
          problems={problems}
          submitLabel="Submit tally"
          pendingLabel="Submitting…"
          pending={pending}
          onSubmit={() => void send()}
        >
          <ul className={styles.list} aria-label="Warnings to acknowledge">
            {warnings.map((warning, index) => (
              <li key={warning.code}>
                <Controller
                  control={control}
                  name={`ticks.${index}`}
                  render={({ field }) => (
                    <Field
                      validationMessage={
                        tried
                          ? missing[`unacknowledged.${warning.code}`] &&
                            'Tick to acknowledge this warning.'
                          : undefined
                      }
                    >
                      <Checkbox
                        ref={field.ref}
                        checked={field.value}
                        onChange={(_event, data) => field.onChange(data.checked === true)}
                        label={warning.message}
                      />
                    </Field>
                  )}
                />
              </li>
            ))}
          </ul>
          <TextAreaField
            control={control}
            name="note"
            label="Note for the reviewer"
            required
            message={tried ? missing['acknowledgement-note'] : undefined}
          />
        </DialogForm>
      </DialogSurface>
    </Dialog>
  );
}
