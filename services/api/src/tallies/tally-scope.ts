import type { IncludeOptions, WhereOptions } from 'sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope } from '../common/access/scope';

/** Tallies in the person's scope; queries must include SCOPE_CHAPTER (the region is the chapter's). */
export function tallyScope(actor: Actor): WhereOptions {
  return chapterScope(actor, { chapterId: 'chapterId', regionId: '$chapter.region_id$' });
}

export const SCOPE_CHAPTER: IncludeOptions = { model: Chapter, attributes: [], required: true };
