import { Badge, makeStyles, Text, tokens, Tooltip } from '@fluentui/react-components';
import type { AuditLogEntryView } from '@tallyloom/core';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable, type ServerPagination } from '@/components/ui/data-table';
import { formatCount, formatDateTime } from '@/lib/format';

const useStyles = makeStyles({
  mono: { fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
  change: {
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    maxWidth: '360px',
    overflow: 'hidden',
    textOverflow: 'ellipsis',
    whiteSpace: 'nowrap',
    display: 'block',
  },
});

const column = createColumnHelper<AuditLogEntryView>();

/** The change in one line: what was there before → what is there after. */
export function changeText(entry: AuditLogEntryView): string {
  const before = entry.before === null ? '' : JSON.stringify(entry.before);
  const after = entry.after === null ? '' : JSON.stringify(entry.after);
  if (before && after) return `${before} → ${after}`;
  return after || before || '—';
}

function ChangeCell({ entry }: { entry: AuditLogEntryView }) {
  const styles = useStyles();
  const text = changeText(entry);
  return (
    <Tooltip content={<span className={styles.mono}>{text}</span>} relationship="description">
      {/* Focusable, so the full change is reachable without a mouse. */}
      <span className={styles.change} tabIndex={0}>
        {text}
      </span>
    </Tooltip>
  );
}

function SealCell({ entry }: { entry: AuditLogEntryView }) {
  const styles = useStyles();
  if (!entry.sealed) {
    return (
      <Badge appearance="outline" color="warning">
        Not sealed yet
      </Badge>
    );
  }
  return (
    <Text className={styles.mono} title={entry.entryHash ?? undefined}>
      #{formatCount(entry.chainSeq ?? 0)}
    </Text>
  );
}

const columns = [
  column.accessor('id', { header: 'Entry', meta: { numeric: true } }),
  column.accessor('occurredAt', {
    header: 'When',
    cell: (info) => formatDateTime(info.getValue()),
  }),
  column.accessor((row) => row.actorEmail ?? '', {
    id: 'who',
    header: 'Who',
    cell: (info) => info.getValue() || 'No one signed in',
  }),
  column.accessor('action', { header: 'What' }),
  column.accessor((row) => `${row.entityType}${row.entityId ? ` ${row.entityId}` : ''}`, {
    id: 'entity',
    header: 'Entity',
  }),
  column.display({
    id: 'change',
    header: 'Change',
    cell: (info) => <ChangeCell entry={info.row.original} />,
  }),
  column.display({
    id: 'chain',
    header: 'Chain',
    cell: (info) => <SealCell entry={info.row.original} />,
  }),
];

export interface AuditLogTableProps {
  entries: AuditLogEntryView[];
  labelledBy: string;
  pagination: ServerPagination;
}

export function AuditLogTable({ entries, labelledBy, pagination }: AuditLogTableProps) {
  return (
    <DataTable
      data={entries}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(row) => String(row.id)}
      enableSorting={false}
      pagination={pagination}
    />
  );
}
