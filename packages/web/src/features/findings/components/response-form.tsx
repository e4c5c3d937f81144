import { Button, Field, makeStyles, Textarea, tokens } from '@fluentui/react-components';
import { FINDING_BODY_MAX } from '@tallyloom/core';
import { useState, type FormEvent } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { FormAlert } from '@/components/ui/form-alert';
import { formProblems } from '@/lib/form-errors';
import { useRespondToFinding } from '../api/respond-to-finding';

const useStyles = makeStyles({
  form: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'flex-start',
    gap: tokens.spacingVerticalS,
    maxWidth: '72ch',
  },
  field: { alignSelf: 'stretch' },
});

/** Staff and admins answer a finding; the answer is kept as written. */
export function ResponseForm({ findingId }: { findingId: number }) {
  const styles = useStyles();
  const respond = useRespondToFinding();
  const notify = useNotify();
  const [body, setBody] = useState('');
  const [submitted, setSubmitted] = useState(false);
  const local = body.trim() ? undefined : 'Write your response first.';
  const server = respond.isError ? formProblems<'body'>(respond.error, ['body']) : null;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(true);
    if (local) return;
    respond.mutate(
      { id: findingId, body: body.trim() },
      {
        onSuccess: () => {
          setBody('');
          setSubmitted(false);
          notify('Response added.');
        },
      },
    );
  };

  return (
    <form className={styles.form} onSubmit={submit} noValidate>
      <FormAlert messages={server?.general ?? []} />
      <Field
        className={styles.field}
        label="Your response"
        hint="Responses are kept as written: they cannot be edited or removed."
        required
        validationMessage={(submitted ? local : undefined) ?? server?.fields.body}
      >
        <Textarea
          name="response"
          resize="vertical"
          rows={4}
          maxLength={FINDING_BODY_MAX}
          value={body}
          onChange={(_event, data) => setBody(data.value)}
        />
      </Field>
      <Button type="submit" appearance="primary" disabledFocusable={respond.isPending}>
        {respond.isPending ? 'Sending…' : 'Add response'}
      </Button>
    </form>
  );
}
