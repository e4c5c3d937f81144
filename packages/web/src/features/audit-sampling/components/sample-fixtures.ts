import {
  evaluateSample,
  sampleSize,
  SAMPLE_PRNG,
  type AuditSampleSummaryView,
  type AuditSampleView,
  type SampleItemView,
  type SamplePlanRequest,
  type SamplePlanView,
} from '@tallyloom/core';

// Invented demo samples (BRIEF §7); sizes and limits come from core, as the API's do.

export const aPlanRequest = (overrides: Partial<SamplePlanRequest> = {}): SamplePlanRequest => ({
  population: {
    kind: 'parcel-receipts',
    scope: 'region',
    scopeId: 1,
    from: '2026-07',
    to: '2026-09',
  },
  confidence: 0.95,
  tolerableRate: 0.05,
  expectedDeviations: 0,
  finitePopulationAdjustment: false,
  ...overrides,
});

export function aPlanView(request = aPlanRequest(), population = 412): SamplePlanView {
  return {
    ...sampleSize({
      confidence: request.confidence,
      tolerableRate: request.tolerableRate,
      expectedDeviations: request.expectedDeviations,
      population,
      finitePopulationAdjustment: request.finitePopulationAdjustment,
    }),
    request,
    population,
  };
}

/** A drawn sample with `items` items, the first `recorded` of them recorded. */
export function aSample({
  id = 7,
  items = 3,
  deviationsAt = [] as number[],
  recorded = 0,
  request = aPlanRequest(),
} = {}): AuditSampleView {
  const list: SampleItemView[] = Array.from({ length: items }, (_, index) => {
    const done = index < recorded;
    const deviation = done && deviationsAt.includes(index);
    return {
      position: index + 1,
      itemId: 501 + index * 7,
      result: done ? (deviation ? 'deviation' : 'agrees') : null,
      note: deviation ? `Label count differs from the panels logged (item ${index + 1}).` : null,
      attachmentUrl: null,
    };
  });
  const deviations = list.filter((item) => item.result === 'deviation').length;
  const plan = aPlanView(request);
  return {
    id,
    plan,
    seed: 'f3a9c2d417b8e605',
    prng: SAMPLE_PRNG,
    items: list,
    drawnAt: '2026-11-20T09:30:00Z',
    drawnBy: 'Oskar Lind',
    worksheet: {
      examined: recorded,
      deviations,
      evaluation:
        recorded === items
          ? evaluateSample({
              sampleSize: items,
              deviations,
              confidence: request.confidence,
              tolerableRate: request.tolerableRate,
            })
          : null,
    },
  };
}

export function aSummary(sample: AuditSampleView): AuditSampleSummaryView {
  const { items, ...rest } = sample;
  return { ...rest, itemCount: items.length };
}
