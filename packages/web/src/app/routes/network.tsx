import { makeStyles, tokens } from '@fluentui/react-components';
import { can, ROLE_SCOPE } from '@tallyloom/core';
import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { appConfig } from '@/config/app-config';
import { getAgenciesQueryOptions } from '@/features/network-setup/api/get-agencies';
import { getCampaignsQueryOptions } from '@/features/network-setup/api/get-campaigns';
import { AgenciesList } from '@/features/network-setup/components/agencies-list';
import { CampaignsList } from '@/features/network-setup/components/campaigns-list';
import { getChaptersQueryOptions } from '@/features/network/api/get-chapters';
import { getRegionsQueryOptions } from '@/features/network/api/get-regions';
import { NetworkOverview } from '@/features/network/components/network-overview';
import { TallyDueCard } from '@/features/tallies/components/tally-due-card';
import { useSessionUser } from '@/lib/session/use-session';

/** The region filter lives in the URL (`?region=3`) so a filtered view can be bookmarked or shared. */
const regionParam = 'region';

function parseRegionId(value: string | null): number | undefined {
  if (!value || !/^\d+$/.test(value)) return undefined;
  const id = Number(value);
  return id > 0 ? id : undefined;
}

/**
 * Starts both requests as soon as the route matches, without holding navigation: the page shows
 * its own loading, empty and error states, which a blocking loader would replace with the error page.
 */
export const networkLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    const regionId = parseRegionId(new URL(request.url).searchParams.get(regionParam));
    void queryClient.prefetchQuery(getRegionsQueryOptions());
    void queryClient.prefetchQuery(getChaptersQueryOptions({ regionId }));
    void queryClient.prefetchQuery(getAgenciesQueryOptions());
    void queryClient.prefetchQuery(getCampaignsQueryOptions());
    return null;
  };

const useStyles = makeStyles({
  more: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1fr)',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
    marginTop: tokens.spacingVerticalXXL,
    '@media (max-width: 1100px)': {
      gridTemplateColumns: 'minmax(0, 1fr)',
      rowGap: tokens.spacingVerticalXL,
    },
  },
});

export function NetworkRoute() {
  const styles = useStyles();
  const user = useSessionUser();
  // A chapter lead's agencies are, by definition, the few their own chapter serves.
  const ownChapter =
    user && ROLE_SCOPE[user.role] === 'chapter' ? (user.chapterName ?? undefined) : undefined;
  const [searchParams, setSearchParams] = useSearchParams();
  const regionId = parseRegionId(searchParams.get(regionParam));

  const changeRegion = (nextRegionId: number | undefined) => {
    setSearchParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (nextRegionId === undefined) next.delete(regionParam);
        else next.set(regionParam, String(nextRegionId));
        return next;
      },
      { replace: true },
    );
  };

  return (
    <>
      <PageHeader
        title="Network"
        description={`The regions and chapters of the ${appConfig.networkName}, the agencies they serve and its campaigns.`}
      />
      {/* A chapter lead's main job is the monthly tally: the way there comes first. */}
      {ownChapter && can(user?.role, 'tallies.write') ? <TallyDueCard /> : null}
      <NetworkOverview regionId={regionId} onRegionChange={changeRegion} />
      <div className={styles.more}>
        <AgenciesList
          compact={!!ownChapter}
          title={ownChapter ? `Partner agencies ${ownChapter} serves` : 'Partner agencies'}
        />
        <CampaignsList />
      </div>
    </>
  );
}
