import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import {
  IMPACT_PACK_SCOPES,
  monthsOf,
  periodDates,
  ROLE_LABELS,
  tracePath,
  traceReference,
  type DashboardView,
  type ImpactPackRequest,
  type Role,
} from '@tallyloom/core';
import {
  agencyKindFiguresSql,
  agencyKindRows,
  chaptersWithoutApprovedTallySql,
  type HourValueSetting,
  type SqlQuery,
} from '@tallyloom/reports';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { Actor } from '../common/access/actor';
import { invalidField } from '../common/validation/field-errors';
import { AppConfig } from '../config/app-config';
import { CampaignProgressService } from '../dashboards/campaign-progress.service';
import { oldestAsOf } from '../dashboards/snapshot-assembly';
import { DashboardsService } from '../dashboards/dashboards.service';
import { SettingsService } from '../settings/settings.service';
import type { ImpactFigureRow, ImpactPackData } from './impact-pack-data';

type Row = Record<string, unknown>;

/**
 * Gathers an impact pack's figures. Headline, by-scope and by-month figures come from the very
 * dashboard the requester would see for the same scope and period, so the two never disagree;
 * scope checks are the dashboard's (out of scope: 404).
 */
@Injectable()
export class ImpactPackDataService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly dashboards: DashboardsService,
    private readonly campaignProgress: CampaignProgressService,
    private readonly settings: SettingsService,
    private readonly config: AppConfig,
  ) {}

  async gather(params: ImpactPackRequest, actor: Actor): Promise<ImpactPackData> {
    const { scope, scopeId } = checkScope(params);
    const query = {
      periodKind: params.periodKind,
      period: params.period,
      from: params.from,
      to: params.to,
    };
    // A campaign pack shows its area: the campaign's region, or the network for a network-wide one.
    const campaign = scope === 'campaign' ? await this.campaign(actor, scopeId!) : null;
    const regionId = scope === 'region' ? scopeId! : (campaign?.regionId ?? null);
    const dashboard = regionId
      ? await this.dashboards.region(actor, regionId, query)
      : await this.dashboards.network(actor, query);
    const area = regionId
      ? { scope: 'region' as const, scopeId: regionId }
      : { scope: 'network' as const, scopeId: null };
    const { period } = dashboard;
    const chapterIds = await this.chapterIds(regionId);

    const [requester, settings, kinds, hourValues, withoutTally, campaigns] = await Promise.all([
      this.requester(actor),
      this.settings.current(),
      this.select(agencyKindFiguresSql({ chapterIds, from: period.from, to: period.to })),
      this.hourValues(),
      this.select(
        chaptersWithoutApprovedTallySql({ chapterIds, from: period.from, to: period.to }),
      ),
      this.campaigns(actor, period, regionId, campaign?.id ?? null),
    ]);

    const months = new Set(monthsOf(period));
    const trend = dashboard.trend.filter((view) => months.has(view.period.from));
    return {
      scope,
      scopeName: campaign
        ? `${campaign.name} (${campaign.code}) · ${dashboard.scopeName}`
        : dashboard.scopeName,
      area,
      childScope: regionId ? 'chapter' : 'region',
      period,
      fiscalYearStartMonth: settings.fiscalYearStartMonth,
      asOf: asOfShown(dashboard, trend),
      requester,
      exportedAt: new Date(),
      headline: dashboard.current.figures,
      compliance: dashboard.current.compliance,
      pendingTallies: dashboard.current.pendingTallies,
      byChild: dashboard.breakdown.map((view) => ({
        label: view.scopeName,
        figures: view.figures,
        pendingTallies: view.pendingTallies,
        ...this.trace(traceReference(view.scope, view.scopeId, period.key)),
      })),
      byMonth: trend.map((view) => ({
        label: view.period.from,
        figures: view.figures,
        pendingTallies: view.pendingTallies,
        ...this.trace(traceReference(area.scope, area.scopeId, view.period.key)),
      })),
      byAgencyKind: agencyKindRows(kinds),
      campaigns,
      hourValues,
      chaptersWithoutApprovedTally: withoutTally.map((row) => String(row.name)),
    };
  }

  /** A row's trace key and the address that opens it (every measure: the row shows them all). */
  private trace(reference: string): Pick<ImpactFigureRow, 'traceReference' | 'traceUrl'> {
    return { traceReference: reference, traceUrl: `${this.config.appUrl}${tracePath(reference)}` };
  }

  private async campaign(actor: Actor, id: number) {
    // The progress service applies the campaign scope rule (out of scope: 404).
    const progress = await this.campaignProgress.get(actor, id);
    const [row] = await this.select({
      sql: 'SELECT region_id FROM campaigns WHERE id = :id',
      replacements: { id },
    });
    if (!row) throw new NotFoundException('No such campaign.');
    return {
      id,
      code: progress.code,
      name: progress.name,
      regionId: row.region_id === null ? null : Number(row.region_id),
    };
  }

  private async chapterIds(regionId: number | null): Promise<number[]> {
    const rows = await this.select(
      regionId
        ? { sql: 'SELECT id FROM chapters WHERE region_id = :regionId', replacements: { regionId } }
        : { sql: 'SELECT id FROM chapters', replacements: {} },
    );
    return rows.map((row) => Number(row.id));
  }

  private async requester(actor: Actor): Promise<ImpactPackData['requester']> {
    const [row] = await this.select({
      sql: 'SELECT display_name, role FROM users WHERE id = :id',
      replacements: { id: actor.id },
    });
    const role = (row?.role ?? actor.role) as Role;
    return {
      name: typeof row?.display_name === 'string' ? row.display_name : actor.email,
      role,
      roleLabel: ROLE_LABELS[role],
    };
  }

  private async hourValues(): Promise<HourValueSetting[]> {
    const rows = await this.select({
      sql: 'SELECT data_year, hourly_value, currency, source FROM volunteer_hour_values ORDER BY data_year',
      replacements: {},
    });
    return rows.map((row) => ({
      dataYear: Number(row.data_year),
      // DECIMAL(8,2) arrives as text.
      hourlyValue: Number(row.hourly_value),
      currency: String(row.currency),
      source: String(row.source),
    }));
  }

  /** Campaigns overlapping the period in the pack's area (a campaign pack: that one alone). */
  private async campaigns(
    actor: Actor,
    period: { from: string; to: string },
    regionId: number | null,
    only: number | null,
  ) {
    const [all, regions] = await Promise.all([
      this.campaignProgress.list(actor),
      this.select({ sql: 'SELECT id, region_id FROM campaigns', replacements: {} }),
    ]);
    const regionOf = new Map(regions.map((row) => [Number(row.id), row.region_id]));
    const { fromDate: first, toDate: last } = periodDates(period);
    return all
      .filter((campaign) =>
        only !== null
          ? campaign.campaignId === only
          : campaign.startsOn <= last &&
            campaign.endsOn >= first &&
            (regionId === null ||
              regionOf.get(campaign.campaignId) === null ||
              Number(regionOf.get(campaign.campaignId)) === regionId),
      )
      .sort((a, b) => a.startsOn.localeCompare(b.startsOn) || a.code.localeCompare(b.code));
  }

  private select(query: SqlQuery): Promise<Row[]> {
    return this.sequelize.query<Row>(query.sql, {
      type: QueryTypes.SELECT,
      replacements: query.replacements,
    });
  }
}

function checkScope(params: ImpactPackRequest): {
  scope: ImpactPackRequest['scope'];
  scopeId?: number;
} {
  if (!(IMPACT_PACK_SCOPES as readonly string[]).includes(params.scope)) {
    throw invalidField('scope', `scope must be one of: ${IMPACT_PACK_SCOPES.join(', ')}.`);
  }
  if (params.scope === 'network') return { scope: 'network' };
  const id = Number(params.scopeId);
  if (!Number.isInteger(id) || id < 1) {
    throw invalidField(
      'scopeId',
      `scopeId must be the ${params.scope}'s id (a positive whole number).`,
    );
  }
  return { scope: params.scope, scopeId: id };
}

/** The oldest "as of" of the snapshots the pack lays out (not the dashboard's previous period). */
function asOfShown(dashboard: DashboardView, trend: DashboardView['trend']): string {
  return oldestAsOf([dashboard.current, ...trend, ...dashboard.breakdown].map((view) => view.asOf));
}
