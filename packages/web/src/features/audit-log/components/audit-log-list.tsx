import { Button } from '@fluentui/react-components';
import { History20Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useAuditLog } from '../api/get-audit-log';
import {
  AuditLogFilters,
  isFiltered,
  noAuditLogFilters,
  type AuditLogFilterValues,
} from './audit-log-filters';
import { AuditLogTable } from './audit-log-table';

export const AUDIT_LOG_PAGE_SIZE = 50;

const headingId = 'audit-log-heading';

/** What the list shows: a page (from 1) and the filters. The page keeps these in its URL. */
export interface AuditLogQuery extends AuditLogFilterValues {
  page: number;
}

export interface AuditLogListProps {
  query: AuditLogQuery;
  onQueryChange: (query: AuditLogQuery) => void;
}

export function filtersOf(query: AuditLogQuery): AuditLogFilterValues {
  return {
    who: query.who,
    what: query.what,
    entityType: query.entityType,
    entityId: query.entityId,
    from: query.from,
    to: query.to,
  };
}

/** Every recorded write, newest first, a page at a time. */
export function AuditLogList({ query, onQueryChange }: AuditLogListProps) {
  const filters = filtersOf(query);
  const log = useAuditLog({ ...filters, page: query.page, pageSize: AUDIT_LOG_PAGE_SIZE });

  let body;
  if (log.isPending) {
    body = <LoadingState label="Loading the audit log…" />;
  } else if (log.isError) {
    body = (
      <ErrorState
        title="The audit log could not be loaded"
        error={log.error}
        onRetry={() => void log.refetch()}
        retrying={log.isFetching}
        headingLevel={3}
      />
    );
  } else if (log.data.items.length === 0) {
    body =
      log.data.total > 0 ? (
        <EmptyState
          title={`Nothing on page ${query.page}`}
          headingLevel={3}
          action={<Button onClick={() => onQueryChange({ ...query, page: 1 })}>First page</Button>}
        >
          The list is shorter than that now.
        </EmptyState>
      ) : isFiltered(filters) ? (
        <EmptyState
          title="No entries match"
          headingLevel={3}
          action={
            <Button onClick={() => onQueryChange({ ...noAuditLogFilters, page: 1 })}>
              Clear filters
            </Button>
          }
        >
          No entry fits these filters together. Widen the dates, shorten the action, or clear the
          filters.
        </EmptyState>
      ) : (
        <EmptyState title="Nothing recorded yet" icon={<History20Regular />} headingLevel={3}>
          Every change anyone makes is recorded here as it happens.
        </EmptyState>
      );
  } else {
    body = (
      <div aria-busy={log.isPlaceholderData}>
        <AuditLogTable
          entries={log.data.items}
          labelledBy={headingId}
          pagination={{
            pageIndex: log.data.page - 1,
            pageSize: AUDIT_LOG_PAGE_SIZE,
            rowCount: log.data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'audit entries',
          }}
        />
      </div>
    );
  }

  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Entries, newest first</SectionHeading>
      <AuditLogFilters
        key={JSON.stringify(filters)}
        values={filters}
        onChange={(next) => onQueryChange({ ...next, page: 1 })}
      />
      {body}
    </section>
  );
}
