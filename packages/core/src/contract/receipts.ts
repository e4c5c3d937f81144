import type { Page } from './users';

/** Reasons a panel is set aside instead of accepted. */
export const SET_ASIDE_REASONS = ['offSize', 'hardCareYarn', 'soiledOrDamaged', 'other'] as const;
export type SetAsideReason = (typeof SET_ASIDE_REASONS)[number];

export const SET_ASIDE_LABELS: Record<SetAsideReason, string> = {
  offSize: 'Off-size',
  hardCareYarn: 'Hard-care yarn',
  soiledOrDamaged: 'Soiled or damaged',
  other: 'Other',
};

export interface SenderDetails {
  name?: string | null;
  email?: string | null;
  address?: string | null;
}

export interface SamplePanelMeasurement {
  width: number;
  height: number;
  unit: 'in' | 'cm';
}

/** What a person enters for one parcel (form, or one row of a bulk import). */
export interface ParcelReceiptInput {
  chapterId: number;
  /** ISO date, not in the future, not before the chapter existed. */
  receivedOn: string;
  sender?: SenderDetails | null;
  /** As written on the label; unknown codes are kept, uncredited, with a warning. */
  campaignCode?: string | null;
  panelsAccepted: number;
  setAside: Record<SetAsideReason, number>;
  /** Required when setAside.other > 0. */
  setAsideOtherNote?: string | null;
  finishedBlankets: Array<{ blanketSizeId: number; count: number }>;
  otherItems: number;
  notes?: string | null;
  samplePanel?: SamplePanelMeasurement | null;
}

export interface ScanView {
  id: number;
  fileName: string;
  mediaType: string;
  sizeBytes: number;
  uploadedAt: string;
  /** Download address (needs the same sign-in and scope as the receipt). */
  url: string;
}

export interface ParcelReceiptView {
  id: number;
  chapterId: number;
  chapterName: string;
  regionId: number;
  regionName: string;
  receivedOn: string;
  /**
   * The sender's personal data, for the roles allowed to see it (BRIEF §2); null for others,
   * and null with `senderErased` once an admin erased it.
   */
  sender: SenderDetails | null;
  senderErased: boolean;
  campaignId: number | null;
  campaignCode: string | null;
  /** True when the code matched a campaign running on the received date. */
  credited: boolean;
  panelsAccepted: number;
  setAside: Record<SetAsideReason, number>;
  setAsideOtherNote: string | null;
  setAsideTotal: number;
  finishedBlankets: Array<{ blanketSizeId: number; name: string; count: number }>;
  finishedBlanketsTotal: number;
  otherItems: number;
  notes: string | null;
  samplePanel: (SamplePanelMeasurement & { withinTolerance: boolean; messages: string[] }) | null;
  scanCount: number;
  importBatchId: number | null;
  createdAt: string;
  version: number;
  /** Things worth a second look that did not stop the save (e.g. an uncredited code). */
  warnings: string[];
}

export interface ParcelReceiptDetail extends ParcelReceiptView {
  scans: ScanView[];
}

export interface ReceiptListParams {
  page?: number;
  pageSize?: number;
  from?: string;
  to?: string;
  regionId?: number;
  chapterId?: number;
  campaignId?: number;
  hasScan?: boolean;
  sort?: 'receivedOn' | 'panelsAccepted' | 'chapterName';
  direction?: 'asc' | 'desc';
}

export interface ReceiptTotals {
  receipts: number;
  panelsAccepted: number;
  setAside: number;
  finishedBlankets: number;
  otherItems: number;
}

/** A page of receipts and the totals of every receipt that matches the filters (not only this page). */
export interface ReceiptPage extends Page<ParcelReceiptView> {
  totals: ReceiptTotals;
}
