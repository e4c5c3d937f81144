import { Button } from '@fluentui/react-components';
import { People20Regular } from '@fluentui/react-icons';
import type { Role, UserStatus, UserView } from '@tallyloom/core';
import { useMemo, useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
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

  let body;
  if (users.isPending) {
    body = <LoadingState label="Loading people…" />;
  } else if (users.isError) {
    body = (
      <ErrorState
        title="People could not be loaded"
        error={users.error}
        onRetry={() => void users.refetch()}
        retrying={users.isFetching}
        headingLevel={3}
      />
    );
  } else if (users.data.items.length === 0) {
    body =
      users.data.total > 0 ? (
        <EmptyState
          title={`Nothing on page ${query.page}`}
          headingLevel={3}
          action={<Button onClick={() => onQueryChange({ ...query, page: 1 })}>First page</Button>}
        >
          The list is shorter than that now.
        </EmptyState>
      ) : isFiltered(query) ? (
        <EmptyState
          title="No one matches"
          headingLevel={3}
          action={<Button onClick={clearFilters}>Clear search and filters</Button>}
        >
          Nobody fits this search, role and status together. Loosen one of them, or clear them all.
        </EmptyState>
      ) : (
        <EmptyState title="No one here yet" icon={<People20Regular />} headingLevel={3}>
          Invite the first people with “Invite person”: each gets an e-mail with a link to choose a
          password.
        </EmptyState>
      );
  } else {
    body = (
      <div aria-busy={users.isPlaceholderData}>
        <PeopleTable
          people={users.data.items}
          labelledBy={headingId}
          currentUserId={currentUserId}
          actions={actions}
          pagination={{
            // The page on screen, which lags the URL while the next one loads.
            pageIndex: users.data.page - 1,
            pageSize: PEOPLE_PAGE_SIZE,
            rowCount: users.data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'people',
          }}
        />
      </div>
    );
  }

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
