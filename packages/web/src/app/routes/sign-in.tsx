import { MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { safeNextPath } from '@/lib/session/next-path';
import { restoreSession } from '@/lib/session/session';
import type { SessionState } from '@/lib/session/session-store';
import { useSession } from '@/lib/session/use-session';

const useStyles = makeStyles({
  notice: { marginBottom: tokens.spacingVerticalM },
});

function nextPath(value: string | null): string {
  const home = paths.network.getHref();
  const next = safeNextPath(value, home);
  // Never back to the sign-in page itself, which would only send the person on again.
  return next.startsWith(paths.signIn.path) ? home : next;
}

/** Someone already signed in has nothing to do here: on to where they were going. */
export async function signInLoader({ request }: LoaderFunctionArgs) {
  const user = await restoreSession();
  if (user) return redirect(nextPath(new URL(request.url).searchParams.get('next')));
  return null;
}

function noticeFor(
  notice: string | null,
  session: SessionState,
): { intent: 'success' | 'info' | 'warning'; text: string } | undefined {
  if (notice === 'password-changed') {
    return { intent: 'success', text: 'Your new password is set. Sign in with it below.' };
  }
  if (session.status !== 'signed-out') return undefined;
  switch (session.reason) {
    case 'expired':
      return {
        intent: 'info',
        text: 'Your session has ended. Sign in again to carry on where you were.',
      };
    case 'signed-out':
      return { intent: 'info', text: 'You have signed out.' };
    case 'unreachable':
      return {
        intent: 'warning',
        text: 'Tallyloom could not check for an earlier session just now. Sign in below; if that fails too, check the connection.',
      };
    default:
      return undefined;
  }
}

export function SignInRoute() {
  const styles = useStyles();
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const session = useSession();
  const next = nextPath(searchParams.get('next'));
  const notice = noticeFor(searchParams.get('notice'), session);

  return (
    <>
      <PageHeader
        title="Sign in"
        description="Chapter leads, coordinators and staff sign in with their e-mail address."
      />
      {notice ? (
        <div role="status" className={styles.notice}>
          <MessageBar intent={notice.intent} layout="multiline">
            <MessageBarBody>{notice.text}</MessageBarBody>
          </MessageBar>
        </div>
      ) : null}
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
    </>
  );
}
