import { Field, makeStyles, Select, tokens } from '@fluentui/react-components';
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
import { NumberCell } from '@/components/ui/number-cell';
import { PagedListStates } from '@/components/ui/paged-list-states';
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

  const body = (
    <PagedListStates
      result={findings}
      page={query.page}
      loadingLabel="Loading findings…"
      errorTitle="Findings could not be loaded"
      onFirstPage={() => onQueryChange({ ...query, page: 1 })}
      noMatch={
        filtered
          ? {
              title: 'No findings match',
              onClear: () => onQueryChange({ page: 1 }),
              text: 'No finding has this status and severity together.',
            }
          : null
      }
      empty={
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
      }
    >
      {(data) => (
        <DataTable
          data={data.items}
          columns={columns}
          labelledBy={headingId}
          getRowId={(row) => String(row.id)}
          enableSorting={false}
          pagination={{
            pageIndex: data.page - 1,
            pageSize: FINDINGS_PAGE_SIZE,
            rowCount: data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'findings',
          }}
        />
      )}
    </PagedListStates>
  );
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
