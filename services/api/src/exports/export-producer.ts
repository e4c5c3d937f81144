import type { Actor } from '../common/access/actor';

/** What a producer is told while it writes one export's file. */
export interface ExportRun {
  /** The person who asked, re-read when the job runs: scope and role apply as of now. */
  actor: Actor;
  /** An absolute path to write the finished file to (its folder exists). */
  filePath: string;
  /** Rows per xlsx sheet before a table continues on the next (config: EXPORT_XLSX_ROWS_PER_SHEET). */
  xlsxRowsPerSheet?: number;
  /** Report 0–100; cheap to call often (throttled by the caller). */
  progress: (percent: number) => Promise<void>;
}

/** What a producer reports when its file is complete. */
export interface ExportResult {
  /** Data rows written (header and total rows not counted). */
  rows: number;
  sheets: number;
}

/**
 * Writes one kind of export to a file. The exports job picks the producer by the export's kind
 * (a table export by its table, or the impact pack) and owns the row, the state and the link.
 */
export interface ExportProducer<Params> {
  produce(params: Params, run: ExportRun): Promise<ExportResult>;
}
