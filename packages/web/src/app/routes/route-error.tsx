import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { ArrowClockwise20Regular, Home20Regular } from '@fluentui/react-icons';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';

const useStyles = makeStyles({
  standalone: { padding: `${tokens.spacingVerticalXXL} ${tokens.spacingHorizontalXXL}` },
  text: { margin: 0, marginBottom: tokens.spacingVerticalS, maxWidth: '64ch' },
  detail: {
    margin: 0,
    marginBottom: tokens.spacingVerticalL,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    maxWidth: '64ch',
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    whiteSpace: 'pre-wrap',
    overflowWrap: 'anywhere',
    backgroundColor: tokens.colorNeutralBackground3,
    borderRadius: tokens.borderRadiusMedium,
  },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

function messageOf(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  if (error instanceof Error) return error.message;
  return String(error);
}

/**
 * Shown when a page breaks while rendering or loading. Inside the shell it fills the content
 * area; `standalone` (the shell itself broke) gives it its own main landmark.
 */
export function RouteErrorPage({ standalone = false }: { standalone?: boolean }) {
  const styles = useStyles();
  const error = useRouteError();

  const content = (
    <>
      <PageHeader title="This page ran into a problem" />
      <Text as="p" className={styles.text}>
        Tallyloom hit an error it did not expect, and nothing you entered was sent. Reloading often
        helps; if it happens again, note what you were doing and pass the message below to the team.
      </Text>
      <p className={styles.detail}>{messageOf(error)}</p>
      <div className={styles.actions}>
        <LinkButton to={paths.network.getHref()} appearance="primary" icon={<Home20Regular />}>
          Go to Network
        </LinkButton>
        <Button icon={<ArrowClockwise20Regular />} onClick={() => window.location.reload()}>
          Reload page
        </Button>
      </div>
    </>
  );

  return standalone ? <main className={styles.standalone}>{content}</main> : content;
}
