import type {
  BlanketSizeView,
  CampaignView,
  NetworkSettings,
  ParcelReceiptDetail,
  ReceiptPage,
  ScanView,
} from '@tallyloom/core';

// Invented parcels of the demo network (BRIEF §7), for the parcel pages' tests.

const size = (
  id: number,
  name: string,
  columns: number,
  rows: number,
  sortOrder: number,
  active = true,
): BlanketSizeView => ({
  id,
  name,
  columns,
  rows,
  panels: columns * rows,
  widthIn: columns * 7,
  heightIn: rows * 9,
  widthCm: columns * 7 * 2.54,
  heightCm: rows * 9 * 2.54,
  active,
  sortOrder,
  sourceNote: null,
});

export const demoBlanketSizes: BlanketSizeView[] = [
  size(1, 'Baby', 4, 4, 1),
  size(2, 'Child', 5, 5, 2),
  size(3, 'Lap', 6, 5, 3),
  size(4, 'Adult throw', 7, 7, 4),
  size(5, 'Cot (retired)', 3, 3, 5, false),
];

export const demoCampaigns: CampaignView[] = [
  {
    id: 7,
    code: 'DWD26',
    name: 'Deep Winter Drive',
    goalPanels: 4_000,
    startsOn: '2025-11-01',
    endsOn: '2026-02-28',
    regionId: null,
    regionName: null,
  },
  {
    id: 8,
    code: 'NRS25',
    name: 'North Ridge Spring Drive',
    goalPanels: 1_500,
    startsOn: '2025-03-01',
    endsOn: '2025-05-31',
    regionId: 1,
    regionName: 'North Ridge',
  },
];

export const demoSettings: NetworkSettings = {
  fiscalYearStartMonth: 7,
  panelToleranceIn: 0.5,
  receiptCountCeiling: 5_000,
  servedPerBlanketWarnFactor: 3,
  reminderDaysBeforeDue: 3,
  reminderDaysAfterDue: 2,
};

export const demoScans: ScanView[] = [
  {
    id: 31,
    fileName: 'label-front.png',
    mediaType: 'image/png',
    sizeBytes: 245_760,
    uploadedAt: '2026-01-04T10:15:00Z',
    url: '/api/receipts/501/scans/31/file',
  },
  {
    id: 32,
    fileName: 'packing-slip.pdf',
    mediaType: 'application/pdf',
    sizeBytes: 1_572_864,
    uploadedAt: '2026-01-04T10:16:00Z',
    url: '/api/receipts/501/scans/32/file',
  },
];

/** A parcel at Alder Falls, credited to the Deep Winter Drive, with a sender and two scans. */
export function aReceipt(overrides: Partial<ParcelReceiptDetail> = {}): ParcelReceiptDetail {
  return {
    id: 501,
    chapterId: 11,
    chapterName: 'Alder Falls',
    regionId: 1,
    regionName: 'North Ridge',
    receivedOn: '2026-01-04',
    sender: {
      name: 'Wren Example',
      email: 'wren@maker.example',
      address: '12 Loom Lane\nAlder Falls',
    },
    senderErased: false,
    campaignId: 7,
    campaignCode: 'DWD26',
    credited: true,
    panelsAccepted: 1_240,
    setAside: { offSize: 12, hardCareYarn: 3, soiledOrDamaged: 1, other: 0 },
    setAsideOtherNote: null,
    setAsideTotal: 16,
    finishedBlankets: [
      { blanketSizeId: 1, name: 'Baby', count: 2 },
      { blanketSizeId: 3, name: 'Lap', count: 1 },
    ],
    finishedBlanketsTotal: 3,
    otherItems: 4,
    notes: 'Two hats in the box as well.',
    samplePanel: null,
    scanCount: 2,
    importBatchId: null,
    createdAt: '2026-01-04T10:10:00Z',
    version: 3,
    warnings: [],
    scans: demoScans,
    ...overrides,
  };
}

const chapterNames: Array<[number, string, number, string]> = [
  [11, 'Alder Falls', 1, 'North Ridge'],
  [21, 'Brindle Bay', 2, 'Riverlands'],
];

/** Thirty parcels for the list, newest first. */
export const demoReceipts: ParcelReceiptDetail[] = Array.from({ length: 30 }, (_, index) => {
  const [chapterId, chapterName, regionId, regionName] = chapterNames[index % 2] ?? [
    11,
    'Alder Falls',
    1,
    'North Ridge',
  ];
  const day = String(28 - index).padStart(2, '0');
  return aReceipt({
    id: 600 + index,
    chapterId,
    chapterName,
    regionId,
    regionName,
    receivedOn: index < 28 ? `2026-01-${day}` : `2025-12-${31 - index}`,
    panelsAccepted: 100 + index * 50,
    scanCount: index % 3,
    campaignCode: index === 1 ? 'ZZZ99' : 'DWD26',
    credited: index !== 1,
  });
});

/** The server's answer to `GET /api/receipts` over `receipts`: a page, and totals over all. */
export function receiptsPage(
  url: URL,
  receipts: ParcelReceiptDetail[] = demoReceipts,
  totals: Partial<ReceiptPage['totals']> = {},
): ReceiptPage {
  const page = Number(url.searchParams.get('page') ?? '1');
  const pageSize = Number(url.searchParams.get('pageSize') ?? '25');
  const chapterId = url.searchParams.get('chapterId');
  const matching = receipts.filter(
    (receipt) => !chapterId || receipt.chapterId === Number(chapterId),
  );
  return {
    items: matching.slice((page - 1) * pageSize, page * pageSize),
    total: matching.length,
    page,
    pageSize,
    totals: {
      receipts: matching.length,
      panelsAccepted: matching.reduce((sum, receipt) => sum + receipt.panelsAccepted, 0),
      setAside: matching.reduce((sum, receipt) => sum + receipt.setAsideTotal, 0),
      finishedBlankets: matching.reduce((sum, receipt) => sum + receipt.finishedBlanketsTotal, 0),
      otherItems: matching.reduce((sum, receipt) => sum + receipt.otherItems, 0),
      ...totals,
    },
  };
}
