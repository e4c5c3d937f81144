/**
 * Campaign credit: the panels that parcel receipts credit to a campaign (by
 * parcel_receipts.campaign_id). A receipt counts as credited once its chapter-month has an
 * approved tally, and as pending until then, mirroring the tally snapshot's rule.
 */
import { bucketByWeek, type WeeklyPanels } from '@tallyloom/core';
import { monthStartDate, requireIds, type SqlQuery } from './sql';

export interface CampaignCreditFilter {
  /** Only these campaigns; all when absent. An empty list matches none. */
  campaignIds?: readonly number[];
}

export const CAMPAIGN_MEASURES = [
  {
    key: 'creditedPanels',
    label: 'Panels credited',
    description:
      'Panels accepted from parcels that named the campaign, in chapter-months whose tally is approved.',
    reads: ['parcel_receipts.panels_accepted', 'parcel_receipts.campaign_id'],
  },
  {
    key: 'pendingPanels',
    label: 'Panels pending',
    description:
      'Panels accepted from parcels that named the campaign, in chapter-months not approved yet: shown beside, not counted.',
    reads: ['parcel_receipts.panels_accepted', 'parcel_receipts.campaign_id'],
  },
] as const;

/**
 * One SELECT yielding one row per campaign × chapter × receipt day: campaign_id, chapter_id,
 * received_on ('YYYY-MM-DD'), panels, and the approved tally of that chapter-month (tally_id and
 * revision, both NULL when the month is not approved: pending).
 */
export function campaignCreditSql(filter: CampaignCreditFilter = {}): SqlQuery {
  const where = ['p.campaign_id IS NOT NULL'];
  const replacements: Record<string, unknown> = { dayFormat: '%Y-%m-%d' };
  if (filter.campaignIds !== undefined) {
    const ids = requireIds('campaignIds', filter.campaignIds);
    if (ids.length === 0) where.push('1 = 0');
    else {
      where.push('p.campaign_id IN (:campaignIds)');
      replacements.campaignIds = ids;
    }
  }
  const sql = [
    'SELECT p.campaign_id, p.chapter_id, DATE_FORMAT(p.received_on, :dayFormat) AS received_on,',
    '  SUM(p.panels_accepted) AS panels, t.id AS tally_id, t.approved_revision AS revision',
    'FROM parcel_receipts p',
    // The tally of the receipt's chapter-month, only when it has an approved revision.
    'LEFT JOIN monthly_tallies t ON t.chapter_id = p.chapter_id',
    "  AND t.month = DATE_FORMAT(p.received_on, '%Y-%m-01') AND t.approved_revision IS NOT NULL",
    `WHERE ${where.join(' AND ')}`,
    'GROUP BY p.campaign_id, p.chapter_id, p.received_on, t.id, t.approved_revision',
    'ORDER BY p.campaign_id, p.received_on, p.chapter_id',
  ].join('\n');
  return { sql, replacements };
}

/** Campaigns credited by one chapter-month's receipts: the ones a tally change touches. */
export function campaignsOfChapterMonthSql(chapterId: number, month: string): SqlQuery {
  const [id] = requireIds('chapterId', [chapterId]);
  const fromDay = monthStartDate('month', month);
  return {
    sql: [
      'SELECT DISTINCT p.campaign_id FROM parcel_receipts p',
      'WHERE p.chapter_id = :chapterId AND p.campaign_id IS NOT NULL',
      '  AND p.received_on >= :fromDay AND p.received_on < :fromDay + INTERVAL 1 MONTH',
    ].join('\n'),
    replacements: { chapterId: id, fromDay },
  };
}

/** What a campaign snapshot stores; pace and projection are worked out from it when read. */
export interface CampaignSnapshotFigures {
  creditedPanels: number;
  pendingPanels: number;
  /** Credited panels per campaign week from the start (through the end date or today). */
  weekly: WeeklyPanels[];
}

/** A row of `campaignCreditSql`, read. */
export interface CampaignCredit {
  campaignId: number;
  chapterId: number;
  receivedOn: string;
  panels: number;
  /** The approved tally of the receipt's chapter-month; null while pending. */
  tallyId: number | null;
  revision: number | null;
}

export function campaignCreditFromRow(row: Record<string, unknown>): CampaignCredit {
  const approved = row.tally_id !== null && row.tally_id !== undefined;
  return {
    campaignId: Number(row.campaign_id),
    chapterId: Number(row.chapter_id),
    receivedOn: String(row.received_on),
    panels: Number(row.panels),
    tallyId: approved ? Number(row.tally_id) : null,
    revision: approved ? Number(row.revision) : null,
  };
}

export interface BuiltCampaignSnapshot {
  campaignId: number;
  figures: CampaignSnapshotFigures;
  sourceRevisions: Array<[number, number]>;
}

/** One campaign's snapshot from its credit rows; weeks run through min(today, end date). */
export function buildCampaignSnapshot(
  campaign: { id: number; startsOn: string; endsOn: string },
  credits: readonly CampaignCredit[],
  today: string,
): BuiltCampaignSnapshot {
  const mine = credits.filter((credit) => credit.campaignId === campaign.id);
  const credited = mine.filter((credit) => credit.tallyId !== null);
  const sources = new Map<string, [number, number]>();
  for (const credit of credited) {
    sources.set(`${credit.tallyId}:${credit.revision}`, [credit.tallyId!, credit.revision!]);
  }
  const through = today < campaign.endsOn ? today : campaign.endsOn;
  return {
    campaignId: campaign.id,
    figures: {
      creditedPanels: credited.reduce((sum, credit) => sum + credit.panels, 0),
      pendingPanels: mine
        .filter((credit) => credit.tallyId === null)
        .reduce((sum, credit) => sum + credit.panels, 0),
      weekly: bucketByWeek(
        campaign.startsOn,
        credited.map((credit) => ({ receivedOn: credit.receivedOn, panels: credit.panels })),
        through >= campaign.startsOn ? through : undefined,
      ),
    },
    sourceRevisions: [...sources.values()].sort((a, b) => a[0] - b[0] || a[1] - b[1]),
  };
}
