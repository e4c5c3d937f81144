import { neutraliseCsvCell } from '@tallyloom/core';
import { once } from 'node:events';
import { createWriteStream } from 'node:fs';
import { finished } from 'node:stream/promises';
import type {
  ExportCell,
  ExportCells,
  ExportTableSpec,
  RowsWritten,
  WriteOutcome,
} from './export-table';

export interface CsvWriterOptions {
  /** Begin with a UTF-8 byte-order mark, which spreadsheet programs read as the encoding. */
  bom?: boolean;
}

/** A field holding one of these must be enclosed in double quotes. */
// Source: RFC 4180, §2 rule 6 (fields containing line breaks, double quotes and commas).
const NEEDS_QUOTES = /[",\r\n]/;
const QUOTE = /"/g;

/** One field: neutralised if it would start a formula, quoted only when it must be. */
export function csvField(value: ExportCell): string {
  const cell = neutraliseCsvCell(value);
  if (typeof cell !== 'string') return String(cell);
  // Source: RFC 4180, §2 rule 7 (a double quote inside a quoted field is doubled).
  return NEEDS_QUOTES.test(cell) ? `"${cell.replace(QUOTE, '""')}"` : cell;
}

/** One record with its CRLF. */
export function csvRecord(cells: ExportCells): string {
  let line = '';
  for (let index = 0; index < cells.length; index += 1) {
    if (index > 0) line += ',';
    line += csvField(cells[index]);
  }
  return `${line}\r\n`;
}

/**
 * Writes one table as CSV per RFC 4180: fields quoted only when they hold a comma, a quote or a
 * line break, quotes doubled, CRLF between records, a header record first. Text cells that would
 * start a formula are neutralised. There is no totals row: a CSV file is data only. Each batch
 * goes to the file as one write: per-record writes cost more than formatting the records.
 */
// Source: RFC 4180, "Common Format and MIME Type for CSV Files", §2 (rules 1–7).
export class CsvTableWriter {
  constructor(private readonly options: CsvWriterOptions = {}) {}

  async write(
    filePath: string,
    spec: ExportTableSpec,
    batches: AsyncIterable<readonly ExportCells[]>,
    onRows?: RowsWritten,
  ): Promise<WriteOutcome> {
    const out = createWriteStream(filePath);
    const closed = finished(out);
    // A failed write also rejects `closed`; it is awaited below or on the way out.
    closed.catch(() => undefined);
    const put = async (text: string) => {
      // Waits when the file falls behind, so batches never pile up in memory.
      if (!out.write(text)) await Promise.race([once(out, 'drain'), closed]);
    };

    let rows = 0;
    try {
      const header = csvRecord(spec.columns.map((column) => column.header));
      await put(this.options.bom === true ? `\uFEFF${header}` : header);
      for await (const batch of batches) {
        let chunk = '';
        for (const cells of batch) chunk += csvRecord(cells);
        await put(chunk);
        rows += batch.length;
        if (onRows) await onRows(rows);
      }
      out.end();
    } catch (error) {
      out.destroy();
      await closed.catch(() => undefined);
      throw error;
    }
    await closed;
    return { rows, sheets: 1 };
  }
}
