import type { UserStatus } from '@tallyloom/core';

export const USER_STATUS_LABELS: Record<UserStatus, string> = {
  invited: 'Invited',
  active: 'Active',
  locked: 'Locked',
  deactivated: 'Deactivated',
};

export const USER_STATUSES = Object.keys(USER_STATUS_LABELS) as UserStatus[];

export function isUserStatus(value: unknown): value is UserStatus {
  return typeof value === 'string' && (USER_STATUSES as string[]).includes(value);
}
