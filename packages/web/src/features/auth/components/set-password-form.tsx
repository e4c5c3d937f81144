import { Button, Text } from '@fluentui/react-components';
import type { OneTimeLinkInfo } from '@tallyloom/core';
import { useState, type FormEvent } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { formProblems } from '@/lib/form-errors';
import { formatDateTime } from '@/lib/format';
import { useFormStyles } from './form-styles';
import {
  emptyNewPassword,
  NewPasswordFields,
  newPasswordProblems,
  type NewPasswordValue,
} from './new-password-fields';

export interface SetPasswordFormProps {
  link: OneTimeLinkInfo;
  intro: string;
  submitLabel: string;
  pendingLabel: string;
  pending: boolean;
  error: unknown;
  onSubmit: (password: string) => void;
}

/** The password form behind a checked invitation or reset link. */
export function SetPasswordForm({
  link,
  intro,
  submitLabel,
  pendingLabel,
  pending,
  error,
  onSubmit,
}: SetPasswordFormProps) {
  const styles = useFormStyles();
  const [value, setValue] = useState<NewPasswordValue>(emptyNewPassword);
  const [submitted, setSubmitted] = useState(false);
  // The server's complaint is about the password it saw; once that is edited, it no longer applies.
  const [editedAfter, setEditedAfter] = useState<unknown>(null);
  const accountWords = [link.email, link.displayName];
  const problems =
    error && error !== editedAfter
      ? formProblems(error, ['password'])
      : { fields: {}, general: [] };

  const change = (next: NewPasswordValue) => {
    setValue(next);
    setEditedAfter(error);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(true);
    const local = newPasswordProblems(value, accountWords);
    if (local.password || local.confirm) return;
    onSubmit(value.password);
  };

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label={submitLabel}>
      <Text as="p" className={styles.text}>
        {intro} <strong>{link.displayName}</strong> ({link.email}).
      </Text>
      <Text as="p" size={200} className={styles.quiet}>
        This link works once, until {formatDateTime(link.expiresAt)}.
      </Text>
      <FormAlert messages={problems.general} />
      <NewPasswordFields
        value={value}
        onChange={change}
        accountWords={accountWords}
        submitted={submitted}
        serverMessage={problems.fields.password}
      />
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabledFocusable={pending}>
          {pending ? pendingLabel : submitLabel}
        </Button>
      </div>
    </form>
  );
}
