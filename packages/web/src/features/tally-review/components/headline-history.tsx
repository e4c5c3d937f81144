import { Badge, makeStyles, Text, tokens } from '@fluentui/react-components';
import { createColumnHelper } from '@tanstack/react-table';
import {
  HEADLINE_COUNT_LABELS,
  HEADLINE_COUNTS,
  headlineCountsOf,
  MODIFIED_Z_THRESHOLD,
  type HeadlineCount,
  type PlausibilityScore,
  type TallyDetail,
} from '@tallyloom/core';
import { useMemo } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { formatFigure } from '@/lib/format';
import { HistorySparkline } from './history-sparkline';
import { SPARKLINE_COLOURS } from './sparkline-option';

const useStyles = makeStyles({
  legend: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalL,
    margin: `0 0 ${tokens.spacingVerticalS}`,
    color: tokens.colorNeutralForeground2,
  },
  key: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  line: { display: 'inline-block', width: '18px', height: '2px' },
  dot: { display: 'inline-block', width: '8px', height: '8px', borderRadius: '50%' },
  number: { fontVariantNumeric: 'tabular-nums' },
  score: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    justifyContent: 'flex-end',
    width: '100%',
  },
  quiet: { color: tokens.colorNeutralForeground2 },
});

interface HeadlineRow {
  count: HeadlineCount;
  label: string;
  value: number;
  score: PlausibilityScore | undefined;
  history: Array<{ month: string; value: number }>;
}

const column = createColumnHelper<HeadlineRow>();

function ScoreCell({ score }: { score: PlausibilityScore | undefined }) {
  const styles = useStyles();
  if (!score || score.method === 'too-little-history') {
    return <span className={styles.quiet}>Too little history</span>;
  }
  return (
    <span className={styles.score}>
      {score.flagged ? (
        <Badge appearance="outline" color="warning" size="small">
          Unusual
        </Badge>
      ) : null}
      {score.score === null ? (
        // Every past month had the same figure: there is no spread to score against.
        <span className={styles.quiet}>Same every month</span>
      ) : (
        <span className={styles.number}>{score.score.toFixed(2).replace('-', '−')}</span>
      )}
    </span>
  );
}

/**
 * Each headline count beside the chapter's own approved months: the median, the modified
 * z-score the server computed, and a sparkline with this month marked.
 */
export function HeadlineHistory({ tally, labelledBy }: { tally: TallyDetail; labelledBy: string }) {
  const styles = useStyles();
  const { values, checks, checkContext, month } = tally;

  const rows = useMemo<HeadlineRow[]>(() => {
    const current = headlineCountsOf(values);
    return HEADLINE_COUNTS.map((count) => ({
      count,
      label: HEADLINE_COUNT_LABELS[count],
      value: current[count],
      score: checks.plausibility.find((score) => score.count === count),
      history: checkContext.history.map((point) => ({ month: point.month, value: point[count] })),
    }));
  }, [values, checks.plausibility, checkContext.history]);

  const columns = useMemo(
    () => [
      column.accessor('label', { header: 'Count' }),
      column.accessor('value', {
        header: 'This month',
        meta: { numeric: true },
        cell: (info) => <span className={styles.number}>{formatFigure(info.getValue())}</span>,
      }),
      column.accessor((row) => row.score?.median ?? null, {
        id: 'median',
        header: 'Median before',
        meta: { numeric: true },
        cell: (info) => {
          const median = info.getValue();
          return median === null ? (
            '—'
          ) : (
            <span className={styles.number}>{formatFigure(median)}</span>
          );
        },
      }),
      column.accessor('score', {
        header: 'Modified z-score',
        meta: { numeric: true },
        cell: (info) => <ScoreCell score={info.getValue()} />,
      }),
      column.display({
        id: 'history',
        header: 'Approved months',
        cell: (info) => (
          <HistorySparkline
            label={info.row.original.label}
            month={month}
            value={info.row.original.value}
            history={info.row.original.history}
          />
        ),
      }),
    ],
    [styles, month],
  );

  return (
    <>
      <Text as="p" size={200} className={styles.legend}>
        <span className={styles.key}>
          <span
            className={styles.line}
            style={{ backgroundColor: SPARKLINE_COLOURS.history }}
            aria-hidden="true"
          />
          Line: the chapter’s last {checkContext.history.length} approved months
        </span>
        <span className={styles.key}>
          <span
            className={styles.dot}
            style={{ backgroundColor: SPARKLINE_COLOURS.thisMonth }}
            aria-hidden="true"
          />
          Dot: this tally
        </span>
        <span>Unusual: modified z-score beyond ±{MODIFIED_Z_THRESHOLD}</span>
      </Text>
      <DataTable
        data={rows}
        columns={columns}
        labelledBy={labelledBy}
        getRowId={(row) => row.count}
        enableSorting={false}
      />
    </>
  );
}
