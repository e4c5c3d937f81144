import { Edit20Regular } from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import type { ChapterView } from '@tallyloom/core';
import { useMemo } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { RowActions } from '@/components/ui/row-actions';
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
  onEdit,
}: {
  chapters: ChapterView[];
  labelledBy: string;
  /** Adds an Actions column with "Edit…" (network set-up). */
  onEdit?: (chapter: ChapterView) => void;
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
      data={chapters}
      columns={shown}
      labelledBy={labelledBy}
      getRowId={(chapter) => String(chapter.id)}
      initialSorting={[{ id: 'name', desc: false }]}
    />
  );
}
