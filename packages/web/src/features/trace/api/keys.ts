import type { TraceMeasure } from '@tallyloom/core';

/** Hierarchical keys: one entry per reference and measure (null: every measure). */
export const traceKeys = {
  all: ['trace'] as const,
  detail: (reference: string, measure: TraceMeasure | null) =>
    [...traceKeys.all, 'detail', reference, measure] as const,
  scanFile: (receiptId: number, scanId: number) =>
    [...traceKeys.all, 'scan-file', receiptId, scanId] as const,
};
