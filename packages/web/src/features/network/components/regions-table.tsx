import { Edit20Regular } from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import type { RegionView } from '@tallyloom/core';
import { useMemo } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';
import { RowActions } from '@/components/ui/row-actions';

const column = createColumnHelper<RegionView>();

const columns = [
  column.accessor('name', { header: 'Region' }),
  column.accessor('code', { header: 'Code' }),
  column.accessor('chapterCount', {
    header: 'Chapters',
    cell: (info) => <NumberCell value={info.getValue()} />,
    meta: { numeric: true },
  }),
];

export function RegionsTable({
  regions,
  labelledBy,
  onEdit,
}: {
  regions: RegionView[];
  labelledBy: string;
  /** Adds an Actions column with "Edit…" (network set-up). */
  onEdit?: (region: RegionView) => void;
}) {
  const shown = useMemo(
    () =>
      onEdit
        ? [
            ...columns,
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: (info) => (
                <RowActions
                  name={info.row.original.name}
                  actions={[
                    {
                      label: 'Edit…',
                      icon: <Edit20Regular />,
                      onClick: () => onEdit(info.row.original),
                    },
                  ]}
                />
              ),
            }),
          ]
        : columns,
    [onEdit],
  );
  return (
    <DataTable
      data={regions}
      columns={shown}
      labelledBy={labelledBy}
      getRowId={(region) => String(region.id)}
    />
  );
}
