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
  /** Chapter-months of the period with no tally filed yet (open or missing). */
  unfiled: number;
}

/** When the figures were built, what they leave out, and what they are (BRIEF §8). */
export function DashboardNotes({ asOf, pendingTallies, unfiled }: DashboardNotesProps) {
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
      {unfiled > 0 ? (
        <Text as="p" className={mergeClasses(styles.line, styles.pending)}>
          <Info16Regular aria-hidden="true" />
          {unfiled === 1 ? '1 chapter has' : `${formatCount(unfiled)} chapter-months have`} not
          filed for this period yet: the change against the previous period may be understated.
        </Text>
      ) : null}
      <Text as="p" className={styles.line}>
        Figures for funders are estimates built from volunteer reports.
      </Text>
    </div>
  );
}
