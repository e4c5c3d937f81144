import { isRole } from '@tallyloom/core';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { useChapters } from '@/features/network/api/get-chapters';
import { useRegions } from '@/features/network/api/get-regions';
import { InvitePersonButton } from '@/features/people/components/invite-person-dialog';
import { isUserStatus } from '@/features/people/components/labels';
import { PeopleDirectory, type PeopleQuery } from '@/features/people/components/people-directory';
import type { ScopeOptions } from '@/features/people/components/scope-options';
import { useSessionUser } from '@/lib/session/use-session';

/** The list's page and filters live in the URL, so a view can be bookmarked or shared. */
function parseQuery(params: URLSearchParams): PeopleQuery {
  const page = Number(params.get('page'));
  const role = params.get('role');
  const status = params.get('status');
  return {
    page: Number.isInteger(page) && page > 0 ? page : 1,
    search: params.get('search') ?? '',
    role: isRole(role) ? role : undefined,
    status: isUserStatus(status) ? status : undefined,
  };
}

function toSearchParams(query: PeopleQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (query.page > 1) params.set('page', String(query.page));
  if (query.search) params.set('search', query.search);
  if (query.role) params.set('role', query.role);
  if (query.status) params.set('status', query.status);
  return params;
}

/** The network's regions and chapters, for the pickers of the invite and edit dialogs. */
function useScopeOptions(): ScopeOptions {
  const regions = useRegions();
  const chapters = useChapters();
  const { refetch: refetchRegions } = regions;
  const { refetch: refetchChapters } = chapters;
  const retry = useCallback(() => {
    void refetchRegions();
    void refetchChapters();
  }, [refetchRegions, refetchChapters]);
  return useMemo(() => {
    const failed = regions.error ?? chapters.error;
    return {
      regions: regions.data ?? [],
      chapters: chapters.data ?? [],
      status: failed ? 'error' : regions.data && chapters.data ? 'success' : 'pending',
      error: failed ?? undefined,
      retry,
    };
  }, [regions.data, regions.error, chapters.data, chapters.error, retry]);
}

/** Loaded on demand: only network admins open it. */
export function PeopleRoute() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = parseQuery(searchParams);
  const scopeOptions = useScopeOptions();
  const user = useSessionUser();

  return (
    <>
      <PageHeader
        title="People"
        description="Invite people, give them a role and a region or chapter, and deactivate accounts no longer needed."
        actions={<InvitePersonButton scopeOptions={scopeOptions} />}
      />
      <PeopleDirectory
        query={query}
        onQueryChange={(next) => setSearchParams(toSearchParams(next), { replace: true })}
        scopeOptions={scopeOptions}
        currentUserId={user?.id}
      />
    </>
  );
}
