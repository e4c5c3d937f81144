import { Badge } from '@fluentui/react-components';
import { CheckmarkCircle16Filled, DismissCircle16Filled } from '@fluentui/react-icons';
import type { ServiceState } from '@tallyloom/core';

/** "Up" or "Down" in words and an icon, so the state never rests on colour alone. */
export function ServiceStateBadge({ state }: { state: ServiceState }) {
  return state === 'up' ? (
    <Badge appearance="tint" color="success" icon={<CheckmarkCircle16Filled />}>
      Up
    </Badge>
  ) : (
    <Badge appearance="filled" color="danger" icon={<DismissCircle16Filled />}>
      Down
    </Badge>
  );
}
