import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import {
  monthPeriod,
  parsePeriod,
  type MonthKey,
  type Period,
  type PeriodKind,
  type SnapshotScope,
} from '@tallyloom/core';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ChapterFigures } from '../reports/chapter-figures.service';
import { SettingsService } from '../settings/settings.service';
import { isoTimestamp, jsonColumn } from '../common/sql/column-values';
import type { SnapshotRow } from './snapshot-rows';

/** What to read: the month rows of some months, and whole-period rows of one kind. */
export interface SnapshotWanted {
  scope: SnapshotScope;
  /** 0 for the network. */
  scopeIds: number[];
  months: MonthKey[];
  kind?: PeriodKind;
  keys?: string[];
}

// A value no key can take, so `IN (…)` is never empty (an empty list is a syntax error).
const NONE = ['-'];

/**
 * Reads report snapshots: regions and the network from the rows the snapshot builder writes (the
 * dashboards never write them), chapters built live from their tallies.
 */
@Injectable()
export class SnapshotReader {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly chapters: ChapterFigures,
    private readonly settings: SettingsService,
  ) {}

  async find(wanted: SnapshotWanted): Promise<SnapshotRow[]> {
    if (wanted.scopeIds.length === 0) return [];
    if (wanted.scope === 'chapter') return this.live(wanted);
    const rows = await this.sequelize.query<Record<string, unknown>>(
      `SELECT scope, scope_id AS scopeId, period_kind AS periodKind, period_key AS periodKey,
              figures, compliance, pending_tallies AS pendingTallies, as_of AS asOf
         FROM report_snapshots
        WHERE scope = :scope AND scope_id IN (:scopeIds)
          AND ((period_kind = 'month' AND period_key IN (:months))
            OR (period_kind = :kind AND period_key IN (:keys)))`,
      {
        type: QueryTypes.SELECT,
        replacements: {
          scope: wanted.scope,
          scopeIds: wanted.scopeIds,
          months: wanted.months.length > 0 ? wanted.months : NONE,
          kind: wanted.kind ?? 'month',
          keys: wanted.keys && wanted.keys.length > 0 ? wanted.keys : NONE,
        },
      },
    );
    return rows.map((row) => ({
      scope: row.scope as SnapshotScope,
      scopeId: Number(row.scopeId),
      periodKind: row.periodKind as SnapshotRow['periodKind'],
      periodKey: String(row.periodKey),
      figures: jsonColumn(row.figures),
      compliance: jsonColumn(row.compliance),
      pendingTallies: Number(row.pendingTallies),
      asOf: isoTimestamp(row.asOf),
    }));
  }

  private async live(wanted: SnapshotWanted): Promise<SnapshotRow[]> {
    const { fiscalYearStartMonth } = await this.settings.current();
    const periods: Period[] = [...new Set(wanted.months)].map((month) => monthPeriod(month));
    if (wanted.kind && wanted.kind !== 'month') {
      for (const key of new Set(wanted.keys ?? [])) {
        periods.push(parsePeriod(wanted.kind, key, fiscalYearStartMonth));
      }
    }
    const asOf = new Date().toISOString();
    return (await this.chapters.build(wanted.scopeIds, periods)).map((built) => ({
      scope: 'chapter',
      scopeId: built.scopeId,
      periodKind: built.period.kind as SnapshotRow['periodKind'],
      periodKey: built.period.key,
      figures: built.figures,
      compliance: built.compliance,
      pendingTallies: built.pendingTallies,
      asOf,
    }));
  }
}
