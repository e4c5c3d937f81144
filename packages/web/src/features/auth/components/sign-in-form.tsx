import { Button, Field, Input } from '@fluentui/react-components';
import { useRef, useState, type FormEvent } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { PasswordInput } from '@/components/ui/password-input';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { formProblems } from '@/lib/form-errors';
import { useSignIn } from '../api/sign-in';
import { useFormStyles } from './form-styles';

type SignInField = 'email' | 'password';

/** A title for the refusals a person can act on; the server's message says the rest. */
function alertTitle(error: unknown): string | undefined {
  if (!(error instanceof ApiError)) return undefined;
  if (error.isNetworkFailure) return 'No connection';
  if (error.statusCode === 423) return 'Account locked for now';
  if (error.statusCode === 429) return 'Too many attempts';
  return undefined;
}

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const styles = useFormStyles();
  const signIn = useSignIn();
  const passwordRef = useRef<HTMLInputElement>(null);
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [missing, setMissing] = useState<Partial<Record<SignInField, string>>>({});

  const problems = signIn.isError
    ? formProblems<SignInField>(signIn.error, ['email', 'password'])
    : { fields: {}, general: [] };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const nextMissing: Partial<Record<SignInField, string>> = {};
    if (!email.trim()) nextMissing.email = 'Enter your e-mail address.';
    if (!password) nextMissing.password = 'Enter your password.';
    setMissing(nextMissing);
    if (Object.keys(nextMissing).length > 0) return;
    signIn.mutate(
      { email: email.trim(), password },
      {
        onSuccess: onSignedIn,
        onError: (error) => {
          // After a wrong password the field is cleared, ready for the next try.
          if (error instanceof ApiError && error.statusCode === 401) {
            setPassword('');
            passwordRef.current?.focus();
          }
        },
      },
    );
  };

  const emailMessage = missing.email ?? problems.fields.email;
  const passwordMessage = missing.password ?? problems.fields.password;

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label="Sign in">
      <FormAlert title={alertTitle(signIn.error)} messages={problems.general} />
      <Field label="E-mail" validationMessage={emailMessage}>
        <Input
          type="email"
          name="email"
          autoComplete="username"
          value={email}
          onChange={(_event, data) => setEmail(data.value)}
        />
      </Field>
      <Field label="Password" validationMessage={passwordMessage}>
        <PasswordInput
          ref={passwordRef}
          name="password"
          autoComplete="current-password"
          value={password}
          onChange={(_event, data) => setPassword(data.value)}
        />
      </Field>
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabledFocusable={signIn.isPending}>
          {signIn.isPending ? 'Signing in…' : 'Sign in'}
        </Button>
        <RouterLink to={paths.forgotPassword.getHref()}>Forgot your password?</RouterLink>
      </div>
    </form>
  );
}
