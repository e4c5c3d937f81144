import type {
  FindingLink,
  FindingResponseView,
  FindingSummaryView,
  FindingView,
} from '@tallyloom/core';
import type { AuditFindingLink } from './models/audit-finding-link.model';
import type { AuditFindingResponse } from './models/audit-finding-response.model';
import type { AuditFinding } from './models/audit-finding.model';

// Users are deactivated, never deleted, so the author and responders are there.
const nameOf = (user: { displayName: string } | undefined, id: number) =>
  user?.displayName ?? `user ${id}`;

export function toSummaryView(finding: AuditFinding, responseCount: number): FindingSummaryView {
  return {
    id: finding.id,
    title: finding.title,
    severity: finding.severity,
    status: finding.status,
    createdBy: nameOf(finding.author, finding.createdBy),
    createdById: finding.createdBy,
    createdAt: finding.createdAt.toISOString(),
    updatedAt: finding.updatedAt.toISOString(),
    version: finding.version,
    responseCount,
  };
}

export function toLinkView(link: AuditFindingLink): FindingLink {
  return { kind: link.kind, reference: link.reference };
}

export function toResponseView(response: AuditFindingResponse): FindingResponseView {
  return {
    id: response.id,
    body: response.body,
    respondedBy: nameOf(response.responder, response.respondedBy),
    respondedAt: response.respondedAt.toISOString(),
  };
}

export function toFindingView(
  finding: AuditFinding,
  links: readonly AuditFindingLink[],
  responses: readonly AuditFindingResponse[],
): FindingView {
  return {
    ...toSummaryView(finding, responses.length),
    body: finding.body,
    links: links.map(toLinkView),
    responses: responses.map(toResponseView),
    closedAt: finding.closedAt ? finding.closedAt.toISOString() : null,
  };
}

/** What the audit log keeps of a finding: enough to read every edit's before and after. */
export function auditableFinding(
  finding: AuditFinding,
  links: readonly FindingLink[],
): Record<string, unknown> {
  return {
    title: finding.title,
    body: finding.body,
    severity: finding.severity,
    status: finding.status,
    version: finding.version,
    links: links.map((link) => ({ kind: link.kind, reference: link.reference })),
  };
}
