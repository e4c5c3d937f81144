import { Badge } from '@fluentui/react-components';
import type { FindingSeverity, FindingStatus } from '@tallyloom/core';
import { severityLabels, statusLabels } from './labels';

const severityColor = {
  low: 'informative',
  medium: 'warning',
  high: 'danger',
} as const satisfies Record<FindingSeverity, string>;

const statusColor = {
  open: 'brand',
  responded: 'success',
  closed: 'subtle',
} as const satisfies Record<FindingStatus, string>;

/** The severity in words (the colour only repeats it). */
export function SeverityBadge({ severity }: { severity: FindingSeverity }) {
  return (
    <Badge appearance="tint" color={severityColor[severity]}>
      {severityLabels[severity]}
    </Badge>
  );
}

export function FindingStatusBadge({ status }: { status: FindingStatus }) {
  return (
    <Badge appearance="outline" color={statusColor[status]}>
      {statusLabels[status]}
    </Badge>
  );
}
