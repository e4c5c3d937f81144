import { parseTraceReference, type TraceMeasure } from '@tallyloom/core';
import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { NewFindingButton } from '@/features/findings/components/new-finding-button';
import { isTraceMeasure } from '@/features/trace/components/measure-labels';
import { TraceView } from '@/features/trace/components/trace-view';
import { useQueryInUrl } from '@/hooks/use-query-in-url';

function parseMeasure(params: URLSearchParams): TraceMeasure | null {
  const measure = params.get('measure');
  return isTraceMeasure(measure) ? measure : null;
}

function measureSearchParams(measure: TraceMeasure | null): URLSearchParams {
  return new URLSearchParams(measure ? { measure } : {});
}

const DESCRIPTION =
  'A reported figure, the approved tally revisions it is built from, and their parcels and scans.';

/** The trace of one figure, at a stable address (`/trace/:reference?measure=`). */
export function TraceRoute() {
  const reference = useParams().reference ?? '';
  const [measure, changeMeasure] = useQueryInUrl(parseMeasure, measureSearchParams);
  if (!parseTraceReference(reference)) {
    return (
      <>
        <PageHeader title="Trace a figure" description={DESCRIPTION} />
        <ErrorState
          title="This address names no figure that can be traced"
          error={
            new Error(
              "A trace reference looks like 'network:FY2026', 'region:3:2026-Q1' or 'chapter:12:2025-07'. Open a trace from a figure on a dashboard or an impact pack row.",
            )
          }
        />
      </>
    );
  }
  return (
    <>
      <PageHeader
        title="Trace a figure"
        description={DESCRIPTION}
        actions={
          <NewFindingButton link={{ kind: 'trace', reference }} onCreated={() => undefined} />
        }
      />
      <TraceView reference={reference} measure={measure} onMeasureChange={changeMeasure} />
    </>
  );
}
