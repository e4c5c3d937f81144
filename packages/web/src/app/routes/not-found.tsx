import { Text, makeStyles, tokens } from '@fluentui/react-components';
import { useLocation } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';

const useStyles = makeStyles({
  text: { margin: 0, marginBottom: tokens.spacingVerticalM, maxWidth: '60ch' },
  path: { fontFamily: tokens.fontFamilyMonospace, overflowWrap: 'anywhere' },
});

export function NotFoundRoute() {
  const styles = useStyles();
  const { pathname } = useLocation();
  return (
    <>
      <PageHeader title="Page not found" />
      <Text as="p" className={styles.text}>
        Nothing lives at <span className={styles.path}>{pathname}</span>. The link may be mistyped,
        or the page may have moved.
      </Text>
      <RouterLink to={paths.network.getHref()}>Back to Network</RouterLink>
    </>
  );
}
