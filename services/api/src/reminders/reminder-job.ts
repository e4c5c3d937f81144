import type { ReminderKind } from './reminder-dates';

export enum ReminderJob {
  /** The daily look for missing tallies. */
  Daily = 'daily',
}

export interface ReminderJobData {
  /** ISO date to judge by; the clock's UTC date when absent (the repeatable job sends none). */
  today?: string;
  /** Only these chapters; every chapter when absent. */
  chapterIds?: number[];
}

export interface ReminderSent {
  chapterId: number;
  month: string;
  kind: ReminderKind;
}

export interface ReminderJobResult {
  today: string;
  sent: ReminderSent[];
  /** Reminders another run had already sent (or is sending). */
  alreadySent: number;
  /** The process that ran the job, so a scaled-out set-up can see who did what. */
  pid: number;
}
