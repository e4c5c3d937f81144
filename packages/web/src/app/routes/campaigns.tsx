import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { CampaignProgressList } from '@/features/campaign-progress/components/campaign-progress-list';

export function CampaignsRoute() {
  return (
    <>
      <PageHeader
        title="Campaigns"
        description={
          <>
            Panels credited to each campaign against its goal.{' '}
            <RouterLink to={paths.dashboard.getHref()}>Back to the dashboard</RouterLink>
          </>
        }
      />
      <CampaignProgressList />
    </>
  );
}
