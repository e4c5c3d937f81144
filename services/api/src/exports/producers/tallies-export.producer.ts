import { Injectable } from '@nestjs/common';
import {
  REPORTING_STATUS_LABELS,
  TALLY_STATE_LABELS,
  type TallyListParams,
  type TallySummary,
} from '@tallyloom/core';
import type { ExportProducer, ExportResult, ExportRun } from '../export-producer';
import type { ExportColumn, ExportRow, ExportTableSpec } from '../writers/export-table';
import type { TableExportParams } from './table-file';
import { TallyExportRows } from './tally-export-rows';

/** The headline figures of the revision shown, as the list gives them, with totals. */
export const TALLY_FIGURE_COLUMNS: ExportColumn[] = [
  {
    header: 'Panels accepted (panels)',
    key: 'panelsAccepted',
    kind: 'count',
    width: 14,
    total: 'sum',
  },
  {
    header: 'Blankets assembled (blankets)',
    key: 'blanketsAssembled',
    kind: 'count',
    width: 14,
    total: 'sum',
  },
  {
    header: 'Blankets given (blankets)',
    key: 'blanketsGiven',
    kind: 'count',
    width: 14,
    total: 'sum',
  },
  { header: 'People served (people)', key: 'peopleServed', kind: 'count', width: 14, total: 'sum' },
  {
    header: 'Volunteer hours (hours)',
    key: 'volunteerHours',
    kind: 'decimal',
    width: 14,
    total: 'sum',
  },
];

const COLUMNS: ExportColumn[] = [
  { header: 'Tally no.', key: 'id', kind: 'id', width: 10 },
  { header: 'Chapter', key: 'chapterName', kind: 'text', width: 20 },
  { header: 'Region', key: 'regionName', kind: 'text', width: 18 },
  { header: 'Month', key: 'month', kind: 'text', width: 9 },
  { header: 'State', key: 'state', kind: 'text', width: 11 },
  { header: 'Amendment pending', key: 'amendmentPending', kind: 'text', width: 11 },
  { header: 'Due on', key: 'dueOn', kind: 'date', width: 12 },
  { header: 'Reporting', key: 'reporting', kind: 'text', width: 12 },
  { header: 'Revision', key: 'revision', kind: 'count', width: 9 },
  { header: 'Approved revision', key: 'approvedRevision', kind: 'count', width: 10 },
  { header: 'First submitted', key: 'firstSubmittedAt', kind: 'timestamp', width: 17 },
  { header: 'Submitted', key: 'submittedAt', kind: 'timestamp', width: 17 },
  { header: 'Approved', key: 'approvedAt', kind: 'timestamp', width: 17 },
  { header: 'Approved by', key: 'approvedByName', kind: 'text', width: 20 },
  ...TALLY_FIGURE_COLUMNS,
];

const SPEC: ExportTableSpec = {
  sheetName: 'Monthly tallies',
  title: 'Monthly tallies',
  columns: COLUMNS,
};

/** The row cells every tally table shares: the list's summary in words and figures. */
export function tallyCells(tally: TallySummary): ExportRow {
  return {
    id: tally.id,
    chapterName: tally.chapterName,
    regionName: tally.regionName,
    month: tally.month,
    state: TALLY_STATE_LABELS[tally.state],
    amendmentPending: tally.amendmentPending ? 'yes' : 'no',
    reporting: REPORTING_STATUS_LABELS[tally.reporting],
    submittedAt: tally.submittedAt,
    ...tally.headline,
  };
}

/** Monthly tallies exactly as the list shows them to the person: same filters, scope and order. */
@Injectable()
export class TalliesExportProducer implements ExportProducer<TableExportParams<TallyListParams>> {
  constructor(private readonly rows: TallyExportRows) {}

  produce(params: TableExportParams<TallyListParams>, run: ExportRun): Promise<ExportResult> {
    return this.rows.write(params, run, SPEC, (tally) => ({
      ...tallyCells(tally),
      dueOn: tally.dueOn,
      revision: tally.revision,
      approvedRevision: tally.approvedRevision,
      firstSubmittedAt: tally.firstSubmittedAt,
      approvedAt: tally.approvedAt,
      approvedByName: tally.approvedByName,
    }));
  }
}
