import { Text, makeStyles, tokens } from '@fluentui/react-components';
import { useLocation } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { PublicFrame } from '@/components/ui/public-frame';
import { RouterLink } from '@/components/ui/router-link';
import { appConfig } from '@/config/app-config';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/lib/session/use-session';
import { SignedInShell } from './app-root';

const useStyles = makeStyles({
  text: { margin: 0, marginBottom: tokens.spacingVerticalM, maxWidth: '60ch' },
  path: { fontFamily: tokens.fontFamilyMonospace, overflowWrap: 'anywhere' },
});

/** Open without a session: inside the shell for a signed-in person, in the quiet frame otherwise. */
export function NotFoundRoute() {
  const styles = useStyles();
  const { pathname } = useLocation();
  const user = useSessionUser();
  const content = (
    <>
      <PageHeader title="Page not found" />
      <Text as="p" className={styles.text}>
        Nothing lives at <span className={styles.path}>{pathname}</span>. The link may be mistyped,
        or the page may have moved.
      </Text>
      {user ? (
        <RouterLink to={paths.network.getHref()}>Back to Network</RouterLink>
      ) : (
        <RouterLink to={paths.signIn.getHref()}>Go to sign in</RouterLink>
      )}
    </>
  );
  return user ? (
    <SignedInShell user={user}>{content}</SignedInShell>
  ) : (
    <PublicFrame productName={appConfig.productName} networkName={appConfig.networkName}>
      {content}
    </PublicFrame>
  );
}
