import { Field, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import { TRACE_MEASURES, type TraceMeasure, type TraceView as Trace } from '@tallyloom/core';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FactList } from '@/components/ui/fact-list';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { ApiError } from '@/lib/api-client';
import { formatCount, formatDateTime } from '@/lib/format';
import { useTrace } from '../api/get-trace';
import { CopyTraceLink } from './copy-trace-link';
import { isTraceMeasure, TRACE_MEASURE_LABELS } from './measure-labels';
import { AgreementBadge, TraceFigures } from './trace-figures';
import { TraceLines } from './trace-lines';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  top: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'flex-start',
  },
  verdict: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM },
  picker: { maxWidth: '280px' },
  muted: { color: tokens.colorNeutralForeground2 },
});

const SCOPE_WORDS: Record<Trace['scope'], string> = {
  network: 'Network',
  region: 'Region',
  chapter: 'Chapter',
};

/** The trace's failures in the reader's words: out of scope and a bad reference are not outages. */
function failureTitle(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.statusCode === 404)
      return 'Nothing to trace here: outside your scope, or no report built';
    if (error.statusCode === 400) return 'This address names no figure that can be traced';
    if (error.statusCode === 403)
      return 'Your role sees aggregates only, not the tallies behind them';
  }
  return 'The trace could not be loaded';
}

export interface TraceViewProps {
  reference: string;
  measure: TraceMeasure | null;
  onMeasureChange: (measure: TraceMeasure | null) => void;
}

/** A figure, the same figure re-added from its tallies, and the tallies, receipts and scans. */
export function TraceView({ reference, measure, onMeasureChange }: TraceViewProps) {
  const styles = useStyles();
  const trace = useTrace(reference, measure);

  const picker = (
    <Field label="Measure" className={styles.picker}>
      <Select
        value={measure ?? ''}
        onChange={(_event, data) => onMeasureChange(isTraceMeasure(data.value) ? data.value : null)}
      >
        <option value="">All measures</option>
        {TRACE_MEASURES.map((each) => (
          <option key={each} value={each}>
            {TRACE_MEASURE_LABELS[each]}
          </option>
        ))}
      </Select>
    </Field>
  );

  if (trace.isPending) {
    return (
      <div className={styles.root}>
        {picker}
        <LoadingState label="Re-adding the figure from its tallies…" />
      </div>
    );
  }
  if (trace.isError) {
    return (
      <div className={styles.root}>
        {picker}
        <ErrorState
          title={failureTitle(trace.error)}
          error={trace.error}
          onRetry={() => void trace.refetch()}
          retrying={trace.isFetching}
        />
      </div>
    );
  }

  const view = trace.data;
  return (
    <div className={styles.root}>
      <div className={styles.top}>
        <FactList
          rows={[
            [SCOPE_WORDS[view.scope], view.scopeName],
            ['Period', view.period.label],
            ['Measure', view.measure ? TRACE_MEASURE_LABELS[view.measure] : 'All measures'],
            ['Report as of', formatDateTime(view.asOf)],
            ['Reference', view.reference],
          ]}
        />
        <div className={styles.verdict}>
          <AgreementBadge agrees={view.agrees} />
          <Text className={styles.muted}>
            {view.agrees
              ? `Re-adding the ${formatCount(view.tallies.length)} approved tally revisions gives the reported figure.`
              : 'Re-adding the approved tally revisions gives a different figure: raise a finding.'}
          </Text>
        </div>
      </div>
      {picker}
      <CopyTraceLink reference={view.reference} measure={view.measure} />

      <section aria-labelledby="trace-figures">
        <SectionHeading id="trace-figures">Figure and re-added total</SectionHeading>
        <TraceFigures trace={view} labelledBy="trace-figures" />
      </section>

      <section aria-labelledby="trace-lines">
        <SectionHeading id="trace-lines">
          {`Approved tally revisions (${formatCount(view.tallies.length)})`}
        </SectionHeading>
        {view.tallies.length === 0 ? (
          <EmptyState title="No approved tallies behind this figure" headingLevel={3}>
            No chapter in this scope had an approved tally in {view.period.label}, so the figure is
            zero. Choose another period from the dashboard.
          </EmptyState>
        ) : (
          <TraceLines lines={view.tallies} measure={view.measure} labelledBy="trace-lines" />
        )}
      </section>
    </div>
  );
}
