import { Badge, type BadgeProps } from '@fluentui/react-components';
import {
  REPORTING_STATUS_LABELS,
  TALLY_STATE_LABELS,
  type ReportingStatus,
  type TallyState,
} from '@tallyloom/core';

// The word always carries the meaning; the colour only repeats it.
const STATE_COLOURS: Record<TallyState, BadgeProps['color']> = {
  draft: 'subtle',
  submitted: 'brand',
  returned: 'warning',
  approved: 'success',
};

export function TallyStateBadge({ state }: { state: TallyState }) {
  return (
    <Badge appearance="tint" color={STATE_COLOURS[state]} size="medium">
      {TALLY_STATE_LABELS[state]}
    </Badge>
  );
}

/** Marks a tally whose approved figures are being changed by an amendment under review. */
export function AmendmentBadge() {
  return (
    <Badge appearance="outline" color="important" size="small">
      Amendment
    </Badge>
  );
}

const LATE: ReadonlySet<ReportingStatus> = new Set(['late', 'missing']);

export function ReportingText({ status }: { status: ReportingStatus }) {
  return LATE.has(status) ? (
    <Badge appearance="outline" color="danger" size="small">
      {REPORTING_STATUS_LABELS[status]}
    </Badge>
  ) : (
    <>{REPORTING_STATUS_LABELS[status]}</>
  );
}
