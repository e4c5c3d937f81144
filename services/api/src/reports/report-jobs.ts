import type { JobOptions } from 'bull';

/** The jobs of QueueName.Reports. */
export enum ReportJob {
  /** Rebuilds the snapshots one chapter-month touches. */
  ChapterMonth = 'chapter-month',
  /** Rebuilds every snapshot: after a fresh start, and nightly to repair drift. */
  FullRebuild = 'full-rebuild',
}

export interface ChapterMonthJob {
  chapterId: number;
  /** 'YYYY-MM' */
  month: string;
}

export interface RebuildSummary {
  snapshots: number;
  campaigns: number;
}

/**
 * Jobs recompute (never increment), so a retry or a duplicate is harmless. Finished jobs are
 * kept for a while so the Jobs page can show them.
 */
export const REPORT_JOB_OPTIONS: JobOptions = {
  attempts: 5,
  backoff: { type: 'exponential', delay: 2_000 },
  removeOnComplete: 200,
  removeOnFail: 500,
};

export const NIGHTLY_FULL_REBUILD = { cron: '30 2 * * *', jobId: 'nightly-full-rebuild' };
