/**
 * Bulk import of parcel receipts from a spreadsheet: upload → map columns → preview every row's
 * problems → commit all rows in one go, or none.
 */

/** The fields of a parcel receipt a column can fill, with the label the template uses. */
export const RECEIPT_IMPORT_FIELDS = {
  receivedOn: 'Received on',
  senderName: 'Sender name',
  senderEmail: 'Sender e-mail',
  senderAddress: 'Sender address',
  campaignCode: 'Campaign code',
  panelsAccepted: 'Panels accepted',
  setAsideOffSize: 'Set aside: off-size',
  setAsideHardCareYarn: 'Set aside: hard-care yarn',
  setAsideSoiledOrDamaged: 'Set aside: soiled or damaged',
  setAsideOther: 'Set aside: other',
  setAsideOtherNote: 'Set aside: other (why)',
  otherItems: 'Other items',
  notes: 'Notes',
} as const;

export type ReceiptImportFixedField = keyof typeof RECEIPT_IMPORT_FIELDS;

/** Finished blankets of one catalogue size: `finished:<blanketSizeId>`. */
export type ReceiptImportFinishedField = `finished:${number}`;

export type ReceiptImportField = ReceiptImportFixedField | ReceiptImportFinishedField;

/** The prefix of a finished-blanket column's label in the template: "Finished: Lap". */
export const FINISHED_FIELD_LABEL_PREFIX = 'Finished: ';

/** The most data rows one import may hold. */
export const RECEIPT_IMPORT_MAX_ROWS = 20_000;

/** A spreadsheet cell as read: text, a number, or empty. Dates arrive as YYYY-MM-DD text. */
export type ImportCell = string | number | null;

export interface ImportUploadResponse {
  /** Opaque; names the upload in the preview and commit calls. Expires unused after 30 minutes. */
  importId: string;
  chapterId: number;
  fileName: string;
  sha256: string;
  fileType: 'csv' | 'xlsx';
  headers: string[];
  /** Data rows (blank rows left out); the size of a determinate progress bar. */
  rowCount: number;
  /** Each header's likely field, or null when none fits. */
  suggestedMapping: Record<string, ReceiptImportField | null>;
  /** The first few data rows, keyed by header. */
  sampleRows: Array<Record<string, ImportCell>>;
  expiresAt: string;
}

export interface ImportPreviewRequest {
  /** Header → field, or null to ignore the column. Headers left out are ignored too. */
  mapping: Record<string, ReceiptImportField | null>;
  page?: number;
  pageSize?: number;
  /** Which rows `rows` pages through; the counts and `rowErrors` always cover every row. */
  only?: 'all' | 'errors' | 'warnings';
}

export interface ImportRowProblem {
  field: ReceiptImportField | 'row';
  /** The header of the column the field came from, when there is one. */
  column: string | null;
  message: string;
}

export interface ImportPreviewRow {
  /** The row's number in the sheet (the header is row 1). */
  rowNumber: number;
  values: Partial<Record<ReceiptImportField, ImportCell>>;
  /** Rows with errors stop the commit. */
  errors: ImportRowProblem[];
  /** Worth a look; the row is still imported. */
  warnings: ImportRowProblem[];
}

export interface ImportPreviewResponse {
  rowCount: number;
  validCount: number;
  /** Rows with at least one error. */
  errorCount: number;
  /** Rows with at least one warning. */
  warningCount: number;
  page: number;
  pageSize: number;
  /** How many rows `only` selects; pages run over these. */
  total: number;
  rows: ImportPreviewRow[];
  /** Every error of every row, whatever the page. */
  rowErrors: Array<{ rowNumber: number; errors: ImportRowProblem[] }>;
}

export interface ImportCommitRequest {
  mapping: Record<string, ReceiptImportField | null>;
}

export interface ImportCommitResponse {
  batchId: number;
  created: number;
}
