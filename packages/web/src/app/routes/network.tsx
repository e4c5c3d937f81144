import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { appConfig } from '@/config/app-config';
import { getChaptersQueryOptions } from '@/features/network/api/get-chapters';
import { getRegionsQueryOptions } from '@/features/network/api/get-regions';
import { NetworkOverview } from '@/features/network/components/network-overview';

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
    return null;
  };

export function NetworkRoute() {
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
        description={`The regions and chapters of the ${appConfig.networkName}.`}
      />
      <NetworkOverview regionId={regionId} onRegionChange={changeRegion} />
    </>
  );
}
