/** Audit findings and the responses to them (issue #8). */
import type { Page } from './users';

/** Our own three-step scale: how much a finding matters to the figures funders see. */
export const FINDING_SEVERITIES = ['low', 'medium', 'high'] as const;
export type FindingSeverity = (typeof FINDING_SEVERITIES)[number];

/**
 * open → responded (staff answered; the auditor may still edit) → closed (by the auditor, final).
 * A response to a closed finding is refused; a response to a responded one is simply added.
 */
export const FINDING_STATUSES = ['open', 'responded', 'closed'] as const;
export type FindingStatus = (typeof FINDING_STATUSES)[number];

/**
 * What a finding points at. `reference` is, by kind: a trace reference ('region:3:2026-Q1'),
 * a sample id ('12'), a sample item ('12:345', sample id and item id), a monthly tally id or a
 * parcel receipt id.
 */
export const FINDING_LINK_KINDS = ['trace', 'sample', 'sample_item', 'tally', 'receipt'] as const;
export type FindingLinkKind = (typeof FINDING_LINK_KINDS)[number];

export interface FindingLink {
  kind: FindingLinkKind;
  reference: string;
}

export const FINDING_TITLE_MAX = 200;
export const FINDING_BODY_MAX = 10_000;
export const FINDING_LINKS_MAX = 20;

/** POST /api/findings */
export interface CreateFindingRequest {
  title: string;
  body: string;
  severity: FindingSeverity;
  links?: FindingLink[];
}

/**
 * PATCH /api/findings/:id: the auditor who wrote it, while it is not closed. Fields left out
 * stay; links are only added (one already there is skipped), never removed. `version` is the
 * one read (409 when stale).
 */
export interface UpdateFindingRequest {
  version: number;
  title?: string;
  body?: string;
  severity?: FindingSeverity;
  addLinks?: FindingLink[];
}

/** POST /api/findings/:id/responses */
export interface FindingResponseRequest {
  body: string;
}

/** POST /api/findings/:id/close */
export interface CloseFindingRequest {
  version: number;
}

export interface FindingResponseView {
  id: number;
  body: string;
  respondedBy: string;
  respondedAt: string;
}

export interface FindingSummaryView {
  id: number;
  title: string;
  severity: FindingSeverity;
  status: FindingStatus;
  createdBy: string;
  /** The author's user id: the one who may edit or close it. */
  createdById: number;
  createdAt: string;
  updatedAt: string;
  version: number;
  responseCount: number;
}

/** GET /api/findings/:id: responses oldest first. */
export interface FindingView extends FindingSummaryView {
  body: string;
  /** In the order they were added. */
  links: FindingLink[];
  responses: FindingResponseView[];
  closedAt: string | null;
}

/** GET /api/findings: newest first. */
export interface ListFindingsParams {
  status?: FindingStatus;
  severity?: FindingSeverity;
  page?: number;
  pageSize?: number;
}

export type FindingPage = Page<FindingSummaryView>;
