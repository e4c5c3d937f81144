import { Button, Field, makeStyles, Select, tokens } from '@fluentui/react-components';
import { DocumentSearch20Regular } from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import {
  FINDING_SEVERITIES,
  FINDING_STATUSES,
  type FindingSeverity,
  type FindingStatus,
  type FindingSummaryView,
} from '@tallyloom/core';
import type { ReactNode } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { NumberCell } from '@/components/ui/number-cell';
import { RouterLink } from '@/components/ui/router-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useFindings } from '../api/get-findings';
import { FindingStatusBadge, SeverityBadge } from './finding-badges';
import { severityLabels, statusLabels } from './labels';

export const FINDINGS_PAGE_SIZE = 25;

const headingId = 'findings-heading';

const useStyles = makeStyles({
  filters: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalM,
  },
});

/** What the list shows; the page keeps it in its URL. */
export interface FindingsQuery {
  page: number;
  status?: FindingStatus;
  severity?: FindingSeverity;
}

const column = createColumnHelper<FindingSummaryView>();
const columns = [
  column.accessor('title', {
    header: 'Finding',
    cell: (info) => (
      <RouterLink to={paths.finding.getHref(info.row.original.id)}>{info.getValue()}</RouterLink>
    ),
  }),
  column.accessor('severity', {
    header: 'Severity',
    cell: (info) => <SeverityBadge severity={info.getValue()} />,
  }),
  column.accessor('status', {
    header: 'Status',
    cell: (info) => <FindingStatusBadge status={info.getValue()} />,
  }),
  column.accessor('responseCount', {
    header: 'Responses',
    meta: { numeric: true },
    cell: (info) => <NumberCell value={info.getValue()} />,
  }),
  column.accessor('createdBy', { header: 'Written by' }),
  column.accessor('createdAt', {
    header: 'Written',
    cell: (info) => formatDate(info.getValue()),
  }),
];

export interface FindingsListProps {
  query: FindingsQuery;
  onQueryChange: (query: FindingsQuery) => void;
  /** "New finding" for an empty list; absent for those who only read and respond. */
  firstFindingAction?: ReactNode;
}

/** Findings, newest first, filtered by status and severity, a page at a time. */
export function FindingsList({ query, onQueryChange, firstFindingAction }: FindingsListProps) {
  const styles = useStyles();
  const findings = useFindings({
    page: query.page,
    pageSize: FINDINGS_PAGE_SIZE,
    status: query.status,
    severity: query.severity,
  });
  const filtered = !!query.status || !!query.severity;

  let body;
  if (findings.isPending) {
    body = <LoadingState label="Loading findings…" />;
  } else if (findings.isError) {
    body = (
      <ErrorState
        title="Findings could not be loaded"
        error={findings.error}
        onRetry={() => void findings.refetch()}
        retrying={findings.isFetching}
        headingLevel={3}
      />
    );
  } else if (findings.data.items.length === 0) {
    body =
      findings.data.total > 0 ? (
        <EmptyState
          title={`Nothing on page ${query.page}`}
          headingLevel={3}
          action={<Button onClick={() => onQueryChange({ ...query, page: 1 })}>First page</Button>}
        >
          The list is shorter than that now.
        </EmptyState>
      ) : filtered ? (
        <EmptyState
          title="No findings match"
          headingLevel={3}
          action={<Button onClick={() => onQueryChange({ page: 1 })}>Clear filters</Button>}
        >
          No finding has this status and severity together.
        </EmptyState>
      ) : (
        <EmptyState
          title="No findings yet"
          icon={<DocumentSearch20Regular />}
          headingLevel={3}
          action={firstFindingAction}
        >
          {firstFindingAction
            ? 'Record what you find while tracing figures and checking samples; staff can then respond.'
            : 'Findings appear here once an auditor records one.'}
        </EmptyState>
      );
  } else {
    body = (
      <div aria-busy={findings.isPlaceholderData}>
        <DataTable
          data={findings.data.items}
          columns={columns}
          labelledBy={headingId}
          getRowId={(row) => String(row.id)}
          enableSorting={false}
          pagination={{
            pageIndex: findings.data.page - 1,
            pageSize: FINDINGS_PAGE_SIZE,
            rowCount: findings.data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'findings',
          }}
        />
      </div>
    );
  }

  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Findings</SectionHeading>
      <div className={styles.filters}>
        <Field label="Status">
          <Select
            value={query.status ?? ''}
            onChange={(_event, data) =>
              onQueryChange({
                ...query,
                status: (data.value || undefined) as FindingStatus | undefined,
                page: 1,
              })
            }
          >
            <option value="">Any status</option>
            {FINDING_STATUSES.map((status) => (
              <option key={status} value={status}>
                {statusLabels[status]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Severity">
          <Select
            value={query.severity ?? ''}
            onChange={(_event, data) =>
              onQueryChange({
                ...query,
                severity: (data.value || undefined) as FindingSeverity | undefined,
                page: 1,
              })
            }
          >
            <option value="">Any severity</option>
            {FINDING_SEVERITIES.map((severity) => (
              <option key={severity} value={severity}>
                {severityLabels[severity]}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      {body}
    </section>
  );
}
