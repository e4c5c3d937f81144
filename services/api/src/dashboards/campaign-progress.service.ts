import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import {
  campaignProgress,
  ROLE_SCOPE,
  type CampaignProgressView,
  type PublicCampaignProgress,
} from '@tallyloom/core';
import type { CampaignSnapshotFigures } from '@tallyloom/reports';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { Actor } from '../common/access/actor';
import { isoDate, isoTimestamp, jsonColumn } from '../common/sql/column-values';
import { toPublicProgress } from './public-progress';

const SELECT_CAMPAIGNS = `
  SELECT c.id, c.code, c.name, c.goal_panels AS goalPanels, c.starts_on AS startsOn,
         c.ends_on AS endsOn, s.figures, s.as_of AS asOf
    FROM campaigns c
    LEFT JOIN campaign_snapshots s ON s.campaign_id = c.id`;

/**
 * Campaign progress from campaign snapshots; the pace is worked out on each request with today's
 * date, so weeks elapsed and the pace still needed are current between rebuilds.
 */
@Injectable()
export class CampaignProgressService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** Campaigns in scope, latest start first (the rule of the campaigns list). */
  async list(actor: Actor): Promise<CampaignProgressView[]> {
    const { where, replacements } = campaignScope(actor);
    const rows = await this.read(
      `${SELECT_CAMPAIGNS} WHERE ${where} ORDER BY c.starts_on DESC, c.code ASC`,
      replacements,
    );
    return rows.map((row) => toProgress(row, new Date()));
  }

  async get(actor: Actor, id: number): Promise<CampaignProgressView> {
    const { where, replacements } = campaignScope(actor);
    const [row] = await this.read(`${SELECT_CAMPAIGNS} WHERE c.id = :id AND ${where}`, {
      ...replacements,
      id,
    });
    if (!row) throw new NotFoundException('No such campaign.');
    return toProgress(row, new Date());
  }

  /** The shareable page: any campaign by its code, counts only. */
  async publicProgress(code: string): Promise<PublicCampaignProgress> {
    const [row] = await this.read(`${SELECT_CAMPAIGNS} WHERE c.code = :code`, {
      // Codes are stored upper-case, as written on parcel labels.
      code: code.trim().toUpperCase(),
    });
    if (!row) throw new NotFoundException('No campaign has this code.');
    return toPublicProgress(toProgress(row, new Date()));
  }

  private read(sql: string, replacements: Record<string, unknown>) {
    return this.sequelize.query<Record<string, unknown>>(sql, {
      type: QueryTypes.SELECT,
      replacements,
    });
  }
}

/** Network-wide campaigns are everyone's; a regional one belongs to its region's people. */
function campaignScope(actor: Actor): { where: string; replacements: Record<string, unknown> } {
  if (ROLE_SCOPE[actor.role] === 'network') return { where: '1 = 1', replacements: {} };
  return {
    where: '(c.region_id IS NULL OR c.region_id = :regionId)',
    replacements: { regionId: actor.regionId ?? -1 },
  };
}

function toProgress(row: Record<string, unknown>, now: Date): CampaignProgressView {
  // No snapshot yet: nothing has been credited, as of now.
  const figures: CampaignSnapshotFigures = row.figures
    ? jsonColumn<CampaignSnapshotFigures>(row.figures)
    : { creditedPanels: 0, pendingPanels: 0, weekly: [] };
  const base = {
    campaignId: Number(row.id),
    code: String(row.code),
    name: String(row.name),
    goalPanels: Number(row.goalPanels),
    startsOn: isoDate(row.startsOn),
    endsOn: isoDate(row.endsOn),
    asOf: row.asOf ? isoTimestamp(row.asOf) : now.toISOString(),
  };
  const pace = campaignProgress({
    goalPanels: base.goalPanels,
    startsOn: base.startsOn,
    endsOn: base.endsOn,
    today: now.toISOString().slice(0, 10),
    // A start date moved since the last rebuild leaves weeks off the new grid until the next one.
    weekly: figures.weekly.filter((week) => onWeekGrid(base.startsOn, week.weekStart)),
    creditedPanels: figures.creditedPanels,
    pendingPanels: figures.pendingPanels,
    asOf: base.asOf,
  });
  return { campaignId: base.campaignId, code: base.code, name: base.name, ...pace };
}

/** True for a week start on or after the campaign's start, a whole number of weeks after it. */
function onWeekGrid(startsOn: string, weekStart: string): boolean {
  const days =
    (Date.parse(`${weekStart}T00:00:00Z`) - Date.parse(`${startsOn}T00:00:00Z`)) / 86_400_000;
  return Number.isInteger(days) && days >= 0 && days % 7 === 0;
}
