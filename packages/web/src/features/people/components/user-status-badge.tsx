import { Badge, type BadgeProps } from '@fluentui/react-components';
import {
  CheckmarkCircle16Regular,
  LockClosed16Regular,
  Mail16Regular,
  SubtractCircle16Regular,
} from '@fluentui/react-icons';
import type { UserStatus } from '@tallyloom/core';
import type { ReactElement } from 'react';
import { USER_STATUS_LABELS } from './labels';

const looks: Record<UserStatus, { color: BadgeProps['color']; icon: ReactElement }> = {
  invited: { color: 'informative', icon: <Mail16Regular /> },
  active: { color: 'success', icon: <CheckmarkCircle16Regular /> },
  locked: { color: 'warning', icon: <LockClosed16Regular /> },
  deactivated: { color: 'subtle', icon: <SubtractCircle16Regular /> },
};

/** The status in words with an icon, so it never rests on colour alone. */
export function UserStatusBadge({ status }: { status: UserStatus }) {
  const { color, icon } = looks[status];
  return (
    <Badge appearance="tint" color={color} icon={icon}>
      {USER_STATUS_LABELS[status]}
    </Badge>
  );
}
