import { createColumnHelper } from '@tanstack/react-table';
import type { QueueHealth } from '@tallyloom/core';
import { DataTable } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';

type QueueCounts = NonNullable<QueueHealth['queues']>[number];

const column = createColumnHelper<QueueCounts>();

const countColumn = (key: 'waiting' | 'active' | 'failed' | 'delayed', header: string) =>
  column.accessor(key, {
    header,
    cell: (info) => <NumberCell value={info.getValue()} />,
    meta: { numeric: true },
  });

const columns = [
  column.accessor('name', { header: 'Queue' }),
  countColumn('waiting', 'Waiting'),
  countColumn('active', 'Active'),
  countColumn('failed', 'Failed'),
  countColumn('delayed', 'Delayed'),
];

export function QueueTable({ queues, labelledBy }: { queues: QueueCounts[]; labelledBy: string }) {
  return (
    <DataTable
      data={queues}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(queue) => queue.name}
    />
  );
}
