import {
  Badge,
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import { TRACE_MEASURES, type TraceView } from '@tallyloom/core';
import { formatFigure } from '@/lib/format';
import { TRACE_MEASURE_LABELS } from './measure-labels';

const useStyles = makeStyles({
  table: { maxWidth: '640px' },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  numericHeader: { justifyContent: 'flex-end' },
  headerRow: { backgroundColor: tokens.colorNeutralBackground2 },
});

/** True or false for one measure: the stored figure against the sum re-added from the lines. */
function agreesOn(figure: number | undefined, recomputed: number | undefined): boolean {
  return figure !== undefined && recomputed !== undefined && figure === recomputed;
}

/** Agrees or does not: the one verdict of the trace, in words and colour. */
export function AgreementBadge({ agrees }: { agrees: boolean }) {
  return agrees ? (
    <Badge appearance="filled" color="success" size="large">
      Agrees
    </Badge>
  ) : (
    <Badge appearance="filled" color="danger" size="large">
      Does not agree
    </Badge>
  );
}

/** The figure shown on the dashboard beside the same measure re-added from the tallies below. */
export function TraceFigures({ trace, labelledBy }: { trace: TraceView; labelledBy: string }) {
  const styles = useStyles();
  const measures = TRACE_MEASURES.filter((measure) => trace.figure[measure] !== undefined);
  return (
    <Table size="small" aria-labelledby={labelledBy} className={styles.table}>
      <TableHeader>
        <TableRow className={styles.headerRow}>
          <TableHeaderCell>Measure</TableHeaderCell>
          <TableHeaderCell button={{ className: styles.numericHeader }}>
            Reported figure
          </TableHeaderCell>
          <TableHeaderCell button={{ className: styles.numericHeader }}>
            Re-added from tallies
          </TableHeaderCell>
          <TableHeaderCell>Check</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {measures.map((measure) => {
          const figure = trace.figure[measure];
          const recomputed = trace.recomputed[measure];
          return (
            <TableRow key={measure}>
              <TableCell>{TRACE_MEASURE_LABELS[measure]}</TableCell>
              <TableCell className={styles.numeric}>
                {figure === undefined ? '—' : formatFigure(figure)}
              </TableCell>
              <TableCell className={styles.numeric}>
                {recomputed === undefined ? '—' : formatFigure(recomputed)}
              </TableCell>
              <TableCell>
                {agreesOn(figure, recomputed) ? 'Matches' : <strong>Differs</strong>}
              </TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
