import type { JobOptions } from 'bull';

/** The jobs of QueueName.Exports. */
export enum ExportJob {
  /** Writes one export's file. */
  Write = 'write',
  /** Removes the files of expired links and marks their rows expired. */
  Cleanup = 'cleanup',
}

export interface WriteExportJob {
  exportId: string;
}

/** Retried like the report jobs: each attempt rewrites the file from scratch. */
export const EXPORT_JOB_OPTIONS: JobOptions = {
  attempts: 3,
  backoff: { type: 'exponential', delay: 2_000 },
  removeOnComplete: 200,
  removeOnFail: 500,
};

export const EXPORT_CLEANUP = { every: 15 * 60_000, jobId: 'exports-cleanup' };
