import { makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';
import { Info16Regular } from '@fluentui/react-icons';
import { formatCount, formatDateTime } from '@/lib/format';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    marginBottom: tokens.spacingVerticalL,
    color: tokens.colorNeutralForeground2,
  },
  line: { display: 'flex', gap: tokens.spacingHorizontalXS, alignItems: 'center', margin: 0 },
  pending: { color: tokens.colorPaletteMarigoldForeground2 },
});

export interface DashboardNotesProps {
  asOf: string;
  pendingTallies: number;
}

/** When the figures were built, what they leave out, and what they are (BRIEF §8). */
export function DashboardNotes({ asOf, pendingTallies }: DashboardNotesProps) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <Text as="p" className={styles.line}>
        As of {formatDateTime(asOf)}.
      </Text>
      {pendingTallies > 0 ? (
        <Text as="p" className={mergeClasses(styles.line, styles.pending)}>
          <Info16Regular aria-hidden="true" />
          {pendingTallies === 1
            ? '1 tally awaiting approval is not included.'
            : `${formatCount(pendingTallies)} tallies awaiting approval are not included.`}
        </Text>
      ) : null}
      <Text as="p" className={styles.line}>
        Figures for funders are estimates built from volunteer reports.
      </Text>
    </div>
  );
}
