import { Button, makeStyles, MessageBar, MessageBarBody, tokens } from '@fluentui/react-components';
import { Add20Regular, Edit20Regular, Money20Regular } from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import type { VolunteerHourValueView } from '@tallyloom/core';
import { useMemo, useState } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { RowActions } from '@/components/ui/row-actions';
import { SectionHeading } from '@/components/ui/section-heading';
import { useVolunteerHourValues } from '../api/get-volunteer-hour-values';
import { HourValueDialog } from './hour-value-dialog';

const headingId = 'hour-values-heading';

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalS,
  },
  heading: { marginBottom: 0 },
  note: { marginBottom: tokens.spacingVerticalM, maxWidth: '80ch' },
  money: { display: 'block', textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
});

/** 31.8, "USD" → "$31.80". */
export function formatHourlyValue(value: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(value);
  } catch {
    // An unknown currency code still shows the figure.
    return `${value.toFixed(2)} ${currency}`;
  }
}

const column = createColumnHelper<VolunteerHourValueView>();

/** The value of a volunteer hour per data year, each with its published source. */
export function HourValuesPanel() {
  const styles = useStyles();
  const values = useVolunteerHourValues();
  const [editing, setEditing] = useState<{ row?: VolunteerHourValueView } | null>(null);

  const columns = useMemo(
    () => [
      column.accessor('dataYear', { header: 'Data year' }),
      column.accessor('hourlyValue', {
        header: 'Value of an hour',
        cell: (info) => (
          <span className={styles.money}>
            {formatHourlyValue(info.getValue(), info.row.original.currency)}
          </span>
        ),
        meta: { numeric: true },
      }),
      column.accessor('source', { header: 'Source', enableSorting: false }),
      column.display({
        id: 'actions',
        header: 'Actions',
        cell: (info) => (
          <RowActions
            name={`the ${info.row.original.dataYear} value`}
            actions={[
              {
                label: 'Edit…',
                icon: <Edit20Regular />,
                onClick: () => setEditing({ row: info.row.original }),
              },
            ]}
          />
        ),
      }),
    ],
    [styles.money],
  );

  let body;
  if (values.isPending) body = <LoadingState label="Loading volunteer hour values…" />;
  else if (values.isError)
    body = (
      <ErrorState
        title="Volunteer hour values could not be loaded"
        error={values.error}
        onRetry={() => void values.refetch()}
        retrying={values.isFetching}
        headingLevel={3}
      />
    );
  else if (values.data.length === 0)
    body = (
      <EmptyState title="No volunteer hour values yet" icon={<Money20Regular />} headingLevel={3}>
        Add the value of an hour for each data year with “Add value”, naming where it is published.
      </EmptyState>
    );
  else
    body = (
      <DataTable
        data={values.data}
        columns={columns}
        labelledBy={headingId}
        getRowId={(value) => String(value.id)}
        initialSorting={[{ id: 'dataYear', desc: true }]}
      />
    );

  return (
    <section aria-labelledby={headingId}>
      <div className={styles.toolbar}>
        <SectionHeading id={headingId} className={styles.heading}>
          Volunteer hour values
        </SectionHeading>
        <Button icon={<Add20Regular />} onClick={() => setEditing({})}>
          Add value
        </Button>
      </div>
      <MessageBar intent="info" layout="multiline" className={styles.note}>
        <MessageBarBody>
          These values feed the impact figures: volunteer hours reported in tallies are multiplied
          by the value for their year. Each value must name the publication it comes from, so a
          funder can check it.
        </MessageBarBody>
      </MessageBar>
      {body}
      <HourValueDialog
        open={editing !== null}
        value={editing?.row}
        onClose={() => setEditing(null)}
      />
    </section>
  );
}
