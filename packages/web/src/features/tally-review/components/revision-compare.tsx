import {
  Badge,
  Field,
  makeStyles,
  mergeClasses,
  Select,
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
  TALLY_STATE_LABELS,
  type TallyDetail,
  type TallyRevisionState,
  type TallyRevisionSummary,
} from '@tallyloom/core';
import { Fragment, type ReactNode } from 'react';
import { ErrorState } from '@/components/ui/error-state';
import { FactList } from '@/components/ui/fact-list';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useTallyRevision } from '@/features/tallies/api';
import { formatDateTime, formatFigure } from '@/lib/format';
import { compareRows, type CompareRow } from './compare-rows';
import { TALLY_SECTION_LABELS, type TallySection } from './tally-fields';
import { tallyNamesOf } from './tally-names';
import type { RevisionPair } from './revision-choice';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  pickers: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM },
  select: { minWidth: '240px' },
  sides: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(300px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
  },
  side: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  quoted: { whiteSpace: 'pre-wrap' },
  sectionRow: { backgroundColor: tokens.colorNeutralBackground3 },
  sectionCell: { fontWeight: tokens.fontWeightSemibold },
  headerRow: { backgroundColor: tokens.colorNeutralBackground2 },
  changedRow: {
    backgroundColor: tokens.colorPaletteYellowBackground1,
    // The highlight is also an edge, so it does not rest on the tint alone.
    boxShadow: `inset 3px 0 0 ${tokens.colorPaletteMarigoldBorderActive}`,
  },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  text: { whiteSpace: 'pre-wrap' },
  absent: { color: tokens.colorNeutralForeground3 },
  summary: { margin: 0 },
});

const REVISION_STATE_LABELS: Record<TallyRevisionState, string> = {
  ...TALLY_STATE_LABELS,
  superseded: 'Superseded by a later approval',
};

function revisionOption(revision: TallyRevisionSummary): string {
  return `Revision ${revision.revision} · ${REVISION_STATE_LABELS[revision.state]}`;
}

function byWhom(at: string | null, name: string | null): string {
  if (!at) return 'Not yet';
  return name ? `${formatDateTime(at)} by ${name}` : formatDateTime(at);
}

function RevisionFacts({ revision, id }: { revision: TallyRevisionSummary; id: string }) {
  const styles = useStyles();
  return (
    <section aria-labelledby={id} className={styles.side}>
      <SectionHeading id={id}>Revision {revision.revision}</SectionHeading>
      <FactList
        rows={[
          ['State', REVISION_STATE_LABELS[revision.state]],
          [
            'Amendment reason',
            revision.amendmentReason ? (
              <span className={styles.quoted}>“{revision.amendmentReason}”</span>
            ) : (
              'None (the first filing)'
            ),
          ],
          ['Started', byWhom(revision.createdAt, revision.createdByName)],
          ['Submitted', byWhom(revision.submittedAt, revision.submittedByName)],
          ['Approved', byWhom(revision.approvedAt, revision.approvedByName)],
        ]}
      />
    </section>
  );
}

function Value({ row, side }: { row: CompareRow; side: 'left' | 'right' }) {
  const styles = useStyles();
  const value = row[side];
  if (value === null) return <span className={styles.absent}>—</span>;
  if (typeof value === 'number') return <>{formatFigure(value)}</>;
  return <span className={styles.text}>{value}</span>;
}

function CompareTable({
  rows,
  pair,
  labelledBy,
}: {
  rows: CompareRow[];
  pair: RevisionPair;
  labelledBy: string;
}) {
  const styles = useStyles();
  const sections = [...new Set(rows.map((row) => row.section))] as TallySection[];
  return (
    <Table size="small" aria-labelledby={labelledBy}>
      <TableHeader>
        <TableRow className={styles.headerRow}>
          <TableHeaderCell>Figure</TableHeaderCell>
          <TableHeaderCell>Revision {pair.left}</TableHeaderCell>
          <TableHeaderCell>Revision {pair.right}</TableHeaderCell>
          <TableHeaderCell>Difference</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {sections.map((section) => (
          <Fragment key={section}>
            <TableRow className={styles.sectionRow}>
              <TableCell colSpan={4} className={styles.sectionCell}>
                {TALLY_SECTION_LABELS[section]}
              </TableCell>
            </TableRow>
            {rows
              .filter((row) => row.section === section)
              .map((row) => (
                <TableRow
                  key={row.field}
                  data-changed={row.changed || undefined}
                  className={mergeClasses(row.changed && styles.changedRow)}
                >
                  <TableCell>{row.label}</TableCell>
                  <TableCell className={row.kind === 'count' ? styles.numeric : undefined}>
                    <Value row={row} side="left" />
                  </TableCell>
                  <TableCell className={row.kind === 'count' ? styles.numeric : undefined}>
                    <Value row={row} side="right" />
                  </TableCell>
                  <TableCell>
                    {row.changed ? (
                      <Badge appearance="tint" color="warning" size="small">
                        Changed
                      </Badge>
                    ) : null}
                  </TableCell>
                </TableRow>
              ))}
          </Fragment>
        ))}
      </TableBody>
    </Table>
  );
}

export interface RevisionCompareProps {
  tally: TallyDetail;
  pair: RevisionPair;
  onPairChange: (pair: RevisionPair) => void;
}

/** Two revisions of a tally side by side: who made and approved each, and every figure. */
export function RevisionCompare({ tally, pair, onPairChange }: RevisionCompareProps) {
  const styles = useStyles();
  const left = useTallyRevision(tally.id, pair.left);
  const right = useTallyRevision(tally.id, pair.right);
  const revisions = [...tally.revisions].sort((a, b) => b.revision - a.revision);
  const summaryOf = (number: number) => revisions.find((r) => r.revision === number);
  const leftSummary = summaryOf(pair.left);
  const rightSummary = summaryOf(pair.right);

  const picker = (label: string, side: keyof RevisionPair) => (
    <Field label={label} className={styles.select}>
      <Select
        value={String(pair[side])}
        onChange={(_event, data) => onPairChange({ ...pair, [side]: Number(data.value) })}
      >
        {revisions.map((revision) => (
          <option key={revision.revision} value={revision.revision}>
            {revisionOption(revision)}
          </option>
        ))}
      </Select>
    </Field>
  );

  let figures: ReactNode;
  if (left.isPending || right.isPending) {
    figures = <LoadingState label="Loading the two revisions…" />;
  } else if (left.isError || right.isError) {
    figures = (
      <ErrorState
        title="A revision could not be loaded"
        error={left.error ?? right.error}
        onRetry={() => {
          if (left.isError) void left.refetch();
          if (right.isError) void right.refetch();
        }}
        retrying={left.isFetching || right.isFetching}
        headingLevel={3}
      />
    );
  } else {
    const rows = compareRows(left.data.values, right.data.values, tallyNamesOf(tally));
    const changes = rows.filter((row) => row.changed).length;
    figures = (
      <>
        <Text as="p" className={styles.summary} aria-live="polite">
          {pair.left === pair.right
            ? 'The same revision is on both sides: choose another to see what changed.'
            : changes === 0
              ? 'The two revisions have the same figures.'
              : `${changes} ${changes === 1 ? 'figure differs' : 'figures differ'}, highlighted below.`}
        </Text>
        <CompareTable rows={rows} pair={pair} labelledBy="compare-figures" />
      </>
    );
  }

  return (
    <div className={styles.root}>
      <div className={styles.pickers} role="group" aria-label="Revisions to compare">
        {picker('Left column', 'left')}
        {picker('Right column', 'right')}
      </div>
      <div className={styles.sides}>
        {leftSummary ? <RevisionFacts revision={leftSummary} id="compare-left" /> : null}
        {rightSummary && pair.right !== pair.left ? (
          <RevisionFacts revision={rightSummary} id="compare-right" />
        ) : null}
      </div>
      <section aria-labelledby="compare-figures" className={styles.side}>
        <SectionHeading id="compare-figures">Figures side by side</SectionHeading>
        {figures}
      </section>
    </div>
  );
}
