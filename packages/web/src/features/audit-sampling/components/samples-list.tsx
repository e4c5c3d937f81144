import { Badge, Text } from '@fluentui/react-components';
import { createColumnHelper } from '@tanstack/react-table';
import { formatTolerableRate, type AuditSampleSummaryView } from '@tallyloom/core';
import { useMemo } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useChapters } from '@/features/network/api/get-chapters';
import { useRegions } from '@/features/network/api/get-regions';
import { formatDateTime } from '@/lib/format';
import { useSamples } from '../api/get-samples';
import {
  confidenceWords,
  monthsWords,
  POPULATION_LABELS,
  progressWords,
  scopeWords,
} from './sample-words';

export const SAMPLES_PAGE_SIZE = 25;

const column = createColumnHelper<AuditSampleSummaryView>();

function ResultBadge({ sample }: { sample: AuditSampleSummaryView }) {
  const evaluation = sample.worksheet.evaluation;
  if (!evaluation) return <Text>{progressWords(sample.worksheet, sample.itemCount)}</Text>;
  return evaluation.supportsReliance ? (
    <Badge appearance="tint" color="success">
      Supports reliance
    </Badge>
  ) : (
    <Badge appearance="tint" color="danger">
      Does not support reliance
    </Badge>
  );
}

export interface SamplesListProps {
  page: number;
  onPageChange: (page: number) => void;
}

/** Drawn samples, newest first, each opening its worksheet. */
export function SamplesList({ page, onPageChange }: SamplesListProps) {
  const samples = useSamples({ page, pageSize: SAMPLES_PAGE_SIZE });
  const regions = useRegions();
  const chapters = useChapters();
  const columns = useMemo(
    () => [
      column.accessor('id', {
        header: 'Sample',
        cell: (info) => (
          <RouterLink
            to={paths.sample.getHref(info.getValue())}
          >{`Sample #${info.getValue()}`}</RouterLink>
        ),
      }),
      column.accessor((row) => POPULATION_LABELS[row.plan.request.population.kind], {
        id: 'population',
        header: 'Population',
      }),
      column.accessor(
        (row) => scopeWords(row.plan.request.population, regions.data, chapters.data),
        { id: 'scope', header: 'Scope' },
      ),
      column.accessor(
        (row) => monthsWords(row.plan.request.population.from, row.plan.request.population.to),
        { id: 'period', header: 'Months' },
      ),
      column.accessor(
        (row) =>
          `${confidenceWords(row.plan.request.confidence)} · ${formatTolerableRate(row.plan.request.tolerableRate)}`,
        { id: 'plan', header: 'Confidence · tolerable rate' },
      ),
      column.accessor('itemCount', { header: 'Items', meta: { numeric: true } }),
      column.accessor((row) => row.worksheet.deviations, {
        id: 'deviations',
        header: 'Deviations',
        meta: { numeric: true },
      }),
      column.display({
        id: 'result',
        header: 'Result',
        cell: (info) => <ResultBadge sample={info.row.original} />,
      }),
      column.accessor((row) => `${formatDateTime(row.drawnAt)} · ${row.drawnBy}`, {
        id: 'drawn',
        header: 'Drawn',
      }),
    ],
    [regions.data, chapters.data],
  );

  if (samples.isPending) return <LoadingState label="Loading the samples…" />;
  if (samples.isError) {
    return (
      <ErrorState
        title="The samples could not be loaded"
        error={samples.error}
        onRetry={() => void samples.refetch()}
        retrying={samples.isFetching}
      />
    );
  }
  if (samples.data.total === 0) {
    return (
      <EmptyState title="No samples drawn yet" headingLevel={3}>
        Plan a sample above: choose the population, scope and months, the confidence and the
        tolerable rate, then draw it.
      </EmptyState>
    );
  }
  return (
    <DataTable
      data={samples.data.items}
      columns={columns}
      labelledBy="samples-heading"
      getRowId={(row) => String(row.id)}
      enableSorting={false}
      pagination={{
        pageIndex: page - 1,
        pageSize: SAMPLES_PAGE_SIZE,
        rowCount: samples.data.total,
        onPageChange: (pageIndex) => onPageChange(pageIndex + 1),
        label: 'samples',
      }}
    />
  );
}
