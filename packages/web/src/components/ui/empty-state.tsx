import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-start',
    padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalL}`,
    border: `1px dashed ${tokens.colorNeutralStroke1}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
    maxWidth: '60ch',
  },
  icon: { color: tokens.colorBrandForeground1, fontSize: '24px', flexShrink: 0 },
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  title: { margin: 0 },
  text: { margin: 0, color: tokens.colorNeutralForeground2 },
});

export interface EmptyStateProps {
  title: string;
  /** What to do first, in a sentence or two. */
  children: ReactNode;
  icon?: ReactNode;
  action?: ReactNode;
  /** Keeps the outline of the page in order: 2 directly under the h1, 3 inside a section. */
  headingLevel?: 2 | 3;
}

export function EmptyState({ title, children, icon, action, headingLevel = 2 }: EmptyStateProps) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      {icon ? <span className={styles.icon}>{icon}</span> : null}
      <div className={styles.body}>
        <Text as={`h${headingLevel}`} size={400} weight="semibold" className={styles.title}>
          {title}
        </Text>
        <Text as="p" className={styles.text}>
          {children}
        </Text>
        {action ? <div>{action}</div> : null}
      </div>
    </div>
  );
}
