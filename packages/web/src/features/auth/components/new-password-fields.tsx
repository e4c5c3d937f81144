import { Field } from '@fluentui/react-components';
import { checkPassword } from '@tallyloom/core';
import { useState } from 'react';
import { PasswordInput } from '@/components/ui/password-input';
import { PasswordHints } from './password-hints';

export interface NewPasswordValue {
  password: string;
  confirm: string;
}

export const emptyNewPassword: NewPasswordValue = { password: '', confirm: '' };

/** What the browser can check before sending; the server adds the common-password list. */
export function newPasswordProblems(
  value: NewPasswordValue,
  accountWords: string[],
): { password?: string; confirm?: string } {
  const [problem] = checkPassword(value.password, { accountWords });
  if (!value.password) return { password: 'Choose a new password.' };
  if (problem) return { password: problem };
  if (value.confirm !== value.password) {
    return {
      confirm: value.confirm
        ? 'The two passwords are not the same.'
        : 'Type the new password again to confirm it.',
    };
  }
  return {};
}

export interface NewPasswordFieldsProps {
  value: NewPasswordValue;
  onChange: (value: NewPasswordValue) => void;
  /** The account's own e-mail and name, which the password must not be. */
  accountWords: string[];
  /** Set once the person has tried to submit: from then on, problems show as errors. */
  submitted: boolean;
  /** The server's word on the new password (e.g. found on the common-password list). */
  serverMessage?: string;
  label?: string;
}

/** New password and its confirmation, checked as the person types. */
export function NewPasswordFields({
  value,
  onChange,
  accountWords,
  submitted,
  serverMessage,
  label = 'New password',
}: NewPasswordFieldsProps) {
  const [confirmTouched, setConfirmTouched] = useState(false);
  const problems = newPasswordProblems(value, accountWords);

  // While typing, a problem is a quiet warning; after a submit attempt, an error.
  let passwordState: 'none' | 'warning' | 'error' | 'success' = 'none';
  let passwordMessage: string | undefined;
  if (serverMessage) {
    passwordState = 'error';
    passwordMessage = serverMessage;
  } else if (problems.password && (submitted || value.password)) {
    passwordState = submitted ? 'error' : 'warning';
    passwordMessage = problems.password;
  } else if (value.password) {
    passwordState = 'success';
    passwordMessage = 'Long enough, and not your name or e-mail.';
  }

  const showConfirmProblem = !!problems.confirm && (submitted || confirmTouched);

  return (
    <>
      <Field
        label={label}
        validationState={passwordState}
        validationMessage={passwordMessage}
        hint={<PasswordHints />}
      >
        <PasswordInput
          name="new-password"
          autoComplete="new-password"
          value={value.password}
          onChange={(_event, data) => onChange({ ...value, password: data.value })}
        />
      </Field>
      <Field
        label="Confirm new password"
        validationState={showConfirmProblem ? 'error' : 'none'}
        validationMessage={showConfirmProblem ? problems.confirm : undefined}
      >
        <PasswordInput
          name="confirm-password"
          autoComplete="new-password"
          value={value.confirm}
          onChange={(_event, data) => onChange({ ...value, confirm: data.value })}
          onBlur={() => setConfirmTouched(true)}
        />
      </Field>
    </>
  );
}
