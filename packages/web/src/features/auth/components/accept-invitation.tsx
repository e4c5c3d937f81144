import { Text } from '@fluentui/react-components';
import { useAcceptInvitation } from '../api/accept-invitation';
import { OneTimeLinkGate } from './one-time-link-gate';
import { SetPasswordForm } from './set-password-form';

export interface AcceptInvitationProps {
  token: string | null;
  /** Called once the person is signed in. */
  onAccepted: () => void;
}

/** An invited person chooses a password and is signed in straight away. */
export function AcceptInvitation({ token, onAccepted }: AcceptInvitationProps) {
  const accept = useAcceptInvitation();
  return (
    <OneTimeLinkGate
      token={token}
      purpose="invitation"
      whenInvalid={
        <Text>
          Ask the network admin who invited you to send a new invitation; it comes by e-mail.
        </Text>
      }
    >
      {(link) => (
        <SetPasswordForm
          link={link}
          intro="You have been invited to Tallyloom as"
          submitLabel="Set password and sign in"
          pendingLabel="Setting your password…"
          pending={accept.isPending}
          error={accept.error}
          onSubmit={(password) =>
            accept.mutate({ token: token ?? '', password }, { onSuccess: onAccepted })
          }
        />
      )}
    </OneTimeLinkGate>
  );
}
