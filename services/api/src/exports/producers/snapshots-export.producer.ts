import { Injectable } from '@nestjs/common';
import {
  PEOPLE_GROUP_LABELS,
  PEOPLE_GROUPS,
  type DashboardView,
  type SnapshotExportParams,
  type SnapshotView,
} from '@tallyloom/core';
import { TALLY_MEASURES } from '@tallyloom/reports';
import type { Actor } from '../../common/access/actor';
import { DashboardsService } from '../../dashboards/dashboards.service';
import type { ExportProducer, ExportResult, ExportRun } from '../export-producer';
import type { ExportColumn, ExportRow, ExportTableSpec } from '../writers/export-table';
import { writeTableFile, type TableExportParams } from './table-file';

/** Measures kept in tenths or hundredths; every other one is a whole count. */
const DECIMAL_MEASURES: ReadonlySet<string> = new Set(['volunteerHours', 'yarnKg']);

const figure = (header: string, key: string, decimal = false): ExportColumn => ({
  header,
  key,
  kind: decimal ? 'decimal' : 'count',
  width: 14,
  // Every measure adds up over child scopes: flows are sums, stocks are summed closing stocks.
  total: 'sum',
});

/** Scope, period, each measure of the tally snapshot by its label, compliance, pending, as of. */
const COLUMNS: ExportColumn[] = [
  { header: 'Scope', key: 'scopeName', kind: 'text', width: 22 },
  { header: 'Period', key: 'period', kind: 'text', width: 14 },
  ...TALLY_MEASURES.flatMap((measure) =>
    measure.key === 'peopleServedByGroup'
      ? PEOPLE_GROUPS.map((group) =>
          figure(`${measure.label}: ${PEOPLE_GROUP_LABELS[group]}`, `people.${group}`),
        )
      : [figure(measure.label, measure.key, DECIMAL_MEASURES.has(measure.key))],
  ),
  figure('Tallies expected', 'expected'),
  figure('Filed on time', 'onTime'),
  figure('Filed late', 'late'),
  figure('Missing', 'missing'),
  figure('Not due yet', 'open'),
  figure('Pending tallies (not in figures)', 'pendingTallies'),
  { header: 'As of', key: 'asOf', kind: 'timestamp', width: 17 },
];

/**
 * The dashboard the person would see for the export's scope and period, read by the dashboards'
 * own service: its scope rules apply (out of scope: 404; a network dashboard for a regional or
 * chapter role: 403) and its figures are the ones on screen.
 */
export function snapshotDashboard(
  dashboards: DashboardsService,
  actor: Actor,
  filters: SnapshotExportParams,
): Promise<DashboardView> {
  const { scope, scopeId, ...period } = filters;
  if (scope === 'network') return dashboards.network(actor, period);
  if (scope === 'region') return dashboards.region(actor, scopeId!, period);
  return dashboards.chapter(actor, scopeId!, period);
}

/** The dashboard's breakdown table: one row per child scope (a chapter's dashboard: itself). */
@Injectable()
export class SnapshotsExportProducer implements ExportProducer<
  TableExportParams<SnapshotExportParams>
> {
  constructor(private readonly dashboards: DashboardsService) {}

  async produce(
    params: TableExportParams<SnapshotExportParams>,
    run: ExportRun,
  ): Promise<ExportResult> {
    const dashboard = await snapshotDashboard(this.dashboards, run.actor, params.filters);
    const spec: ExportTableSpec = {
      sheetName: 'Report snapshots',
      title: `Report snapshots · ${dashboard.scopeName} · ${dashboard.period.label}`,
      columns: COLUMNS,
    };
    const views = dashboard.breakdown.length > 0 ? dashboard.breakdown : [dashboard.current];
    return writeTableFile(params, spec, oneBatch(views.map(snapshotCells)), views.length, run);
  }
}

async function* oneBatch(rows: ExportRow[]): AsyncIterable<ExportRow[]> {
  yield await Promise.resolve(rows);
}

function snapshotCells(view: SnapshotView): ExportRow {
  const { peopleServedByGroup, ...figures } = view.figures;
  return {
    scopeName: view.scopeName,
    period: view.period.label,
    ...figures,
    ...Object.fromEntries(
      PEOPLE_GROUPS.map((group) => [`people.${group}`, peopleServedByGroup[group]]),
    ),
    ...view.compliance,
    pendingTallies: view.pendingTallies,
    asOf: view.asOf,
  };
}
