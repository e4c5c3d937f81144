import { Badge } from '@fluentui/react-components';
import {
  CheckmarkCircle16Regular,
  Clock16Regular,
  DismissCircle16Regular,
  ArrowSync16Regular,
  History16Regular,
} from '@fluentui/react-icons';
import type { ExportState } from '@tallyloom/core';
import type { ReactElement } from 'react';

const LOOK: Record<
  ExportState,
  {
    label: string;
    color: 'informative' | 'brand' | 'success' | 'danger' | 'subtle';
    icon: ReactElement;
  }
> = {
  queued: { label: 'Queued', color: 'informative', icon: <Clock16Regular /> },
  running: { label: 'Writing', color: 'brand', icon: <ArrowSync16Regular /> },
  done: { label: 'Ready', color: 'success', icon: <CheckmarkCircle16Regular /> },
  failed: { label: 'Failed', color: 'danger', icon: <DismissCircle16Regular /> },
  expired: { label: 'Expired', color: 'subtle', icon: <History16Regular /> },
};

/** The export's state in words with an icon, so it never rests on colour alone. */
export function ExportStateBadge({ state, progress }: { state: ExportState; progress: number }) {
  const look = LOOK[state];
  return (
    <Badge appearance="tint" color={look.color} icon={look.icon}>
      {state === 'running' ? `${look.label} ${Math.round(progress)}%` : look.label}
    </Badge>
  );
}
