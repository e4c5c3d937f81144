import { ROLE_SCOPE } from '@tallyloom/core';
import { Op, type WhereOptions } from 'sequelize';
import type { Actor } from './actor';

/**
 * The one place that turns a person's role into the rows they may see. Every service that reads
 * regional or chapter data builds its `where` through these helpers, so no list or detail query
 * can forget the filter. A row outside scope is simply not found (404), never revealed.
 */

/** Rows of the `regions` table (or anything keyed by a region id column). */
export function regionScope(actor: Actor, regionIdColumn = 'id'): WhereOptions {
  switch (ROLE_SCOPE[actor.role]) {
    case 'network':
      return {};
    case 'region':
    case 'chapter':
      return { [regionIdColumn]: actor.regionId ?? -1 };
  }
}

/** Rows keyed by a chapter (chapters themselves, receipts, tallies, …). */
export function chapterScope(
  actor: Actor,
  columns: { chapterId: string; regionId?: string } = { chapterId: 'id', regionId: 'regionId' },
): WhereOptions {
  switch (ROLE_SCOPE[actor.role]) {
    case 'network':
      return {};
    case 'region':
      if (!columns.regionId)
        throw new Error('chapterScope needs a region column for regional roles');
      return { [columns.regionId]: actor.regionId ?? -1 };
    case 'chapter':
      return { [columns.chapterId]: actor.chapterId ?? -1 };
  }
}

/** Combines a scope with the caller's own filters (both must hold). */
export function within(scope: WhereOptions, filters: WhereOptions): WhereOptions {
  return { [Op.and]: [scope, filters] };
}
