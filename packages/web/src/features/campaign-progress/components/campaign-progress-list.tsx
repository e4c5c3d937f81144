import type { CampaignProgressView } from '@tallyloom/core';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { NumberCell } from '@/components/ui/number-cell';
import { RouterLink } from '@/components/ui/router-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useCampaignProgressList } from '../api/get-campaign-progress-list';
import { formatPace, formatShare } from './progress-words';

const column = createColumnHelper<CampaignProgressView>();

const columns = [
  column.accessor('name', {
    header: 'Campaign',
    cell: (info) => (
      <RouterLink to={paths.campaign.getHref(info.row.original.campaignId)}>
        {info.getValue()}
      </RouterLink>
    ),
  }),
  column.accessor('goalPanels', {
    header: 'Goal',
    cell: (info) => <NumberCell value={info.getValue()} />,
    meta: { numeric: true },
  }),
  column.accessor('creditedPanels', {
    header: 'Credited panels',
    cell: (info) => <NumberCell value={info.getValue()} />,
    meta: { numeric: true },
  }),
  column.accessor('shareDone', {
    header: 'Share done',
    cell: (info) => formatShare(info.getValue()),
    meta: { numeric: true },
  }),
  column.accessor('pacePerWeek', {
    header: 'Pace a week',
    cell: (info) => formatPace(info.getValue()),
    meta: { numeric: true },
  }),
  column.accessor('endsOn', { header: 'Ends', cell: (info) => formatDate(info.getValue()) }),
];

/** Every campaign in reach, with how far it has come. */
export function CampaignProgressList() {
  const campaigns = useCampaignProgressList();
  if (campaigns.isPending) return <LoadingState label="Loading the campaigns…" />;
  if (campaigns.isError) {
    return (
      <ErrorState
        title="The campaigns could not be loaded"
        error={campaigns.error}
        onRetry={() => void campaigns.refetch()}
        retrying={campaigns.isFetching}
      />
    );
  }
  if (campaigns.data.length === 0) {
    return (
      <EmptyState title="No campaigns yet">
        A network admin sets up campaigns under Network set-up; their progress shows here.
      </EmptyState>
    );
  }
  return (
    <>
      <SectionHeading id="campaigns-heading">Campaigns</SectionHeading>
      <DataTable
        data={campaigns.data}
        columns={columns}
        labelledBy="campaigns-heading"
        getRowId={(row) => String(row.campaignId)}
      />
    </>
  );
}
