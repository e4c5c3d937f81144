import { createColumnHelper } from '@tanstack/react-table';
import type { ChapterView } from '@tallyloom/core';
import { DataTable } from '@/components/ui/data-table';
import { formatMonthYear, formatReportDueDay } from '@/lib/format';

const column = createColumnHelper<ChapterView>();

const columns = [
  column.accessor('name', { header: 'Chapter' }),
  column.accessor('regionName', { header: 'Region' }),
  column.accessor('reportingDueDay', {
    header: 'Report due',
    cell: (info) => formatReportDueDay(info.getValue()),
  }),
  // ISO dates sort correctly as text; the cell shows the month a person reads.
  column.accessor('activeFrom', {
    header: 'Active since',
    cell: (info) => {
      const { activeTo } = info.row.original;
      const since = formatMonthYear(info.getValue());
      return activeTo ? `${since} (closed ${formatMonthYear(activeTo)})` : since;
    },
  }),
];

export function ChaptersTable({
  chapters,
  labelledBy,
}: {
  chapters: ChapterView[];
  labelledBy: string;
}) {
  return (
    <DataTable
      data={chapters}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(chapter) => String(chapter.id)}
      initialSorting={[{ id: 'name', desc: false }]}
    />
  );
}
