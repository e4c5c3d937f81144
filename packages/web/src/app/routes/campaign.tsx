import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useCampaignProgress } from '@/features/campaign-progress/api/get-campaign-progress';
import { CampaignProgressDetail } from '@/features/campaign-progress/components/campaign-progress-detail';
import { parseRouteId } from '@/lib/route-id';

function backLink() {
  return <RouterLink to={paths.campaigns.getHref()}>All campaigns</RouterLink>;
}

function CampaignPage({ id }: { id: number }) {
  const progress = useCampaignProgress(id);
  if (progress.isPending) {
    return (
      <>
        <PageHeader title="Campaign progress" description={backLink()} />
        <LoadingState label="Loading the campaign…" />
      </>
    );
  }
  if (progress.isError) {
    return (
      <>
        <PageHeader title="Campaign progress" description={backLink()} />
        <ErrorState
          title="The campaign could not be loaded"
          error={progress.error}
          onRetry={() => void progress.refetch()}
          retrying={progress.isFetching}
        />
      </>
    );
  }
  return (
    <>
      <PageHeader title={progress.data.name} description={backLink()} />
      <CampaignProgressDetail progress={progress.data} />
    </>
  );
}

export function CampaignRoute() {
  const id = parseRouteId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Campaign progress" description={backLink()} />
        <ErrorState title="No such campaign" error={new Error('The address names no campaign.')} />
      </>
    );
  }
  return <CampaignPage id={id} />;
}
