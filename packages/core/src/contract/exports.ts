import type { ReceiptListParams } from './receipts';
import type { DashboardParams, SnapshotScope } from './reports';
import type { TallyListParams } from './tallies';

/** The tables of the app that export what is on screen (same filters, same scope). */
export const EXPORT_TABLES = ['receipts', 'tallies', 'review-queue', 'snapshots'] as const;
export type ExportTable = (typeof EXPORT_TABLES)[number];

export const EXPORT_FORMATS = ['xlsx', 'csv'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

/** The rows of a dashboard's breakdown table: one snapshot per child scope for the period. */
export interface SnapshotExportParams extends DashboardParams {
  scope: SnapshotScope;
  /** Region or chapter id; absent for the network. */
  scopeId?: number;
}

/** Filters of each table, exactly as its list endpoint takes them (page and pageSize ignored). */
export interface ExportFiltersByTable {
  receipts: ReceiptListParams;
  tallies: TallyListParams;
  'review-queue': TallyListParams;
  snapshots: SnapshotExportParams;
}

/** POST /api/exports */
export type TableExportRequest = {
  [T in ExportTable]: {
    table: T;
    format: ExportFormat;
    /** CSV only: begin with a UTF-8 byte-order mark so spreadsheet programs read the encoding. */
    bom?: boolean;
    filters: ExportFiltersByTable[T];
  };
}[ExportTable];

export const IMPACT_PACK_SCOPES = ['network', 'region', 'campaign'] as const;
export type ImpactPackScope = (typeof IMPACT_PACK_SCOPES)[number];

/** POST /api/exports/impact-pack: always one xlsx workbook. */
export interface ImpactPackRequest extends DashboardParams {
  scope: ImpactPackScope;
  /** Region or campaign id; absent for the network. */
  scopeId?: number;
}

export const EXPORT_STATES = ['queued', 'running', 'done', 'failed', 'expired'] as const;
export type ExportState = (typeof EXPORT_STATES)[number];

/** One export as its requester sees it (GET /api/exports, GET /api/exports/:id). */
export interface ExportView {
  /** Random, unguessable (UUID). */
  id: string;
  kind: 'table' | 'impact-pack';
  /** Set for table exports. */
  table: ExportTable | null;
  format: ExportFormat;
  state: ExportState;
  /** 0–100 while running. */
  progress: number;
  /** Data rows written (header rows not counted); null until done. */
  rows: number | null;
  /** Sheets in the workbook (a table above the row limit continues on a second sheet). */
  sheets: number | null;
  /** e.g. 'tallyloom-receipts-2026-12-02.xlsx' */
  fileName: string;
  /** Plain words, e.g. 'Parcel receipts · North Ridge · Oct 2026'. */
  description: string;
  createdAt: string;
  finishedAt: string | null;
  /** When the download link stops working and the file is removed; null until done. */
  expiresAt: string | null;
  /** A signed link that works without the sign-in header until expiresAt; null unless done. */
  downloadUrl: string | null;
  /** Why it failed, in plain words; null unless failed. */
  error: string | null;
}
