import { Button, Field, Input, Text } from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { formProblems } from '@/lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { useFormStyles } from './form-styles';

/**
 * Asks for a reset link. The answer is the same whether or not the address has an account,
 * so this page cannot be used to find out who has one.
 */
export function ForgotPasswordForm() {
  const styles = useFormStyles();
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [missing, setMissing] = useState<string>();

  if (request.isSuccess) {
    return (
      <div className={styles.form} role="status">
        <Text as="p" className={styles.text}>
          If an account exists for <strong>{request.variables.email}</strong>, we have sent a link
          to it. The link works once and for a limited time.
        </Text>
        <Text as="p" className={styles.quiet}>
          Nothing there after a few minutes? Check the spam folder, or ask a network admin.
        </Text>
        <RouterLink to={paths.signIn.getHref()}>Back to sign in</RouterLink>
      </div>
    );
  }

  const problems = request.isError
    ? formProblems(request.error, ['email'])
    : { fields: {}, general: [] };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const address = email.trim();
    setMissing(address ? undefined : 'Enter the e-mail address you sign in with.');
    if (address) request.mutate({ email: address });
  };

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label="Ask for a reset link">
      <FormAlert messages={problems.general} />
      <Field label="E-mail" validationMessage={missing ?? problems.fields.email}>
        <Input
          type="email"
          name="email"
          autoComplete="username"
          value={email}
          onChange={(_event, data) => setEmail(data.value)}
        />
      </Field>
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabledFocusable={request.isPending}>
          {request.isPending ? 'Sending…' : 'Send reset link'}
        </Button>
        <RouterLink to={paths.signIn.getHref()}>Back to sign in</RouterLink>
      </div>
    </form>
  );
}
