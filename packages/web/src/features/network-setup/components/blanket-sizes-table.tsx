import { ArrowUndo20Regular, Edit20Regular, SubtractCircle20Regular } from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import type { BlanketSizeView } from '@tallyloom/core';
import { useMemo } from 'react';
import { ActiveBadge } from '@/components/ui/active-badge';
import { DataTable } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';
import { RowActions } from '@/components/ui/row-actions';
import { formatFinishedSize, formatGrid } from './size-format';

export interface BlanketSizeActions {
  onEdit: (size: BlanketSizeView) => void;
  onDeactivate: (size: BlanketSizeView) => void;
  onReactivate: (size: BlanketSizeView) => void;
}

const column = createColumnHelper<BlanketSizeView>();

export function BlanketSizesTable({
  sizes,
  labelledBy,
  actions,
}: {
  sizes: BlanketSizeView[];
  labelledBy: string;
  actions: BlanketSizeActions;
}) {
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Size' }),
      column.accessor((size) => formatGrid(size), {
        id: 'grid',
        header: 'Grid (across × down)',
        enableSorting: false,
      }),
      column.accessor('panels', {
        header: 'Panels',
        cell: (info) => <NumberCell value={info.getValue()} />,
        meta: { numeric: true },
      }),
      column.accessor((size) => formatFinishedSize(size), {
        id: 'finished',
        header: 'Finished size',
        enableSorting: false,
      }),
      column.accessor('active', {
        header: 'Status',
        cell: (info) => <ActiveBadge active={info.getValue()} />,
      }),
      column.accessor((size) => size.sourceNote ?? '—', {
        id: 'source',
        header: 'Source',
        enableSorting: false,
      }),
      column.display({
        id: 'actions',
        header: 'Actions',
        cell: (info) => {
          const size = info.row.original;
          return (
            <RowActions
              name={size.name}
              actions={[
                { label: 'Edit…', icon: <Edit20Regular />, onClick: () => actions.onEdit(size) },
                size.active
                  ? {
                      label: 'Deactivate…',
                      icon: <SubtractCircle20Regular />,
                      onClick: () => actions.onDeactivate(size),
                    }
                  : {
                      label: 'Reactivate',
                      icon: <ArrowUndo20Regular />,
                      onClick: () => actions.onReactivate(size),
                    },
              ]}
            />
          );
        },
      }),
    ],
    [actions],
  );

  // The catalogue's own order (sortOrder) comes from the server; the table keeps it.
  return (
    <DataTable
      data={sizes}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(size) => String(size.id)}
    />
  );
}
