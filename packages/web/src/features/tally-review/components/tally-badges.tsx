import { Badge } from '@fluentui/react-components';
import { REPORTING_STATUS_LABELS, type ReportingStatus } from '@tallyloom/core';

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
