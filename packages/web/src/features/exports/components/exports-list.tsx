import { Link, makeStyles, Text, tokens } from '@fluentui/react-components';
import { ArrowDownload16Regular, ArrowExportUp20Regular } from '@fluentui/react-icons';
import type { ExportView } from '@tallyloom/core';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatDateTime } from '@/lib/format';
import { useExports } from '../api/get-exports';
import { ExportStateBadge } from './export-state-badge';
import { exportContents } from './export-status';

export const EXPORTS_PAGE_SIZE = 25;

const headingId = 'exports-heading';

const useStyles = makeStyles({
  what: { display: 'flex', flexDirection: 'column' },
  file: { color: tokens.colorNeutralForeground2 },
  download: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXXS },
});

const column = createColumnHelper<ExportView>();

function useColumns() {
  const styles = useStyles();
  return useMemo(
    () => [
      column.accessor('description', {
        header: 'Export',
        cell: (info) => (
          <span className={styles.what}>
            <span>{info.getValue()}</span>
            <Text size={200} className={styles.file}>
              {info.row.original.fileName}
            </Text>
          </span>
        ),
      }),
      column.accessor('state', {
        header: 'State',
        cell: (info) => (
          <ExportStateBadge state={info.getValue()} progress={info.row.original.progress} />
        ),
      }),
      column.accessor('createdAt', {
        header: 'Asked for',
        cell: (info) => formatDateTime(info.getValue()),
      }),
      column.display({
        id: 'contents',
        header: 'Contents',
        cell: (info) => {
          const view = info.row.original;
          if (view.state === 'failed') return view.error ?? 'Failed';
          return view.rows === null ? '—' : exportContents(view);
        },
      }),
      column.accessor('expiresAt', {
        header: 'Link works until',
        cell: (info) => (info.getValue() ? formatDateTime(info.getValue()) : '—'),
      }),
      column.display({
        id: 'download',
        header: 'Download',
        cell: (info) => {
          const view = info.row.original;
          if (view.state !== 'done' || !view.downloadUrl) return '—';
          return (
            <Link
              href={view.downloadUrl}
              download={view.fileName}
              className={styles.download}
              aria-label={`Download ${view.fileName}`}
            >
              <ArrowDownload16Regular aria-hidden="true" />
              Download
            </Link>
          );
        },
      }),
    ],
    [styles],
  );
}

export interface ExportsListProps {
  page: number;
  onPageChange: (page: number) => void;
}

/** The person's own exports, newest first: what is being written, ready, failed or expired. */
export function ExportsList({ page, onPageChange }: ExportsListProps) {
  const exportsPage = useExports({ page, pageSize: EXPORTS_PAGE_SIZE });
  const columns = useColumns();

  let body;
  if (exportsPage.isPending) {
    body = <LoadingState label="Loading your exports…" />;
  } else if (exportsPage.isError) {
    body = (
      <ErrorState
        title="Your exports could not be loaded"
        error={exportsPage.error}
        onRetry={() => void exportsPage.refetch()}
        retrying={exportsPage.isFetching}
        headingLevel={3}
      />
    );
  } else if (exportsPage.data.items.length === 0) {
    body = (
      <EmptyState title="No exports yet" icon={<ArrowExportUp20Regular />} headingLevel={3}>
        Use “Export” above a table (parcels, the review queue, a dashboard’s comparison) to get a
        spreadsheet of what it shows. Each export appears here while it is written and until its
        link expires.
      </EmptyState>
    );
  } else {
    body = (
      <DataTable
        data={exportsPage.data.items}
        columns={columns}
        labelledBy={headingId}
        getRowId={(row) => row.id}
        enableSorting={false}
        pagination={{
          pageIndex: exportsPage.data.page - 1,
          pageSize: EXPORTS_PAGE_SIZE,
          rowCount: exportsPage.data.total,
          onPageChange: (pageIndex) => onPageChange(pageIndex + 1),
          label: 'exports',
        }}
      />
    );
  }

  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Your exports</SectionHeading>
      {body}
    </section>
  );
}
