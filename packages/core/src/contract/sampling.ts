/** Attribute sampling for audit (BRIEF §3 "Audit sample", §4.8; issue #8). */
import type { SamplingConfidence, SampleSizeResult } from '../sampling/sample-size';
import type { SampleEvaluation } from '../sampling/upper-deviation-limit';
import type { SnapshotScope } from './reports';
import type { Page } from './users';

export const SAMPLE_POPULATION_KINDS = ['parcel-receipts', 'tallies'] as const;
export type SamplePopulationKind = (typeof SAMPLE_POPULATION_KINDS)[number];

/** The items a sample is drawn from: one kind of record in a scope and a range of months. */
export interface SamplePopulation {
  kind: SamplePopulationKind;
  scope: SnapshotScope;
  /** Region or chapter id; absent for the network. */
  scopeId?: number;
  /** First and last month, 'YYYY-MM' (inclusive). */
  from: string;
  to: string;
}

/** POST /api/samples/plan (a preview) and the plan part of a draw. */
export interface SamplePlanRequest {
  population: SamplePopulation;
  confidence: SamplingConfidence;
  /** Fraction above 0 and at most 0.5 (0.05 = 5 %). */
  tolerableRate: number;
  /** A count of deviations, 0 or more. */
  expectedDeviations: number;
  /** Also show the hypergeometric n for drawing without replacement, and draw that many. */
  finitePopulationAdjustment?: boolean;
}

/** The plan with the population counted; `itemsToDraw` is what a draw takes. */
export interface SamplePlanView extends SampleSizeResult {
  request: SamplePlanRequest;
  /** Items in the population when the plan was made. */
  population: number;
}

/** POST /api/samples */
export interface DrawSampleRequest {
  plan: SamplePlanRequest;
  /** Leave out to get a fresh seed (`newSeed()`); give one to re-draw an earlier sample. */
  seed?: string;
}

export const WORKSHEET_RESULTS = ['agrees', 'deviation'] as const;
export type WorksheetResult = (typeof WORKSHEET_RESULTS)[number];

/** One drawn item with what the auditor recorded for it. */
export interface SampleItemView {
  /** 1-based position in the draw order. */
  position: number;
  /** Parcel receipt id or monthly tally id, by the population's kind. */
  itemId: number;
  /** Null until recorded. */
  result: WorksheetResult | null;
  note: string | null;
  attachmentUrl: string | null;
}

/** PUT /api/samples/:id/items/:itemId (multipart when an attachment is sent). */
export interface WorksheetEntryRequest {
  result: WorksheetResult;
  /** Required for a deviation: what was wrong. */
  note?: string;
}

/** GET /api/samples/:id: a drawn sample, enough to re-draw it elsewhere. */
export interface AuditSampleView {
  id: number;
  plan: SamplePlanView;
  seed: string;
  /** The generator and shuffle used (`SAMPLE_PRNG`). */
  prng: string;
  /** Items in draw order. */
  items: SampleItemView[];
  drawnAt: string;
  drawnBy: string;
  worksheet: WorksheetResultView;
}

/** The worksheet's totals; the evaluation appears once every item is recorded. */
export interface WorksheetResultView {
  examined: number;
  deviations: number;
  /** Null while items are still unrecorded. */
  evaluation: SampleEvaluation | null;
}

/** One row of GET /api/samples: a sample without its items, newest first. */
export interface AuditSampleSummaryView {
  id: number;
  plan: SamplePlanView;
  seed: string;
  prng: string;
  /** Items drawn. */
  itemCount: number;
  drawnAt: string;
  drawnBy: string;
  worksheet: WorksheetResultView;
}

/** GET /api/samples?page=&pageSize= */
export interface ListSamplesParams {
  page?: number;
  pageSize?: number;
}

export type AuditSamplePage = Page<AuditSampleSummaryView>;
