import { makeStyles, tokens } from '@fluentui/react-components';
import type { DashboardParams, SnapshotExportParams, SnapshotView } from '@tallyloom/core';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { useMatch } from 'react-router-dom';
import { DataTable } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { ExportMenu } from '@/features/exports/components/export-menu';
import { KPI_MEASURES, MEASURE_LABELS, type KpiMeasure } from './measures';

const column = createColumnHelper<SnapshotView>();

const useStyles = makeStyles({
  header: {
    display: 'flex',
    justifyContent: 'flex-end',
    marginBottom: tokens.spacingVerticalS,
  },
});

/**
 * The export of these rows: the dashboard's scope (the network above regions, the region whose
 * page this is above chapters) and the period the rows are for.
 */
function useSnapshotExport(breakdown: SnapshotView[]): SnapshotExportParams | undefined {
  const regionPage = useMatch(paths.dashboardRegion.path);
  const first = breakdown[0];
  if (!first) return undefined;
  const { period } = first;
  const periodParams: DashboardParams =
    period.kind === 'custom'
      ? { periodKind: 'custom', from: period.from, to: period.to }
      : { periodKind: period.kind, period: period.key };
  if (first.scope === 'region') return { scope: 'network', ...periodParams };
  const regionId = Number(regionPage?.params.id);
  if (first.scope !== 'chapter' || !Number.isInteger(regionId)) return undefined;
  return { scope: 'region', scopeId: regionId, ...periodParams };
}

export interface BreakdownTableProps {
  breakdown: SnapshotView[];
  /** "Region" or "Chapter". */
  nameHeader: string;
  labelledBy: string;
  hrefOf: (row: SnapshotView) => string;
  /** A row's figure leads to its trace, for roles that may trace it. */
  traceHrefOf?: (row: SnapshotView, measure: KpiMeasure) => string | null;
}

/** The comparison as figures, each name a link to its own dashboard. */
export function BreakdownTable({
  breakdown,
  nameHeader,
  labelledBy,
  hrefOf,
  traceHrefOf,
}: BreakdownTableProps) {
  const styles = useStyles();
  const exportFilters = useSnapshotExport(breakdown);
  const columns = useMemo(
    () => [
      column.accessor('scopeName', {
        header: nameHeader,
        cell: (info) => <RouterLink to={hrefOf(info.row.original)}>{info.getValue()}</RouterLink>,
      }),
      ...KPI_MEASURES.map((measure) =>
        column.accessor((row) => row.figures[measure], {
          id: measure,
          header: MEASURE_LABELS[measure],
          cell: (info) => {
            const trace = traceHrefOf?.(info.row.original, measure);
            return trace ? (
              <RouterLink to={trace}>
                <NumberCell value={info.getValue()} />
              </RouterLink>
            ) : (
              <NumberCell value={info.getValue()} />
            );
          },
          meta: { numeric: true },
        }),
      ),
      column.accessor((row) => row.compliance.onTime, {
        id: 'onTime',
        header: 'Filed on time',
        cell: (info) => <NumberCell value={info.getValue()} />,
        meta: { numeric: true },
      }),
      column.accessor('pendingTallies', {
        header: 'Awaiting approval',
        cell: (info) => <NumberCell value={info.getValue()} />,
        meta: { numeric: true },
      }),
    ],
    [nameHeader, hrefOf, traceHrefOf],
  );
  return (
    <>
      {exportFilters ? (
        <div className={styles.header}>
          <ExportMenu
            target={{ table: 'snapshots', filters: exportFilters }}
            what={`the ${nameHeader.toLowerCase()} comparison`}
          />
        </div>
      ) : null}
      <DataTable
        data={breakdown}
        columns={columns}
        labelledBy={labelledBy}
        getRowId={(row) => String(row.scopeId)}
      />
    </>
  );
}
