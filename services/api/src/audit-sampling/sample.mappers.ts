import {
  evaluateSample,
  type AuditSampleSummaryView,
  type AuditSampleView,
  type SampleItemView,
  type SamplePlanView,
  type WorksheetResultView,
} from '@tallyloom/core';
import { jsonColumn } from '../common/sql/column-values';
import type { AuditSample } from './models/audit-sample.model';
import type { AuditSampleItem } from './models/audit-sample-item.model';

/** How far a worksheet has come: items drawn, recorded, and deviations among them. */
export interface WorksheetCounts {
  items: number;
  examined: number;
  deviations: number;
}

export function attachmentUrl(sampleId: number, itemId: number): string {
  return `/api/samples/${sampleId}/items/${itemId}/attachment`;
}

export function toItemView(item: AuditSampleItem): SampleItemView {
  return {
    position: item.position,
    itemId: item.itemId,
    result: item.result,
    note: item.note,
    attachmentUrl: item.attachmentKey ? attachmentUrl(item.sampleId, item.itemId) : null,
  };
}

export function countsOf(items: readonly AuditSampleItem[]): WorksheetCounts {
  return {
    items: items.length,
    examined: items.filter((item) => item.result !== null).length,
    deviations: items.filter((item) => item.result === 'deviation').length,
  };
}

/** The totals, and the evaluation once every drawn item is recorded. */
export function worksheetOf(plan: SamplePlanView, counts: WorksheetCounts): WorksheetResultView {
  const complete = counts.items > 0 && counts.examined === counts.items;
  return {
    examined: counts.examined,
    deviations: counts.deviations,
    evaluation: complete
      ? evaluateSample({
          sampleSize: counts.items,
          deviations: counts.deviations,
          confidence: plan.request.confidence,
          tolerableRate: plan.request.tolerableRate,
        })
      : null,
  };
}

/** What a sample's list row and its detail share. */
function sampleHeader(
  sample: AuditSample,
  counts: WorksheetCounts,
): Omit<AuditSampleSummaryView, 'itemCount'> {
  const plan = jsonColumn<SamplePlanView>(sample.plan);
  return {
    id: sample.id,
    plan,
    seed: sample.seed,
    prng: sample.prng,
    drawnAt: sample.drawnAt.toISOString(),
    // Users are deactivated, never deleted, so the drawer is there.
    drawnBy: sample.drawer?.displayName ?? `user ${sample.drawnBy}`,
    worksheet: worksheetOf(plan, counts),
  };
}

export function toSummaryView(
  sample: AuditSample,
  counts: WorksheetCounts,
): AuditSampleSummaryView {
  return { ...sampleHeader(sample, counts), itemCount: counts.items };
}

export function toSampleView(
  sample: AuditSample,
  items: readonly AuditSampleItem[],
): AuditSampleView {
  return {
    ...sampleHeader(sample, countsOf(items)),
    items: [...items].sort((a, b) => a.position - b.position).map(toItemView),
  };
}
