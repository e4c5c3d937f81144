import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { appConfig } from '@/config/app-config';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalL,
  },
  titles: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  title: { margin: 0 },
  description: { color: tokens.colorNeutralForeground2, margin: 0 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, alignItems: 'center' },
});

export interface PageHeaderProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}

/** The page's one h1, and the browser tab's title to match. */
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      {/* React 19 hoists <title> into <head>. */}
      <title>{`${title} · ${appConfig.productName}`}</title>
      <div className={styles.titles}>
        <Text as="h1" size={600} weight="semibold" className={styles.title}>
          {title}
        </Text>
        {description ? (
          <Text as="p" size={300} className={styles.description}>
            {description}
          </Text>
        ) : null}
      </div>
      {actions ? <div className={styles.actions}>{actions}</div> : null}
    </div>
  );
}
