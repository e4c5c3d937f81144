import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { DashboardView } from '@/features/dashboards/components/dashboard-view';
import { useDashboardQuery } from '@/features/dashboards/hooks/use-dashboard-query';
import { parseRouteId } from '@/lib/route-id';

/** One region's figures; out of the person's reach, the server answers "not found". */
export function DashboardRegionRoute() {
  const id = parseRouteId(useParams().id);
  const [query, changeQuery] = useDashboardQuery();
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Region dashboard" />
        <ErrorState title="No such region" error={new Error('The address names no region.')} />
      </>
    );
  }
  return (
    <DashboardView target={{ scope: 'region', id }} query={query} onQueryChange={changeQuery} />
  );
}
