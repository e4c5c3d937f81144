import type { ExportView } from '@tallyloom/core';

/** A receipts export as the server describes it; pass what differs. */
export function anExport(overrides: Partial<ExportView> = {}): ExportView {
  return {
    id: '6f1c2b9e-7a34-4d1e-9c55-0e8f3a2b1d47',
    kind: 'table',
    table: 'receipts',
    format: 'xlsx',
    state: 'queued',
    progress: 0,
    rows: null,
    sheets: null,
    fileName: 'tallyloom-receipts-2026-12-02.xlsx',
    description: 'Parcel receipts · North Ridge · Oct 2026',
    createdAt: '2026-12-02T09:15:00Z',
    finishedAt: null,
    expiresAt: null,
    downloadUrl: null,
    error: null,
    ...overrides,
  };
}

/** The same export once written: 1,204 rows on one sheet, its link good for an hour. */
export function aFinishedExport(overrides: Partial<ExportView> = {}): ExportView {
  return anExport({
    state: 'done',
    progress: 100,
    rows: 1_204,
    sheets: 1,
    finishedAt: '2026-12-02T09:15:09Z',
    expiresAt: '2026-12-02T10:15:09Z',
    downloadUrl:
      '/api/exports/6f1c2b9e-7a34-4d1e-9c55-0e8f3a2b1d47/file?expires=1796210109&signature=ab12',
    ...overrides,
  });
}
