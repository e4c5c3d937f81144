import { ROLE_SCOPE } from '@tallyloom/core';
import { Navigate, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { DashboardView } from '@/features/dashboards/components/dashboard-view';
import { useDashboardQuery } from '@/features/dashboards/hooks/use-dashboard-query';
import { useSessionUser } from '@/lib/session/use-session';

/**
 * The dashboard of the person's own reach: the network for network-wide roles; coordinators
 * land on their region and chapter leads on their chapter, with the period they asked for.
 */
export function DashboardRoute() {
  const user = useSessionUser();
  const { search } = useLocation();
  const [query, changeQuery] = useDashboardQuery();
  const reach = user ? ROLE_SCOPE[user.role] : 'network';
  if (reach === 'chapter' && user?.chapterId) {
    return <Navigate to={paths.dashboardChapter.getHref(user.chapterId, search)} replace />;
  }
  if (reach === 'region' && user?.regionId) {
    return <Navigate to={paths.dashboardRegion.getHref(user.regionId, search)} replace />;
  }
  return <DashboardView target={{ scope: 'network' }} query={query} onQueryChange={changeQuery} />;
}
