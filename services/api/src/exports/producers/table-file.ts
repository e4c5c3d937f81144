import type { ExportFormat } from '@tallyloom/core';
import type { ExportRun } from '../export-producer';
import { CsvTableWriter } from '../writers/csv-table-writer';
import type { ExportRow, ExportTableSpec, WriteOutcome } from '../writers/export-table';
import { XlsxTableWriter } from '../writers/xlsx-table-writer';

/** What every table export stores as its params. */
export interface TableExportParams<Filters> {
  format: ExportFormat;
  bom: boolean;
  filters: Filters;
}

/** Writes the rows in the asked format, reporting progress against the expected row count. */
export function writeTableFile(
  params: { format: ExportFormat; bom: boolean },
  spec: ExportTableSpec,
  batches: AsyncIterable<readonly ExportRow[]>,
  expectedRows: number,
  run: ExportRun,
): Promise<WriteOutcome> {
  const writer =
    params.format === 'xlsx'
      ? new XlsxTableWriter({ rowLimit: run.xlsxRowsPerSheet })
      : new CsvTableWriter({ bom: params.bom });
  return writer.write(run.filePath, spec, batches, (rows) =>
    run.progress(expectedRows === 0 ? 100 : Math.min(99, Math.floor((rows / expectedRows) * 100))),
  );
}
