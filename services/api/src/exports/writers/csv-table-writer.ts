import { neutraliseCsvCell } from '@tallyloom/core';
import { stringify } from 'csv-stringify';
import { createWriteStream } from 'node:fs';
import { once } from 'node:events';
import { pipeline } from 'node:stream/promises';
import type { ExportRow, ExportTableSpec, RowsWritten, WriteOutcome } from './export-table';

export interface CsvWriterOptions {
  /** Begin with a UTF-8 byte-order mark, which spreadsheet programs read as the encoding. */
  bom?: boolean;
}

/**
 * Writes one table as CSV per RFC 4180: fields quoted only when they hold a comma, a quote or a
 * line break, quotes doubled, CRLF between records, a header record first. Text cells that would
 * start a formula are neutralised. There is no totals row: a CSV file is data only.
 */
// Source: RFC 4180, "Common Format and MIME Type for CSV Files", §2 (rules 1–7).
export class CsvTableWriter {
  constructor(private readonly options: CsvWriterOptions = {}) {}

  async write(
    filePath: string,
    spec: ExportTableSpec,
    batches: AsyncIterable<readonly ExportRow[]>,
    onRows?: RowsWritten,
  ): Promise<WriteOutcome> {
    const stringifier = stringify({
      bom: this.options.bom === true,
      record_delimiter: '\r\n',
    });
    const done = pipeline(stringifier, createWriteStream(filePath));
    const put = async (record: Array<string | number | boolean>) => {
      // Waits when the file falls behind, so rows never pile up in memory.
      if (!stringifier.write(record)) await once(stringifier, 'drain');
    };

    let rows = 0;
    try {
      await put(spec.columns.map((column) => column.header));
      for await (const batch of batches) {
        for (const row of batch) {
          await put(spec.columns.map((column) => neutraliseCsvCell(row[column.key])));
          rows += 1;
        }
        if (onRows) await onRows(rows);
      }
      stringifier.end();
    } catch (error) {
      stringifier.destroy(error as Error);
      await done.catch(() => undefined);
      throw error;
    }
    await done;
    return { rows, sheets: 1 };
  }
}
