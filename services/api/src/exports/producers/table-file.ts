import type { ExportFormat } from '@tallyloom/core';
import type { ExportRun } from '../export-producer';
import { CsvTableWriter } from '../writers/csv-table-writer';
import {
  cellsOf,
  type ExportCells,
  type ExportRow,
  type ExportTableSpec,
  type WriteOutcome,
} from '../writers/export-table';
import { XlsxTableWriter } from '../writers/xlsx-table-writer';

/** What every table export stores as its params. */
export interface TableExportParams<Filters> {
  format: ExportFormat;
  bom: boolean;
  filters: Filters;
}

/** Writes rows made as objects (keyed by column) in the asked format. */
export function writeTableFile(
  params: { format: ExportFormat; bom: boolean },
  spec: ExportTableSpec,
  batches: AsyncIterable<readonly ExportRow[]>,
  expectedRows: number,
  run: ExportRun,
): Promise<WriteOutcome> {
  return writeTableCells(params, spec, asCells(spec, batches), expectedRows, run);
}

/**
 * Writes rows given as cells in column order in the asked format, reporting progress against the
 * expected row count. The count may still be running (a promise): progress starts once it is in.
 */
export async function writeTableCells(
  params: { format: ExportFormat; bom: boolean },
  spec: ExportTableSpec,
  batches: AsyncIterable<readonly ExportCells[]>,
  expectedRows: number | Promise<number>,
  run: ExportRun,
): Promise<WriteOutcome> {
  let expected: number | null = null;
  const counted = Promise.resolve(expectedRows).then((rows) => {
    expected = rows;
  });
  // A failed count is awaited (and thrown) after the file; until then it must not go unhandled.
  counted.catch(() => undefined);
  const writer =
    params.format === 'xlsx'
      ? new XlsxTableWriter({ rowLimit: run.xlsxRowsPerSheet })
      : new CsvTableWriter({ bom: params.bom });
  const outcome = await writer.write(run.filePath, spec, batches, (rows) =>
    expected === null
      ? undefined
      : run.progress(expected === 0 ? 100 : Math.min(99, Math.floor((rows / expected) * 100))),
  );
  await counted;
  return outcome;
}

async function* asCells(
  spec: ExportTableSpec,
  batches: AsyncIterable<readonly ExportRow[]>,
): AsyncIterable<ExportCells[]> {
  for await (const batch of batches) yield batch.map((row) => cellsOf(spec.columns, row));
}
