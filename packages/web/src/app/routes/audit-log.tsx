import { Button, Spinner } from '@fluentui/react-components';
import { ArrowDownload20Regular } from '@fluentui/react-icons';
import { can } from '@tallyloom/core';
import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { useExportAuditLog } from '@/features/audit-log/api/export-audit-log';
import {
  AuditLogList,
  filtersOf,
  type AuditLogQuery,
} from '@/features/audit-log/components/audit-log-list';
import { VerifyChainPanel } from '@/features/audit-log/components/verify-chain-panel';
import { useQueryInUrl } from '@/hooks/use-query-in-url';
import { useSessionUser } from '@/lib/session/use-session';

const isoDate = /^\d{4}-\d{2}-\d{2}$/;
const TEXT_FILTERS = ['who', 'what', 'entityType', 'entityId'] as const;

function dateParam(value: string | null): string {
  return value && isoDate.test(value) ? value : '';
}

/** The log's page and filters live in the URL, so a view can be bookmarked or pasted into a finding. */
function parseQuery(params: URLSearchParams): AuditLogQuery {
  const page = Number(params.get('page'));
  return {
    page: Number.isInteger(page) && page > 0 ? page : 1,
    who: params.get('who') ?? '',
    what: params.get('what') ?? '',
    entityType: params.get('entityType') ?? '',
    entityId: params.get('entityId') ?? '',
    from: dateParam(params.get('from')),
    to: dateParam(params.get('to')),
  };
}

function toSearchParams(query: AuditLogQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (query.page > 1) params.set('page', String(query.page));
  for (const field of TEXT_FILTERS) if (query[field]) params.set(field, query[field]);
  if (query.from) params.set('from', query.from);
  if (query.to) params.set('to', query.to);
  return params;
}

/** Every recorded write, with the hash chain's check and the xlsx export. Admins and auditors. */
export function AuditLogRoute() {
  const [query, changeQuery] = useQueryInUrl(parseQuery, toSearchParams);
  const user = useSessionUser();
  const exporting = useExportAuditLog();

  return (
    <>
      <PageHeader
        title="Audit log"
        description="Every change anyone made, who made it and when. Each entry is sealed onto a hash chain, so a change behind the application's back shows when the chain is verified."
        actions={
          <Button
            icon={exporting.isPending ? <Spinner size="tiny" /> : <ArrowDownload20Regular />}
            disabledFocusable={exporting.isPending}
            onClick={() => exporting.mutate(filtersOf(query))}
          >
            {exporting.isPending ? 'Exporting…' : 'Export to xlsx'}
          </Button>
        }
      />
      {exporting.isError && (
        <ErrorState title="The export could not be made" error={exporting.error} headingLevel={2} />
      )}
      <VerifyChainPanel mayVerify={can(user?.role, 'audit.verify')} />
      <AuditLogList query={query} onQueryChange={changeQuery} />
    </>
  );
}
