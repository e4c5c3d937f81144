import { Button, Field, MessageBar, MessageBarBody } from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { PasswordInput } from '@/components/ui/password-input';
import { formProblems } from '@/lib/form-errors';
import { useChangePassword } from '../api/change-password';
import { useFormStyles } from './form-styles';
import {
  emptyNewPassword,
  NewPasswordFields,
  newPasswordProblems,
  type NewPasswordValue,
} from './new-password-fields';

type ChangePasswordField = 'currentPassword' | 'newPassword';

export function ChangePasswordForm({ accountWords }: { accountWords: string[] }) {
  const styles = useFormStyles();
  const change = useChangePassword();
  const [current, setCurrent] = useState('');
  const [value, setValue] = useState<NewPasswordValue>(emptyNewPassword);
  const [submitted, setSubmitted] = useState(false);
  const [currentMissing, setCurrentMissing] = useState(false);

  const problems = change.isError
    ? formProblems<ChangePasswordField>(change.error, ['currentPassword', 'newPassword'])
    : { fields: {}, general: [] };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(true);
    setCurrentMissing(!current);
    const local = newPasswordProblems(value, accountWords);
    if (!current || local.password || local.confirm) return;
    change.mutate(
      { currentPassword: current, newPassword: value.password },
      {
        onSuccess: () => {
          setCurrent('');
          setValue(emptyNewPassword);
          setSubmitted(false);
        },
      },
    );
  };

  // Editing after a refusal or a success starts afresh.
  const startOver = () => {
    if (!change.isIdle) change.reset();
  };

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label="Change password">
      {change.isSuccess ? (
        <div role="status">
          <MessageBar intent="success">
            <MessageBarBody>
              Your password has been changed. Use the new one next time you sign in.
            </MessageBarBody>
          </MessageBar>
        </div>
      ) : null}
      <FormAlert messages={problems.general} />
      <Field
        label="Current password"
        validationMessage={
          currentMissing && !current
            ? 'Enter the password you use now.'
            : problems.fields.currentPassword
        }
      >
        <PasswordInput
          name="current-password"
          autoComplete="current-password"
          value={current}
          onChange={(_event, data) => {
            startOver();
            setCurrent(data.value);
          }}
        />
      </Field>
      <NewPasswordFields
        value={value}
        onChange={(next) => {
          startOver();
          setValue(next);
        }}
        accountWords={accountWords}
        submitted={submitted}
        serverMessage={problems.fields.newPassword}
      />
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabledFocusable={change.isPending}>
          {change.isPending ? 'Changing…' : 'Change password'}
        </Button>
      </div>
    </form>
  );
}
