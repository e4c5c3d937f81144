import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { emberAccent } from '@/theme/brand-ramp';
import { BrandMark } from './brand-mark';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'center',
    backgroundColor: tokens.colorNeutralBackground2,
    borderTop: `3px solid ${emberAccent}`,
    boxSizing: 'border-box',
    padding: `${tokens.spacingVerticalXXXL} ${tokens.spacingHorizontalL}`,
  },
  identity: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    marginBottom: tokens.spacingVerticalXL,
  },
  productName: { color: tokens.colorBrandForeground1 },
  networkName: { color: tokens.colorNeutralForeground2 },
  main: {
    width: '100%',
    maxWidth: '420px',
    boxSizing: 'border-box',
    padding: tokens.spacingHorizontalXL,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
    backgroundColor: tokens.colorNeutralBackground1,
    ':focus': { outline: 'none' },
  },
});

export interface PublicFrameProps {
  productName: string;
  networkName: string;
  children: ReactNode;
}

/** The quiet frame of the pages used without a session: sign-in, password links, invitations. */
export function PublicFrame({ productName, networkName, children }: PublicFrameProps) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <header className={styles.identity}>
        <BrandMark size={24} />
        <Text size={500} weight="semibold" className={styles.productName}>
          {productName}
        </Text>
        <Text size={300} className={styles.networkName}>
          {networkName}
        </Text>
      </header>
      <main className={styles.main}>{children}</main>
    </div>
  );
}
