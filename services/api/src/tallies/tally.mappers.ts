import {
  headlineOf,
  monthLabel,
  reportingStatus,
  tallyDueOn,
  type TallyEvent as TallyEventView,
  type TallyRevisionSummary,
  type TallySummary,
  type TallyValues,
} from '@tallyloom/core';
import type { Chapter } from '../chapters/models/chapter.model';
import type { MonthlyTally } from './models/monthly-tally.model';
import type { TallyEvent } from './models/tally-event.model';
import type { TallyRevision } from './models/tally-revision.model';
import { monthKeyOf } from './tally-check-context';

export type Names = ReadonlyMap<number, string>;

const iso = (date: Date | null) => (date ? date.toISOString() : null);
const nameOf = (names: Names, id: number | null) => (id === null ? null : (names.get(id) ?? null));

export interface SummaryParts {
  current: TallyRevision;
  approved: TallyRevision | null;
  values: TallyValues;
  names: Names;
  today: string;
}

/** The tally must be loaded with its chapter and the chapter's region. */
export function toTallySummary(tally: MonthlyTally, parts: SummaryParts): TallySummary {
  const chapter = tally.chapter as Chapter;
  const month = monthKeyOf(tally.month);
  const firstSubmittedAt = iso(tally.firstSubmittedAt);
  return {
    id: tally.id,
    chapterId: tally.chapterId,
    chapterName: chapter.name,
    regionId: chapter.regionId,
    regionName: chapter.region?.name ?? '',
    month,
    state: tally.state,
    revision: tally.currentRevision,
    approvedRevision: tally.approvedRevision,
    amendmentPending: isAmendmentPending(tally),
    dueOn: tallyDueOn(month, chapter.reportingDueDay),
    reporting: reportingStatus({
      month,
      dueDay: chapter.reportingDueDay,
      firstSubmittedAt,
      today: parts.today,
    }),
    firstSubmittedAt,
    submittedAt: iso(parts.current.submittedAt),
    approvedAt: iso(parts.approved?.approvedAt ?? null),
    approvedByName: nameOf(parts.names, parts.approved?.approvedBy ?? null),
    openingEnteredByHand: tally.openingEnteredByHand,
    headline: headlineOf(parts.values),
    version: tally.version,
    updatedAt: tally.updatedAt.toISOString(),
  };
}

/** An approved tally whose newer revision is not approved yet. */
export function isAmendmentPending(
  tally: Pick<MonthlyTally, 'approvedRevision' | 'currentRevision'>,
): boolean {
  return tally.approvedRevision !== null && tally.approvedRevision !== tally.currentRevision;
}

export function toRevisionSummary(revision: TallyRevision, names: Names): TallyRevisionSummary {
  return {
    revision: revision.revision,
    state: revision.state,
    amendmentReason: revision.amendmentReason,
    createdAt: revision.createdAt.toISOString(),
    createdByName: nameOf(names, revision.createdBy),
    submittedAt: iso(revision.submittedAt),
    submittedByName: nameOf(names, revision.submittedBy),
    approvedAt: iso(revision.approvedAt),
    approvedByName: nameOf(names, revision.approvedBy),
  };
}

/** JSON columns may come back parsed or as text, depending on the driver. */
export function acknowledgedWarningsOf(revision: TallyRevision): string[] {
  const raw = revision.acknowledgedWarnings;
  const value: unknown = typeof raw === 'string' ? JSON.parse(raw) : raw;
  return Array.isArray(value)
    ? value.filter((code): code is string => typeof code === 'string')
    : [];
}

export function toEventView(event: TallyEvent, names: Names): TallyEventView {
  return {
    kind: event.kind,
    revision: event.revision,
    at: event.createdAt.toISOString(),
    byName: nameOf(names, event.actorId),
    comment: event.comment,
  };
}

/** 'the tally of Mar 2026 for Alder Falls', for messages. */
export function describeTally(month: string, chapterName: string): string {
  return `the tally of ${monthLabel(monthKeyOf(month))} for ${chapterName}`;
}
