import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { ShieldKeyhole24Regular } from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import { PageHeader } from './page-header';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-start',
    padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalL}`,
    borderLeft: `4px solid ${tokens.colorBrandStroke1}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
    maxWidth: '72ch',
  },
  icon: { color: tokens.colorBrandForeground1, flexShrink: 0 },
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  line: { margin: 0 },
});

export interface NoPermissionStateProps {
  /** The page the person tried to open, e.g. "People". */
  pageName: string;
  /** Who they are signed in as, e.g. "Dana Whitlock (Chapter lead, Alder Falls)". */
  signedInAs: string;
  /** Who may open it, e.g. "network admins". */
  allowedFor: string;
  /** A link back to somewhere they can go. */
  action: ReactNode;
}

/** Shown in place of a page the signed-in person's role does not reach; never a blank page. */
export function NoPermissionState({
  pageName,
  signedInAs,
  allowedFor,
  action,
}: NoPermissionStateProps) {
  const styles = useStyles();
  return (
    <>
      <PageHeader title={`No access to ${pageName}`} />
      <div className={styles.root}>
        <ShieldKeyhole24Regular className={styles.icon} aria-hidden="true" />
        <div className={styles.body}>
          <Text as="p" className={styles.line}>
            You are signed in as <strong>{signedInAs}</strong>. {pageName} is open to {allowedFor}{' '}
            only.
          </Text>
          <Text as="p" className={styles.line}>
            If your work needs it, a network admin can change your role. Otherwise, carry on from
            one of the pages in the menu.
          </Text>
          <div>{action}</div>
        </div>
      </div>
    </>
  );
}
