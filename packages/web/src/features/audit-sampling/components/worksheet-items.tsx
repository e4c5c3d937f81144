import { Badge, Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { createColumnHelper } from '@tanstack/react-table';
import type { AuditSampleView, SampleItemView } from '@tallyloom/core';
import { useMemo, useState } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useRecordItem } from '../api/record-item';
import { AttachmentLink } from './attachment-link';
import { RecordEntryDialog } from './record-entry-dialog';

// Samples run to a few hundred items; a page at a time keeps the worksheet quick on old laptops.
export const WORKSHEET_PAGE_SIZE = 100;

const useStyles = makeStyles({
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
  note: { maxWidth: '40ch', overflowWrap: 'anywhere' },
  muted: { color: tokens.colorNeutralForeground2 },
  problem: { color: tokens.colorStatusDangerForeground1 },
});

const column = createColumnHelper<SampleItemView>();

function ResultCell({ item }: { item: SampleItemView }) {
  const styles = useStyles();
  if (item.result === 'agrees') {
    return (
      <Badge appearance="tint" color="success">
        Agrees
      </Badge>
    );
  }
  if (item.result === 'deviation') {
    return (
      <Badge appearance="tint" color="danger">
        Deviation
      </Badge>
    );
  }
  return <Text className={styles.muted}>Not recorded</Text>;
}

/**
 * "Agrees" in one click, or the dialog for a deviation; once recorded, the dialog to change it.
 * The dialog keeps its place in the tree as the row changes, so an open one is never torn down.
 */
function ItemActions({
  sampleId,
  item,
  itemName,
}: {
  sampleId: number;
  item: SampleItemView;
  itemName: string;
}) {
  const styles = useStyles();
  const record = useRecordItem();
  return (
    <span className={styles.actions}>
      {item.result === null ? (
        <Button
          size="small"
          aria-label={`Agrees: ${itemName}`}
          disabledFocusable={record.isPending}
          onClick={() =>
            record.mutate({ sampleId, itemId: item.itemId, entry: { result: 'agrees' } })
          }
        >
          Agrees
        </Button>
      ) : null}
      <RecordEntryDialog
        sampleId={sampleId}
        item={item}
        itemName={itemName}
        initialResult={item.result ?? 'deviation'}
        triggerLabel={item.result === null ? 'Deviation…' : 'Change…'}
      />
      {record.isError ? <Text className={styles.problem}>{record.error.message}</Text> : null}
    </span>
  );
}

export interface WorksheetItemsProps {
  sample: AuditSampleView;
  mayRecord: boolean;
}

/** The sampled items in draw order, each with its link, result, note and evidence. */
export function WorksheetItems({ sample, mayRecord }: WorksheetItemsProps) {
  const styles = useStyles();
  const [pageIndex, setPageIndex] = useState(0);
  const kind = sample.plan.request.population.kind;
  const nameOf = (item: SampleItemView) =>
    kind === 'parcel-receipts' ? `Parcel #${item.itemId}` : `Tally #${item.itemId}`;

  const columns = useMemo(
    () => [
      column.accessor('position', { header: '#', meta: { numeric: true } }),
      column.accessor('itemId', {
        header: kind === 'parcel-receipts' ? 'Parcel receipt' : 'Monthly tally',
        cell: (info) => (
          <RouterLink
            to={
              kind === 'parcel-receipts'
                ? paths.receipt.getHref(info.getValue())
                : paths.tally.getHref(info.getValue())
            }
          >
            {nameOf(info.row.original)}
          </RouterLink>
        ),
      }),
      column.display({
        id: 'result',
        header: 'Result',
        cell: (info) => <ResultCell item={info.row.original} />,
      }),
      column.accessor('note', {
        header: 'Note',
        cell: (info) => <span className={styles.note}>{info.getValue() ?? ''}</span>,
      }),
      column.display({
        id: 'attachment',
        header: 'Attachment',
        cell: (info) =>
          info.row.original.attachmentUrl ? (
            <AttachmentLink
              sampleId={sample.id}
              itemId={info.row.original.itemId}
              itemName={nameOf(info.row.original)}
            />
          ) : null,
      }),
      ...(mayRecord
        ? [
            column.display({
              id: 'record',
              header: 'Record',
              cell: (info) => (
                <ItemActions
                  sampleId={sample.id}
                  item={info.row.original}
                  itemName={nameOf(info.row.original)}
                />
              ),
            }),
          ]
        : []),
    ],
    // nameOf reads only `kind`.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [kind, mayRecord, sample.id, styles],
  );

  const page = Math.min(
    pageIndex,
    Math.max(0, Math.ceil(sample.items.length / WORKSHEET_PAGE_SIZE) - 1),
  );
  const shown = sample.items.slice(page * WORKSHEET_PAGE_SIZE, (page + 1) * WORKSHEET_PAGE_SIZE);
  return (
    <>
      <DataTable
        data={shown}
        columns={columns}
        labelledBy="worksheet-heading"
        getRowId={(item) => String(item.itemId)}
        enableSorting={false}
        pagination={
          sample.items.length > WORKSHEET_PAGE_SIZE
            ? {
                pageIndex: page,
                pageSize: WORKSHEET_PAGE_SIZE,
                rowCount: sample.items.length,
                onPageChange: setPageIndex,
                label: 'sampled items',
              }
            : undefined
        }
      />
    </>
  );
}
