import { Injectable } from '@nestjs/common';
import type { TallyListParams } from '@tallyloom/core';
import type { ExportProducer, ExportResult, ExportRun } from '../export-producer';
import type { ExportColumn, ExportTableSpec } from '../writers/export-table';
import type { TableExportParams } from './table-file';
import { TallyExportRows } from './tally-export-rows';
import { TALLY_FIGURE_COLUMNS, tallyCells } from './tallies-export.producer';

/** The review queue's columns (features/tally-review queue-table), with the tally's number first. */
const COLUMNS: ExportColumn[] = [
  { header: 'Tally no.', key: 'id', kind: 'id', width: 10 },
  { header: 'Chapter', key: 'chapterName', kind: 'text', width: 20 },
  { header: 'Region', key: 'regionName', kind: 'text', width: 18 },
  { header: 'Month', key: 'month', kind: 'text', width: 9 },
  { header: 'State', key: 'state', kind: 'text', width: 11 },
  { header: 'Amendment pending', key: 'amendmentPending', kind: 'text', width: 11 },
  { header: 'Reporting', key: 'reporting', kind: 'text', width: 12 },
  { header: 'Submitted', key: 'submittedAt', kind: 'timestamp', width: 17 },
  ...TALLY_FIGURE_COLUMNS,
];

const SPEC: ExportTableSpec = {
  sheetName: 'Review queue',
  title: 'Review queue',
  columns: COLUMNS,
};

/** The review queue (GET /api/tallies with the queue's filters) as the reviewer sees it. */
@Injectable()
export class ReviewQueueExportProducer implements ExportProducer<
  TableExportParams<TallyListParams>
> {
  constructor(private readonly rows: TallyExportRows) {}

  produce(params: TableExportParams<TallyListParams>, run: ExportRun): Promise<ExportResult> {
    return this.rows.write(params, run, SPEC, tallyCells);
  }
}
