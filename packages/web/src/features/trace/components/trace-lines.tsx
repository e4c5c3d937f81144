import {
  Button,
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import { ChevronDown20Regular, ChevronRight20Regular } from '@fluentui/react-icons';
import type { TraceMeasure, TraceTallyLine } from '@tallyloom/core';
import { Fragment, useState } from 'react';
import { PaginationBar } from '@/components/ui/pagination-bar';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { formatDateTime, formatFigure, formatMonthYear } from '@/lib/format';
import { TRACE_MEASURE_LABELS } from './measure-labels';
import { TraceLineDetail } from './trace-line-detail';

// A network fiscal year can hold thousands of tallies: a page at a time keeps the page light.
export const TRACE_PAGE_SIZE = 50;

const useStyles = makeStyles({
  headerRow: { backgroundColor: tokens.colorNeutralBackground2 },
  headerCell: { fontWeight: tokens.fontWeightSemibold, whiteSpace: 'nowrap' },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  numericHeader: { justifyContent: 'flex-end' },
  expand: { width: '44px' },
  detailCell: { padding: 0 },
  // Names the column for screen readers; the buttons say what they open.
  visuallyHidden: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    overflow: 'hidden',
    clip: 'rect(0 0 0 0)',
    whiteSpace: 'nowrap',
  },
});

export interface TraceLinesProps {
  lines: TraceTallyLine[];
  /** The measure traced, or null when every measure is. */
  measure: TraceMeasure | null;
  labelledBy: string;
}

/** The approved tally revisions behind the figure, each opening onto its amendments and receipts. */
export function TraceLines({ lines, measure, labelledBy }: TraceLinesProps) {
  const styles = useStyles();
  const [pageIndex, setPageIndex] = useState(0);
  const [open, setOpen] = useState<ReadonlySet<number>>(new Set());
  const pageCount = Math.max(1, Math.ceil(lines.length / TRACE_PAGE_SIZE));
  const page = Math.min(pageIndex, pageCount - 1);
  const shown = lines.slice(page * TRACE_PAGE_SIZE, (page + 1) * TRACE_PAGE_SIZE);
  const columns = measure ? 10 : 9;

  const toggle = (tallyId: number) =>
    setOpen((current) => {
      const next = new Set(current);
      if (next.has(tallyId)) next.delete(tallyId);
      else next.add(tallyId);
      return next;
    });

  return (
    <>
      <Table size="small" aria-labelledby={labelledBy}>
        <TableHeader>
          <TableRow className={styles.headerRow}>
            <TableHeaderCell className={styles.expand}>
              <span className={styles.visuallyHidden}>Details</span>
            </TableHeaderCell>
            <TableHeaderCell className={styles.headerCell}>Chapter</TableHeaderCell>
            <TableHeaderCell className={styles.headerCell}>Region</TableHeaderCell>
            <TableHeaderCell className={styles.headerCell}>Month</TableHeaderCell>
            <TableHeaderCell className={styles.headerCell}>Revision</TableHeaderCell>
            <TableHeaderCell className={styles.headerCell}>Approved by</TableHeaderCell>
            <TableHeaderCell className={styles.headerCell}>Approved</TableHeaderCell>
            {measure ? (
              <TableHeaderCell
                className={styles.headerCell}
                button={{ className: styles.numericHeader }}
              >
                {TRACE_MEASURE_LABELS[measure]}
              </TableHeaderCell>
            ) : null}
            <TableHeaderCell
              className={styles.headerCell}
              button={{ className: styles.numericHeader }}
            >
              Receipts
            </TableHeaderCell>
            <TableHeaderCell
              className={styles.headerCell}
              button={{ className: styles.numericHeader }}
            >
              Scans
            </TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {shown.map((line) => {
            const expanded = open.has(line.tallyId);
            const name = `${line.chapterName}, ${formatMonthYear(`${line.month}-01`)}`;
            const value = measure ? line.value[measure] : undefined;
            return (
              <Fragment key={line.tallyId}>
                <TableRow>
                  <TableCell>
                    <Button
                      size="small"
                      appearance="subtle"
                      icon={expanded ? <ChevronDown20Regular /> : <ChevronRight20Regular />}
                      aria-expanded={expanded}
                      aria-label={`${expanded ? 'Hide' : 'Show'} amendments and receipts of ${name}`}
                      onClick={() => toggle(line.tallyId)}
                    />
                  </TableCell>
                  <TableCell>
                    <RouterLink to={paths.tally.getHref(line.tallyId)}>
                      {line.chapterName}
                    </RouterLink>
                  </TableCell>
                  <TableCell>{line.regionName}</TableCell>
                  <TableCell>{formatMonthYear(`${line.month}-01`)}</TableCell>
                  <TableCell>
                    {line.revision}
                    {line.amendments.length ? ' (amended)' : ''}
                  </TableCell>
                  <TableCell>{line.approvedBy ?? 'Unknown'}</TableCell>
                  <TableCell>{formatDateTime(line.approvedAt, 'Unknown')}</TableCell>
                  {measure ? (
                    <TableCell className={styles.numeric}>
                      {value === undefined ? '—' : formatFigure(value)}
                    </TableCell>
                  ) : null}
                  <TableCell className={styles.numeric}>{line.receipts.length}</TableCell>
                  <TableCell className={styles.numeric}>
                    {line.receipts.reduce((sum, receipt) => sum + receipt.scanCount, 0)}
                  </TableCell>
                </TableRow>
                {expanded ? (
                  <TableRow>
                    <TableCell colSpan={columns} className={styles.detailCell}>
                      <TraceLineDetail line={line} />
                    </TableCell>
                  </TableRow>
                ) : null}
              </Fragment>
            );
          })}
        </TableBody>
      </Table>
      {lines.length > TRACE_PAGE_SIZE ? (
        <PaginationBar
          pageIndex={page}
          pageSize={TRACE_PAGE_SIZE}
          total={lines.length}
          canPrevious={page > 0}
          canNext={page < pageCount - 1}
          onPrevious={() => setPageIndex(page - 1)}
          onNext={() => setPageIndex(page + 1)}
          label="tally revisions"
        />
      ) : null}
    </>
  );
}
