import {
  Button,
  Menu,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
} from '@fluentui/react-components';
import {
  ArrowSync20Regular,
  Edit20Regular,
  MoreHorizontal20Regular,
  PersonAvailable20Regular,
  PersonProhibited20Regular,
} from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import { ROLE_LABELS, type UserView } from '@tallyloom/core';
import { useMemo } from 'react';
import { DataTable, type ServerPagination } from '@/components/ui/data-table';
import { formatDateTime } from '@/lib/format';
import { scopeLabel } from '@/lib/scope';
import { UserStatusBadge } from './user-status-badge';

export interface PersonActions {
  onEdit: (person: UserView) => void;
  onDeactivate: (person: UserView) => void;
  onReactivate: (person: UserView) => void;
  onResendInvite: (person: UserView) => void;
}

function RowActions({
  person,
  actions,
  isSelf,
}: {
  person: UserView;
  actions: PersonActions;
  isSelf: boolean;
}) {
  return (
    <Menu positioning="below-end">
      <MenuTrigger disableButtonEnhancement>
        <Button
          appearance="subtle"
          size="small"
          icon={<MoreHorizontal20Regular />}
          aria-label={`Actions for ${person.displayName}`}
        />
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuItem icon={<Edit20Regular />} onClick={() => actions.onEdit(person)}>
            Edit…
          </MenuItem>
          {person.status === 'invited' ? (
            <MenuItem icon={<ArrowSync20Regular />} onClick={() => actions.onResendInvite(person)}>
              Resend invitation
            </MenuItem>
          ) : null}
          {person.status === 'deactivated' ? (
            <MenuItem
              icon={<PersonAvailable20Regular />}
              onClick={() => actions.onReactivate(person)}
            >
              Reactivate
            </MenuItem>
          ) : isSelf ? null : (
            // Deactivating oneself would lock the last admin out; someone else has to do it.
            <MenuItem
              icon={<PersonProhibited20Regular />}
              onClick={() => actions.onDeactivate(person)}
            >
              Deactivate…
            </MenuItem>
          )}
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}

const column = createColumnHelper<UserView>();

export interface PeopleTableProps {
  people: UserView[];
  labelledBy: string;
  pagination: ServerPagination;
  actions: PersonActions;
  /** The signed-in admin, who cannot deactivate themselves from here. */
  currentUserId: number | undefined;
}

export function PeopleTable({
  people,
  labelledBy,
  pagination,
  actions,
  currentUserId,
}: PeopleTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('displayName', { header: 'Name' }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor('role', { header: 'Role', cell: (info) => ROLE_LABELS[info.getValue()] }),
      column.display({
        id: 'scope',
        header: 'Scope',
        cell: (info) => scopeLabel(info.row.original),
      }),
      column.accessor('status', {
        header: 'Status',
        cell: (info) => <UserStatusBadge status={info.getValue()} />,
      }),
      column.accessor('lastSignInAt', {
        header: 'Last sign-in',
        cell: (info) => formatDateTime(info.getValue()),
      }),
      column.display({
        id: 'actions',
        header: 'Actions',
        cell: (info) => (
          <RowActions
            person={info.row.original}
            actions={actions}
            isSelf={info.row.original.id === currentUserId}
          />
        ),
      }),
    ],
    [actions, currentUserId],
  );

  return (
    <DataTable
      data={people}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(person) => String(person.id)}
      enableSorting={false}
      pagination={pagination}
    />
  );
}
