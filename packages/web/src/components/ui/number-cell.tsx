import { makeStyles, mergeClasses } from '@fluentui/react-components';
import { formatCount } from '@/lib/format';

const useStyles = makeStyles({
  root: {
    display: 'block',
    textAlign: 'end',
    // Digits of equal width line up down the column.
    fontVariantNumeric: 'tabular-nums',
  },
});

/** A count, right-aligned with thousands separators. */
export function NumberCell({ value, className }: { value: number; className?: string }) {
  const styles = useStyles();
  return <span className={mergeClasses(styles.root, className)}>{formatCount(value)}</span>;
}
