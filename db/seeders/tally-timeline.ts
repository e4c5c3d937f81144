import type { TallyEventKind } from '../../packages/core/src/contract/tallies';
import { between, type Random } from './demo-random';
import type { LatestTallyState } from './demo-tally-scenario';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

/** Who acts: the person who files the chapter's tallies, or the one who reviews them. */
export type Actor = 'filer' | 'reviewer';

export interface TimelineEvent {
  kind: TallyEventKind;
  revision: number;
  at: Date;
  actor: Actor;
}

export interface TimelineStory {
  state: LatestTallyState;
  late: boolean;
  returnedOnce: boolean;
  amended: boolean;
}

function at(isoDate: string, days: number, hour: number, minute: number): Date {
  return new Date(Date.parse(`${isoDate}T00:00:00Z`) + days * DAY + hour * HOUR + minute * 60_000);
}

/** A time of the working day, `days` after `from`'s date. */
function workingTime(random: Random, from: Date, days: number): Date {
  return at(from.toISOString().slice(0, 10), days, between(random, 8, 20), between(random, 0, 59));
}

function later(random: Random, after: Date, minDays: number, maxDays: number): Date {
  const next = workingTime(random, after, between(random, minDays, maxDays));
  return next > after ? next : new Date(after.getTime() + between(random, 1, 5) * HOUR);
}

/**
 * The review trail of a month's tally, filed after the month is over: created in the first days
 * of the next month, submitted a few days before the due date (or after it when late), reviewed
 * a few days later, amended a week or so after approval. Never before `notBefore`.
 */
export function monthTimeline(
  random: Random,
  story: TimelineStory,
  opensOn: string,
  dueOn: string,
  notBefore: Date,
): TimelineEvent[] {
  const created = new Date(
    Math.max(
      notBefore.getTime() + 2 * HOUR,
      at(opensOn, between(random, 0, 3), between(random, 8, 20), between(random, 0, 59)).getTime(),
    ),
  );
  const events: TimelineEvent[] = [{ kind: 'created', revision: 1, at: created, actor: 'filer' }];
  if (story.state === 'draft') return events;

  const due = at(dueOn, 0, 0, 0);
  // Late ones stay within the next month, so the month after is filed in order.
  let submitted = story.late
    ? workingTime(random, due, between(random, 1, 8))
    : workingTime(random, due, -between(random, 1, 6));
  if (submitted.getTime() < created.getTime() + 2 * HOUR) {
    submitted = new Date(created.getTime() + between(random, 3, 30) * HOUR);
  }
  events.push({ kind: 'submitted', revision: 1, at: submitted, actor: 'filer' });
  if (story.returnedOnce || story.state === 'returned') {
    const returned = later(random, submitted, 1, 3);
    events.push({ kind: 'returned', revision: 1, at: returned, actor: 'reviewer' });
    if (story.state === 'returned') return events;
    submitted = later(random, returned, 1, 3);
    events.push({ kind: 'submitted', revision: 1, at: submitted, actor: 'filer' });
  }
  if (story.state === 'submitted') return events;

  const approved = later(random, submitted, 1, 4);
  events.push({ kind: 'approved', revision: 1, at: approved, actor: 'reviewer' });
  if (!story.amended) return events;
  const started = later(random, approved, 2, 6);
  const resubmitted = new Date(started.getTime() + between(random, 2, 20) * HOUR);
  events.push(
    { kind: 'amendment_started', revision: 2, at: started, actor: 'filer' },
    { kind: 'submitted', revision: 2, at: resubmitted, actor: 'filer' },
    { kind: 'approved', revision: 2, at: later(random, resubmitted, 1, 3), actor: 'reviewer' },
  );
  return events;
}

/**
 * The trail of last month's tally, which can only have happened between `from` (the start of this
 * month) and `to` (now): spread over that window in order. Null when the window is too short.
 */
export function recentTimeline(
  random: Random,
  state: LatestTallyState,
  from: Date,
  to: Date,
): TimelineEvent[] | null {
  const kinds: Array<[TallyEventKind, Actor]> = [['created', 'filer']];
  if (state !== 'draft') kinds.push(['submitted', 'filer']);
  if (state === 'approved') kinds.push(['approved', 'reviewer']);
  if (state === 'returned') kinds.push(['returned', 'reviewer']);
  const minutes = Math.floor((to.getTime() - from.getTime()) / 60_000);
  if (minutes < 60) return null;
  const offsets = kinds.map(() => between(random, 1, minutes - 4)).sort((a, b) => a - b);
  return kinds.map(([kind, actor], index) => ({
    kind,
    revision: 1,
    // Distinct minutes, in order, all before `to`.
    at: new Date(from.getTime() + (offsets[index] + index) * 60_000),
    actor,
  }));
}
