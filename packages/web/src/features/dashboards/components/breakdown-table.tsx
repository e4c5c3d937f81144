import type { SnapshotView } from '@tallyloom/core';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';
import { RouterLink } from '@/components/ui/router-link';
import { KPI_MEASURES, MEASURE_LABELS } from './measures';

const column = createColumnHelper<SnapshotView>();

export interface BreakdownTableProps {
  breakdown: SnapshotView[];
  /** "Region" or "Chapter". */
  nameHeader: string;
  labelledBy: string;
  hrefOf: (row: SnapshotView) => string;
}

/** The comparison as figures, each name a link to its own dashboard. */
export function BreakdownTable({ breakdown, nameHeader, labelledBy, hrefOf }: BreakdownTableProps) {
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
          cell: (info) => <NumberCell value={info.getValue()} />,
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
    [nameHeader, hrefOf],
  );
  return (
    <DataTable
      data={breakdown}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(row) => String(row.scopeId)}
    />
  );
}
