import { createColumnHelper } from '@tanstack/react-table';
import type { RegionView } from '@tallyloom/core';
import { DataTable } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';

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
}: {
  regions: RegionView[];
  labelledBy: string;
}) {
  return (
    <DataTable
      data={regions}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(region) => String(region.id)}
    />
  );
}
