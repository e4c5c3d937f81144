import { People20Regular } from '@fluentui/react-icons';
import type { Role, UserStatus, UserView } from '@tallyloom/core';
import { useMemo, useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { EmptyState } from '@/components/ui/empty-state';
import { PagedListStates } from '@/components/ui/paged-list-states';
import { SectionHeading } from '@/components/ui/section-heading';
import { useResendInvite } from '../api/resend-invite';
import { useUpdateUser } from '../api/update-user';
import { useUsers } from '../api/get-users';
import { DeactivatePersonDialog } from './deactivate-person-dialog';
import { EditPersonDialog } from './edit-person-dialog';
import { PeopleFilters, type PeopleFilterValues } from './people-filters';
import { PeopleTable, type PersonActions } from './people-table';
import type { ScopeOptions } from './scope-options';

export const PEOPLE_PAGE_SIZE = 25;

const headingId = 'people-heading';

/** What the list shows: a page (from 1) and the filters. The page keeps these in its URL. */
export interface PeopleQuery {
  page: number;
  search: string;
  role: Role | undefined;
  status: UserStatus | undefined;
}

export interface PeopleDirectoryProps {
  query: PeopleQuery;
  onQueryChange: (query: PeopleQuery) => void;
  scopeOptions: ScopeOptions;
  currentUserId: number | undefined;
}

function isFiltered(query: PeopleQuery): boolean {
  return !!query.search || !!query.role || !!query.status;
}

/** Everyone with an account, a page at a time, with what an admin can do to each. */
export function PeopleDirectory({
  query,
  onQueryChange,
  scopeOptions,
  currentUserId,
}: PeopleDirectoryProps) {
  const users = useUsers({
    page: query.page,
    pageSize: PEOPLE_PAGE_SIZE,
    search: query.search,
    role: query.role,
    status: query.status,
  });
  const update = useUpdateUser();
  const resend = useResendInvite();
  const notify = useNotify();
  const [editing, setEditing] = useState<UserView | null>(null);
  const [deactivating, setDeactivating] = useState<UserView | null>(null);

  const actions = useMemo<PersonActions>(
    () => ({
      onEdit: setEditing,
      onDeactivate: setDeactivating,
      onReactivate: (person) =>
        update.mutate(
          { id: person.id, changes: { active: true } },
          {
            onSuccess: () => notify(`${person.displayName} is active again.`),
            onError: (error) => notify(error.message, 'error'),
          },
        ),
      onResendInvite: (person) =>
        resend.mutate(person, {
          onSuccess: () => notify(`Invitation sent again to ${person.email}.`),
          onError: (error) => notify(error.message, 'error'),
        }),
    }),
    // `mutate` is stable across renders; the whole mutation object is not.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [update.mutate, resend.mutate, notify],
  );

  const changeFilters = (filters: PeopleFilterValues) => onQueryChange({ ...filters, page: 1 });
  const clearFilters = () =>
    onQueryChange({ page: 1, search: '', role: undefined, status: undefined });

  const body = (
    <PagedListStates
      result={users}
      page={query.page}
      loadingLabel="Loading people…"
      errorTitle="People could not be loaded"
      onFirstPage={() => onQueryChange({ ...query, page: 1 })}
      noMatch={
        isFiltered(query)
          ? {
              title: 'No one matches',
              clearLabel: 'Clear search and filters',
              onClear: clearFilters,
              text: 'Nobody fits this search, role and status together. Loosen one of them, or clear them all.',
            }
          : null
      }
      empty={
        <EmptyState title="No one here yet" icon={<People20Regular />} headingLevel={3}>
          Invite the first people with “Invite person”: each gets an e-mail with a link to choose a
          password.
        </EmptyState>
      }
    >
      {(data) => (
        <PeopleTable
          people={data.items}
          labelledBy={headingId}
          currentUserId={currentUserId}
          actions={actions}
          pagination={{
            // The page on screen, which lags the URL while the next one loads.
            pageIndex: data.page - 1,
            pageSize: PEOPLE_PAGE_SIZE,
            rowCount: data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'people',
          }}
        />
      )}
    </PagedListStates>
  );
  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Everyone with an account</SectionHeading>
      <PeopleFilters
        values={{ search: query.search, role: query.role, status: query.status }}
        onChange={changeFilters}
      />
      {body}
      <EditPersonDialog
        person={editing}
        scopeOptions={scopeOptions}
        onClose={() => setEditing(null)}
      />
      <DeactivatePersonDialog person={deactivating} onClose={() => setDeactivating(null)} />
    </section>
  );
}
