import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import {
  addMonths,
  monthPeriod,
  monthsBetween,
  monthsOf,
  previousPeriod,
  ROLE_SCOPE,
  type DashboardView,
  type MonthKey,
  type Period,
  type SnapshotScope,
} from '@tallyloom/core';
import { Chapter } from '../chapters/models/chapter.model';
import { ViewCache } from '../cache/view-cache';
import type { Actor } from '../common/access/actor';
import { chapterScope, regionScope, within } from '../common/access/scope';
import { Region } from '../regions/models/region.model';
import { SettingsService } from '../settings/settings.service';
import { resolvePeriod, type PeriodQuery } from './dashboard-period';
import { oldestAsOf, snapshotOf, type SnapshotSubject } from './snapshot-assembly';
import { SnapshotReader } from './snapshot-reader';
import type { SnapshotRow } from './snapshot-rows';

const NETWORK: SnapshotSubject = { scope: 'network', scopeId: null, scopeName: 'Whole network' };

interface Child {
  id: number;
  name: string;
}

/** Dashboards of the network, a region or a chapter, read from report snapshots. */
@Injectable()
export class DashboardsService {
  constructor(
    private readonly snapshots: SnapshotReader,
    private readonly settings: SettingsService,
    @InjectModel(Region) private readonly regions: typeof Region,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    private readonly cache: ViewCache,
  ) {}

  /** Network-wide roles only: the others are pointed to their own dashboard. */
  async network(actor: Actor, query: PeriodQuery): Promise<DashboardView> {
    const reach = ROLE_SCOPE[actor.role];
    if (reach === 'region')
      throw new ForbiddenException(
        `Your dashboard is your region's: /api/dashboards/regions/${actor.regionId ?? ':id'}`,
      );
    if (reach === 'chapter')
      throw new ForbiddenException(
        `Your dashboard is your chapter's: /api/dashboards/chapters/${actor.chapterId ?? ':id'}`,
      );
    return this.cache.remember(cacheKey('network', 0, query), async () => {
      const regions = await this.regions.findAll({
        attributes: ['id', 'name'],
        order: [['name', 'ASC']],
      });
      return this.dashboard(NETWORK, 'region', regions, query);
    });
  }

  /** A region in scope; a chapter lead's dashboard is their chapter's, so regions are not found. */
  async region(actor: Actor, id: number, query: PeriodQuery): Promise<DashboardView> {
    const region =
      ROLE_SCOPE[actor.role] === 'chapter'
        ? null
        : await this.regions.findOne({
            where: within(regionScope(actor), { id }),
            attributes: ['id', 'name'],
          });
    if (!region) throw new NotFoundException('No such region.');
    return this.cache.remember(cacheKey('region', region.id, query), async () => {
      const chapters = await this.chapters.findAll({
        where: { regionId: id },
        attributes: ['id', 'name'],
        order: [['name', 'ASC']],
      });
      return this.dashboard(
        { scope: 'region', scopeId: region.id, scopeName: region.name },
        'chapter',
        chapters,
        query,
      );
    });
  }

  async chapter(actor: Actor, id: number, query: PeriodQuery): Promise<DashboardView> {
    const chapter = await this.chapters.findOne({
      where: within(chapterScope(actor), { id }),
      attributes: ['id', 'name', 'regionId'],
    });
    if (!chapter) throw new NotFoundException('No such chapter.');
    return this.cache.remember(cacheKey('chapter', chapter.id, query), () =>
      this.dashboard(
        { scope: 'chapter', scopeId: chapter.id, scopeName: chapter.name },
        'chapter',
        [],
        query,
      ),
    );
  }

  private async dashboard(
    subject: SnapshotSubject,
    childScope: SnapshotScope,
    children: readonly Child[],
    query: PeriodQuery,
  ): Promise<DashboardView> {
    const now = new Date();
    const { fiscalYearStartMonth } = await this.settings.current();
    const lastComplete = addMonths(now.toISOString().slice(0, 7), -1);
    const period = resolvePeriod(query, fiscalYearStartMonth, lastComplete);
    const previous = previousPeriod(period, fiscalYearStartMonth);
    const trendMonths = trendMonthsOf(period);

    const [own, ofChildren] = await Promise.all([
      this.snapshots.find({
        scope: subject.scope,
        scopeIds: [subject.scopeId ?? 0],
        months: [...new Set([...monthsOf(period), ...monthsOf(previous), ...trendMonths])],
        ...storedKeys([period, previous]),
      }),
      this.snapshots.find({
        scope: childScope,
        scopeIds: children.map((child) => child.id),
        months: monthsOf(period),
        ...storedKeys([period]),
      }),
    ]);

    const asOfNow = now.toISOString();
    const current = snapshotOf(subject, period, own, asOfNow);
    const before = snapshotOf(subject, previous, own, asOfNow);
    const trend = trendMonths.map((month) => snapshotOf(subject, monthPeriod(month), own, asOfNow));
    // Grouped first: a region may have hundreds of chapters, each with months of rows.
    const byChild = new Map<number, SnapshotRow[]>();
    for (const row of ofChildren) {
      const list = byChild.get(row.scopeId);
      if (list) list.push(row);
      else byChild.set(row.scopeId, [row]);
    }
    const breakdown = children.map((child) =>
      snapshotOf(
        { scope: childScope, scopeId: child.id, scopeName: child.name },
        period,
        byChild.get(child.id) ?? [],
        asOfNow,
      ),
    );
    return {
      ...subject,
      period,
      current,
      previous: before,
      trend,
      breakdown,
      asOf: oldestAsOf([current, before, ...trend, ...breakdown].map((view) => view.asOf)),
    };
  }
}

/**
 * A dashboard's cache key: the scope (already checked against the actor) and the period as
 * asked. The default period is last month, so this month is part of the key.
 */
function cacheKey(scope: SnapshotScope, scopeId: number, query: PeriodQuery): string {
  const thisMonth = new Date().toISOString().slice(0, 7);
  const { periodKind, period, from, to } = query;
  return `dashboard:${JSON.stringify([scope, scopeId, thisMonth, periodKind, period, from, to])}`;
}

/** The months of the period, or for a single month the twelve months ending with it. */
export function trendMonthsOf(period: Period): MonthKey[] {
  return period.kind === 'month'
    ? monthsBetween(addMonths(period.from, -11), period.from)
    : monthsOf(period);
}

/** Stored rows exist for the fixed kinds; a custom range is always built from its months. */
function storedKeys(periods: Period[]): {
  kind?: Exclude<Period['kind'], 'custom'>;
  keys?: string[];
} {
  const kind = periods[0].kind;
  if (kind === 'custom') return {};
  return { kind, keys: periods.map((period) => period.key) };
}
