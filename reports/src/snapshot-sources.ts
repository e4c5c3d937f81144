/**
 * Which tally revisions a snapshot was built from. A region's month names its own: the approved
 * revision of each of its chapters' tallies of that month. Every other stored snapshot (a
 * region's quarter or fiscal year, the network in any period) adds up region months and names
 * its revisions through them, so each revision is stored once instead of six times: in a full
 * rebuild those repeated lists were most of the megabytes written.
 */
import { monthsOf, type Period, type SnapshotScope } from '@tallyloom/core';
import type { SqlQuery } from './sql';

/** A source revision: [tallyId, revision]. */
export type SourceRevision = [number, number];

/**
 * Whether a snapshot of this scope and period lists its own source revisions: a chapter's
 * (built live, never stored) and a region's month do; the rest add up region months.
 */
export function namesOwnSources(target: {
  scope: SnapshotScope;
  period: Pick<Period, 'kind'>;
}): boolean {
  return (
    target.scope === 'chapter' || (target.scope === 'region' && target.period.kind === 'month')
  );
}

/**
 * The stored region months a stored snapshot adds up, each with its source revisions
 * (`source_revisions`): the region's own months in the period, or every region's for the
 * network.
 */
export function sourcesOfStoredSql(
  scope: Exclude<SnapshotScope, 'chapter'>,
  scopeId: number,
  period: Pick<Period, 'from' | 'to'>,
): SqlQuery {
  const months = monthsOf(period);
  const region = scope === 'region' ? 'AND scope_id = :regionId' : '';
  return {
    sql: `SELECT source_revisions FROM report_snapshots
           WHERE scope = 'region' AND period_kind = 'month' AND period_key IN (:months) ${region}`,
    replacements: { months, regionId: scopeId },
  };
}

/**
 * Lists of source revisions as one, sorted by tally id: a tally has one approved revision, so
 * the lists of different months and regions never name the same tally twice.
 */
export function mergeSources(lists: ReadonlyArray<readonly SourceRevision[]>): SourceRevision[] {
  const merged: SourceRevision[] = [];
  for (const list of lists) for (const source of list) merged.push(source);
  return merged.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
}
