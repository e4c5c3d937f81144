import {
  FINDING_SEVERITIES,
  FINDING_STATUSES,
  type FindingSeverity,
  type FindingStatus,
} from '@tallyloom/core';
import { PageHeader } from '@/components/ui/page-header';
import { FindingsList, type FindingsQuery } from '@/features/findings/components/findings-list';
import { NewFindingButton } from '@/features/findings/components/new-finding-button';
import { useQueryInUrl } from '@/hooks/use-query-in-url';

function oneOf<T extends string>(options: readonly T[], value: string | null): T | undefined {
  return (options as readonly string[]).includes(value ?? '') ? (value as T) : undefined;
}

/** The page and filters live in the URL, so a filtered list can be bookmarked or shared. */
function parseQuery(params: URLSearchParams): FindingsQuery {
  const page = Number(params.get('page'));
  return {
    page: Number.isInteger(page) && page > 0 ? page : 1,
    status: oneOf<FindingStatus>(FINDING_STATUSES, params.get('status')),
    severity: oneOf<FindingSeverity>(FINDING_SEVERITIES, params.get('severity')),
  };
}

function toSearchParams(query: FindingsQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (query.page > 1) params.set('page', String(query.page));
  if (query.status) params.set('status', query.status);
  if (query.severity) params.set('severity', query.severity);
  return params;
}

/** Audit findings and how far each has come. Loaded on demand. */
export function FindingsRoute() {
  const [query, changeQuery] = useQueryInUrl(parseQuery, toSearchParams);
  return (
    <>
      <PageHeader
        title="Findings"
        description="What auditors found while tracing figures and checking samples, and the network's responses."
        actions={<NewFindingButton appearance="primary" />}
      />
      <FindingsList
        query={query}
        onQueryChange={changeQuery}
        firstFindingAction={<NewFindingButton label="Record the first finding" />}
      />
    </>
  );
}
