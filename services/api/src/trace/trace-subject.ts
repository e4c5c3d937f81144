import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { ROLE_SCOPE } from '@tallyloom/core';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope, regionScope, within } from '../common/access/scope';
import type { SnapshotSubject } from '../dashboards/snapshot-assembly';
import { Region } from '../regions/models/region.model';
import type { TraceTarget } from './trace-reference';

/**
 * Whose figure a trace is, checked against the person's scope in the query: the network for
 * network-wide roles, a region for them and its coordinator, a chapter for all of those and its
 * lead. Anything else is not found (404), as on the dashboards.
 */
@Injectable()
export class TraceSubjects {
  constructor(
    @InjectModel(Region) private readonly regions: typeof Region,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
  ) {}

  async resolve(actor: Actor, target: TraceTarget): Promise<SnapshotSubject> {
    const reach = ROLE_SCOPE[actor.role];
    if (target.scope === 'network') {
      if (reach !== 'network') throw new NotFoundException('No such figure in your scope.');
      return { scope: 'network', scopeId: null, scopeName: 'Whole network' };
    }
    if (target.scope === 'region') {
      // A chapter lead's figures are their chapter's, even though the region is theirs too.
      const region =
        reach === 'chapter'
          ? null
          : await this.regions.findOne({
              where: within(regionScope(actor), { id: target.scopeId }),
              attributes: ['id', 'name'],
            });
      if (!region) throw new NotFoundException('No such region.');
      return { scope: 'region', scopeId: region.id, scopeName: region.name };
    }
    const chapter = await this.chapters.findOne({
      where: within(chapterScope(actor), { id: target.scopeId }),
      attributes: ['id', 'name'],
    });
    if (!chapter) throw new NotFoundException('No such chapter.');
    return { scope: 'chapter', scopeId: chapter.id, scopeName: chapter.name };
  }
}
