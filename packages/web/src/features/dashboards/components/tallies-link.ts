import { can, type Period, type Role } from '@tallyloom/core';
import { paths } from '@/config/paths';
import type { DashboardTarget } from '../api/get-dashboard';

/**
 * Where the tallies behind a figure are listed, or null for a role that sees aggregates only.
 * Reviewers get the review queue of approved tallies, in the queue's own URL format
 * (`?state=approved&region=…&chapter=…&month=…`, see tally-review's queue-query.ts); it filters
 * by one month, so longer periods open the queue for the whole scope. Others who read tallies
 * get the tally months of the chapter.
 */
export function talliesHref(
  role: Role,
  target: DashboardTarget,
  period: Pick<Period, 'from' | 'to'>,
): string | null {
  if (can(role, 'tallies.review')) {
    const params = new URLSearchParams({ state: 'approved' });
    if (target.scope === 'region') params.set('region', String(target.id));
    if (target.scope === 'chapter') params.set('chapter', String(target.id));
    if (period.from === period.to) params.set('month', period.from);
    return paths.tallyReview.getHref(`?${params.toString()}`);
  }
  if (can(role, 'tallies.read')) {
    // Chapter leads see their own chapter's months; other readers choose the chapter there.
    return target.scope === 'chapter' && role !== 'chapter_lead'
      ? `${paths.tallies.getHref()}?chapter=${target.id}`
      : paths.tallies.getHref();
  }
  return null;
}
