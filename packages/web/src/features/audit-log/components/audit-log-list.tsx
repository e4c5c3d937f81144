import { History20Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/ui/empty-state';
import { PagedListStates } from '@/components/ui/paged-list-states';
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

  const body = (
    <PagedListStates
      result={log}
      page={query.page}
      loadingLabel="Loading the audit log…"
      errorTitle="The audit log could not be loaded"
      onFirstPage={() => onQueryChange({ ...query, page: 1 })}
      noMatch={
        isFiltered(filters)
          ? {
              title: 'No entries match',
              onClear: () => onQueryChange({ ...noAuditLogFilters, page: 1 }),
              text: 'No entry fits these filters together. Widen the dates, shorten the action, or clear the filters.',
            }
          : null
      }
      empty={
        <EmptyState title="Nothing recorded yet" icon={<History20Regular />} headingLevel={3}>
          Every change anyone makes is recorded here as it happens.
        </EmptyState>
      }
    >
      {(data) => (
        <AuditLogTable
          entries={data.items}
          labelledBy={headingId}
          pagination={{
            pageIndex: data.page - 1,
            pageSize: AUDIT_LOG_PAGE_SIZE,
            rowCount: data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'audit entries',
          }}
        />
      )}
    </PagedListStates>
  );
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
