import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useCompletePasswordReset } from '../api/complete-password-reset';
import { OneTimeLinkGate } from './one-time-link-gate';
import { SetPasswordForm } from './set-password-form';

export interface ResetPasswordProps {
  token: string | null;
  /** Called once the new password is set; the person then signs in with it. */
  onReset: () => void;
}

export function ResetPassword({ token, onReset }: ResetPasswordProps) {
  const complete = useCompletePasswordReset();
  return (
    <OneTimeLinkGate
      token={token}
      purpose="password_reset"
      whenInvalid={
        <>
          Reset links work once and for a short time.{' '}
          <RouterLink to={paths.forgotPassword.getHref()} inline>
            Ask for a new link
          </RouterLink>
          .
        </>
      }
    >
      {(link) => (
        <SetPasswordForm
          link={link}
          intro="Choose a new password for"
          submitLabel="Set new password"
          pendingLabel="Setting your password…"
          pending={complete.isPending}
          error={complete.error}
          onSubmit={(password) =>
            complete.mutate({ token: token ?? '', password }, { onSuccess: onReset })
          }
        />
      )}
    </OneTimeLinkGate>
  );
}
