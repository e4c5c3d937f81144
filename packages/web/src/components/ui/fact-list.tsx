import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  list: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr',
    columnGap: tokens.spacingHorizontalL,
    rowGap: tokens.spacingVerticalXS,
    margin: 0,
  },
  row: { display: 'contents' },
  term: { color: tokens.colorNeutralForeground2 },
  detail: { margin: 0, overflowWrap: 'anywhere' },
});

/** Terms and what they are, in two aligned columns: "Version  10.11", "Role  Auditor". */
export function FactList({
  rows,
  className,
}: {
  rows: Array<[string, ReactNode]>;
  className?: string;
}) {
  const styles = useStyles();
  return (
    <dl className={mergeClasses(styles.list, className)}>
      {rows.map(([term, detail]) => (
        <div key={term} className={styles.row}>
          <dt className={styles.term}>{term}</dt>
          <dd className={styles.detail}>{detail}</dd>
        </div>
      ))}
    </dl>
  );
}
