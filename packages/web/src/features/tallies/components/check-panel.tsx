import {
  Link,
  makeStyles,
  mergeClasses,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import {
  CheckmarkCircle16Regular,
  ErrorCircle16Regular,
  Info16Regular,
  Warning16Regular,
} from '@fluentui/react-icons';
import {
  HEADLINE_COUNT_LABELS,
  MODIFIED_Z_THRESHOLD,
  type PlausibilityScore,
  type TallyCheckResult,
  type TallyProblem,
  type TallyProblemSeverity,
} from '@tallyloom/core';
import { formatCount } from '@/lib/format';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    padding: tokens.spacingHorizontalL,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  heading: { margin: 0 },
  summary: { margin: 0, display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  group: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  groupHeading: { margin: 0 },
  list: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  item: { display: 'flex', gap: tokens.spacingHorizontalXS, alignItems: 'flex-start' },
  icon: { flexShrink: 0, marginTop: '2px' },
  error: { color: tokens.colorStatusDangerForeground1 },
  warning: { color: tokens.colorStatusWarningForeground1 },
  info: { color: tokens.colorBrandForeground1 },
  ok: { color: tokens.colorStatusSuccessForeground1 },
  link: { textAlign: 'start' },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  // A header cell lays its text out in an inner box: push that to the right as well.
  numericHead: { justifyContent: 'flex-end' },
  flagged: { fontWeight: tokens.fontWeightSemibold },
  note: { margin: 0, color: tokens.colorNeutralForeground2 },
});

const GROUPS: Array<{
  severity: TallyProblemSeverity;
  title: string;
  key: keyof TallyCheckResult;
}> = [
  { severity: 'error', title: 'Errors (must be fixed before submitting)', key: 'errors' },
  { severity: 'warning', title: 'Warnings (acknowledge with a note to submit)', key: 'warnings' },
  { severity: 'info', title: 'For information', key: 'infos' },
];

function ProblemIcon({ severity }: { severity: TallyProblemSeverity }) {
  const styles = useStyles();
  if (severity === 'error') {
    return <ErrorCircle16Regular className={mergeClasses(styles.icon, styles.error)} aria-hidden />;
  }
  if (severity === 'warning') {
    return <Warning16Regular className={mergeClasses(styles.icon, styles.warning)} aria-hidden />;
  }
  return <Info16Regular className={mergeClasses(styles.icon, styles.info)} aria-hidden />;
}

const score = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

function scoreText(row: PlausibilityScore): string {
  if (row.score === null) return row.method === 'too-little-history' ? 'Too little history' : '—';
  return score.format(row.score).replace('-', '−');
}

function plural(count: number, one: string, many: string) {
  return `${formatCount(count)} ${count === 1 ? one : many}`;
}

export interface CheckPanelProps {
  result: TallyCheckResult;
  /** Puts the cursor in the field a problem is about; returns false when there is none. */
  onShowField: (problem: TallyProblem) => void;
}

/** The tally's checks as they stand for what is typed now, in plain words. */
export function CheckPanel({ result, onShowField }: CheckPanelProps) {
  const styles = useStyles();
  const { errors, warnings } = result;
  const summary =
    errors.length + warnings.length === 0
      ? 'No errors or warnings.'
      : [
          plural(errors.length, 'error', 'errors'),
          plural(warnings.length, 'warning', 'warnings'),
        ].join(', ');

  return (
    <aside className={styles.root} aria-labelledby="tally-checks">
      <Text as="h2" id="tally-checks" size={400} weight="semibold" className={styles.heading}>
        Checks
      </Text>
      <Text as="p" className={styles.summary} aria-live="polite">
        {errors.length + warnings.length === 0 ? (
          <CheckmarkCircle16Regular className={styles.ok} aria-hidden />
        ) : null}
        {summary}
      </Text>
      {GROUPS.map(({ severity, title, key }) => {
        const problems = result[key] as TallyProblem[];
        if (problems.length === 0) return null;
        return (
          <section key={severity} className={styles.group} aria-label={title}>
            <Text as="h3" weight="semibold" className={styles.groupHeading}>
              {title}
            </Text>
            <ul className={styles.list}>
              {problems.map((problem) => (
                <li key={`${problem.code}:${problem.field}`} className={styles.item}>
                  <ProblemIcon severity={severity} />
                  <Link as="button" className={styles.link} onClick={() => onShowField(problem)}>
                    {problem.message}
                  </Link>
                </li>
              ))}
            </ul>
          </section>
        );
      })}
      <Text as="p" className={styles.note}>
        Panels in progress (used, not yet in a finished blanket):{' '}
        <strong>{formatCount(result.panelsInProgress)}</strong>
      </Text>
      <section className={styles.group} aria-labelledby="tally-plausibility">
        <Text as="h3" id="tally-plausibility" weight="semibold" className={styles.groupHeading}>
          Against the chapter&apos;s own history
        </Text>
        <Table size="extra-small" aria-labelledby="tally-plausibility">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Count</TableHeaderCell>
              <TableHeaderCell
                className={styles.numeric}
                button={{ className: styles.numericHead }}
              >
                This month
              </TableHeaderCell>
              <TableHeaderCell
                className={styles.numeric}
                button={{ className: styles.numericHead }}
              >
                Median
              </TableHeaderCell>
              <TableHeaderCell
                className={styles.numeric}
                button={{ className: styles.numericHead }}
              >
                Score
              </TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {result.plausibility.map((row) => (
              <TableRow key={row.count} className={row.flagged ? styles.flagged : undefined}>
                <TableCell>
                  {HEADLINE_COUNT_LABELS[row.count]}
                  {row.flagged ? ' (unusual)' : ''}
                </TableCell>
                <TableCell className={styles.numeric}>{score.format(row.value)}</TableCell>
                <TableCell className={styles.numeric}>
                  {row.median === null ? '—' : score.format(row.median)}
                </TableCell>
                <TableCell className={styles.numeric}>{scoreText(row)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
        <Text as="p" size={200} className={styles.note}>
          The score is the modified z-score against the last 12 approved months; beyond ±
          {MODIFIED_Z_THRESHOLD} a count is unusual and worth a second look.
        </Text>
      </section>
    </aside>
  );
}
