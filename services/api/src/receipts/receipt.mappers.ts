import { checkPanelSize, type ParcelReceiptView, type ScanView } from '@tallyloom/core';
import type { ParcelReceipt } from './models/parcel-receipt.model';
import type { ReceiptFinishedBlanket } from './models/receipt-finished-blanket.model';
import type { ReceiptScan } from './models/receipt-scan.model';

export interface ViewExtras {
  /** Whether the reader's role may see senders' personal data ('senders.read'). */
  showSender: boolean;
  toleranceIn: number;
  finishedBlankets: ReceiptFinishedBlanket[];
  scanCount: number;
}

export function uncreditedWarning(code: string, receivedOn: string): string {
  return `Code ${code} matches no campaign running on ${receivedOn}; saved as uncredited.`;
}

/** The receipt must be loaded with its chapter and the chapter's region. */
export function toReceiptView(receipt: ParcelReceipt, extras: ViewExtras): ParcelReceiptView {
  const setAside = {
    offSize: receipt.setAsideOffSize,
    hardCareYarn: receipt.setAsideHardCareYarn,
    soiledOrDamaged: receipt.setAsideSoiledOrDamaged,
    other: receipt.setAsideOther,
  };
  const finishedBlankets = extras.finishedBlankets.map((row) => ({
    blanketSizeId: row.blanketSizeId,
    name: row.blanketSize?.name ?? '',
    count: row.count,
  }));
  const warnings: string[] = [];
  if (receipt.campaignCodeEntered && receipt.campaignId === null) {
    warnings.push(uncreditedWarning(receipt.campaignCodeEntered, receipt.receivedOn));
  }
  return {
    id: receipt.id,
    chapterId: receipt.chapterId,
    chapterName: receipt.chapter?.name ?? '',
    regionId: receipt.chapter?.regionId ?? 0,
    regionName: receipt.chapter?.region?.name ?? '',
    receivedOn: receipt.receivedOn,
    sender: extras.showSender ? senderOf(receipt) : null,
    senderErased: receipt.senderErasedAt !== null,
    campaignId: receipt.campaignId,
    campaignCode: receipt.campaignCodeEntered,
    credited: receipt.campaignId !== null,
    panelsAccepted: receipt.panelsAccepted,
    setAside,
    setAsideOtherNote: receipt.setAsideOtherNote,
    setAsideTotal:
      setAside.offSize + setAside.hardCareYarn + setAside.soiledOrDamaged + setAside.other,
    finishedBlankets,
    finishedBlanketsTotal: finishedBlankets.reduce((sum, row) => sum + row.count, 0),
    otherItems: receipt.otherItems,
    notes: receipt.notes,
    samplePanel: samplePanelOf(receipt, extras.toleranceIn),
    scanCount: extras.scanCount,
    importBatchId: receipt.importBatchId,
    createdAt: receipt.createdAt.toISOString(),
    version: receipt.version,
    warnings,
  };
}

function senderOf(receipt: ParcelReceipt): ParcelReceiptView['sender'] {
  const { senderName: name, senderEmail: email, senderAddress: address } = receipt;
  return name || email || address ? { name, email, address } : null;
}

/** Checked on every read, so a changed tolerance setting shows at once. */
function samplePanelOf(
  receipt: ParcelReceipt,
  toleranceIn: number,
): ParcelReceiptView['samplePanel'] {
  if (receipt.sampleWidth === null || receipt.sampleHeight === null || !receipt.sampleUnit)
    return null;
  const width = Number(receipt.sampleWidth);
  const height = Number(receipt.sampleHeight);
  const unit = receipt.sampleUnit;
  const check = checkPanelSize(
    { width: { value: width, unit }, height: { value: height, unit } },
    toleranceIn,
  );
  return { width, height, unit, withinTolerance: check.withinTolerance, messages: check.messages };
}

export function toScanView(scan: ReceiptScan): ScanView {
  return {
    id: scan.id,
    fileName: scan.displayName,
    mediaType: scan.mediaType,
    sizeBytes: scan.sizeBytes,
    uploadedAt: scan.createdAt.toISOString(),
    url: `/api/receipts/${scan.receiptId}/scans/${scan.id}/file`,
  };
}

/**
 * What an audit entry keeps of a receipt. Never the sender's details, only whether there are
 * any: the audit log is append-only, so anything written there could never be erased.
 */
export function auditableReceipt(
  receipt: ParcelReceipt,
  finishedBlankets: Array<{ blanketSizeId: number; count: number }>,
): Record<string, unknown> {
  return {
    chapterId: receipt.chapterId,
    receivedOn: receipt.receivedOn,
    sender:
      receipt.senderName || receipt.senderEmail || receipt.senderAddress ? 'present' : 'absent',
    campaignId: receipt.campaignId,
    campaignCode: receipt.campaignCodeEntered,
    panelsAccepted: receipt.panelsAccepted,
    setAside: {
      offSize: receipt.setAsideOffSize,
      hardCareYarn: receipt.setAsideHardCareYarn,
      soiledOrDamaged: receipt.setAsideSoiledOrDamaged,
      other: receipt.setAsideOther,
    },
    setAsideOtherNote: receipt.setAsideOtherNote,
    finishedBlankets: finishedBlankets.map(({ blanketSizeId, count }) => ({
      blanketSizeId,
      count,
    })),
    otherItems: receipt.otherItems,
    notes: receipt.notes,
    samplePanel:
      receipt.sampleUnit === null
        ? null
        : {
            width: Number(receipt.sampleWidth),
            height: Number(receipt.sampleHeight),
            unit: receipt.sampleUnit,
          },
    version: receipt.version,
  };
}
