/** The trace of a report figure down to its tallies, receipts and scans (BRIEF §3 "Trace"; issue #8). */
import type { TallyValueChange } from '../tallies/revision-diff';
import { SNAPSHOT_MEASURES, type Period, type SnapshotScope } from './reports';

/** The snapshot measures a trace re-adds: every single number of SnapshotFigures. */
export const TRACE_MEASURES = SNAPSHOT_MEASURES;
export type TraceMeasure = (typeof TRACE_MEASURES)[number];

/** Values by measure: the traced measure only, or every measure when none was asked for. */
export type TraceFigures = Partial<Record<TraceMeasure, number>>;

/** GET /api/trace/:reference?measure=… */
export interface TraceParams {
  /** One measure; absent to trace them all. */
  measure?: TraceMeasure;
}

export interface TraceScan {
  id: number;
  fileName: string;
  /** Download address (needs the same sign-in and scope as the receipt). */
  url: string;
}

/** A parcel receipt of the tally's chapter and month: where its panel counts come from. */
export interface TraceReceipt {
  id: number;
  /** ISO date. */
  receivedOn: string;
  panelsAccepted: number;
  /** Panels set aside for any reason. */
  setAsideTotal: number;
  /** As written on the label, or null. */
  campaignCode: string | null;
  scanCount: number;
  scans: TraceScan[];
}

/** One amendment of a tally: the revision it made and what it changed against the one before. */
export interface TraceAmendment {
  revision: number;
  reason: string | null;
  changes: TallyValueChange[];
}

/** One approved tally revision the figure is built from. */
export interface TraceTallyLine {
  tallyId: number;
  chapterId: number;
  chapterName: string;
  regionName: string;
  /** 'YYYY-MM'. */
  month: string;
  /** The revision the snapshot counted. */
  revision: number;
  /** Display name of the person who approved the revision; null if unknown. */
  approvedBy: string | null;
  /** ISO timestamp, or null if unknown. */
  approvedAt: string | null;
  /** The measures' values in this revision (stock: its closing stock; approvedTallies: 1). */
  value: TraceFigures;
  /** Amendments up to the counted revision, oldest first; empty for a tally never amended. */
  amendments: TraceAmendment[];
  /** The chapter's parcel receipts received in the tally's month, oldest first. */
  receipts: TraceReceipt[];
}

export interface TraceView {
  /** The stable reference of the figure, e.g. 'network:FY2026', 'region:3:2026-Q1'. */
  reference: string;
  scope: SnapshotScope;
  /** Null for the network. */
  scopeId: number | null;
  scopeName: string;
  period: Period;
  /** The measure traced; null when all are. */
  measure: TraceMeasure | null;
  /** The stored report snapshot's values: the figure the dashboard shows. */
  figure: TraceFigures;
  /**
   * The same measures re-added from the tally lines below: flows summed; stock is each chapter's
   * closing stock of its last month among the lines, summed over chapters.
   */
  recomputed: TraceFigures;
  /** True when every recomputed value equals the figure. */
  agrees: boolean;
  /** When the snapshot was built (ISO timestamp). */
  asOf: string;
  /** Exactly the revisions the snapshot was built from, by month then chapter. */
  tallies: TraceTallyLine[];
}
