import {
  FINISHED_FIELD_LABEL_PREFIX,
  RECEIPT_IMPORT_FIELDS,
  type FieldProblem,
  type ImportCell,
  type ImportRowProblem,
  type ReceiptImportField,
  type ReceiptImportFixedField,
} from '@tallyloom/core';

export type ImportMapping = Record<string, ReceiptImportField | null>;

const FIXED_FIELDS = Object.keys(RECEIPT_IMPORT_FIELDS) as ReceiptImportFixedField[];
const FINISHED = /^finished:([1-9]\d{0,9})$/;

const TEXT_FIELDS: ReadonlySet<ReceiptImportField> = new Set([
  'senderName',
  'senderEmail',
  'senderAddress',
  'campaignCode',
  'setAsideOtherNote',
  'notes',
]);

export function isFixedField(value: unknown): value is ReceiptImportFixedField {
  return typeof value === 'string' && (FIXED_FIELDS as string[]).includes(value);
}

/** The blanket size id of a `finished:<id>` field, or null for any other value. */
export function finishedSizeId(value: unknown): number | null {
  const match = typeof value === 'string' ? FINISHED.exec(value) : null;
  return match ? Number(match[1]) : null;
}

export function finishedField(blanketSizeId: number): ReceiptImportField {
  return `finished:${blanketSizeId}`;
}

export function fieldLabel(field: ReceiptImportField, sizeNames: Map<number, string>): string {
  const sizeId = finishedSizeId(field);
  if (sizeId === null) return RECEIPT_IMPORT_FIELDS[field as ReceiptImportFixedField];
  return `${FINISHED_FIELD_LABEL_PREFIX}${sizeNames.get(sizeId) ?? `size ${sizeId}`}`;
}

const squash = (text: string) => text.toLowerCase().replace(/[^a-z0-9]/g, '');

/** Other ways a header may name a field. */
const SYNONYMS: Record<string, ReceiptImportFixedField> = {
  date: 'receivedOn',
  received: 'receivedOn',
  datereceived: 'receivedOn',
  sender: 'senderName',
  name: 'senderName',
  email: 'senderEmail',
  senderemail: 'senderEmail',
  address: 'senderAddress',
  campaign: 'campaignCode',
  code: 'campaignCode',
  panels: 'panelsAccepted',
  accepted: 'panelsAccepted',
  offsize: 'setAsideOffSize',
  hardcare: 'setAsideHardCareYarn',
  hardcareyarn: 'setAsideHardCareYarn',
  soiled: 'setAsideSoiledOrDamaged',
  damaged: 'setAsideSoiledOrDamaged',
  note: 'notes',
};

/** Each header's likely field: by label, key or a common synonym; never one field twice. */
export function suggestMapping(
  headers: string[],
  sizes: Array<{ id: number; name: string }>,
): ImportMapping {
  const known = new Map<string, ReceiptImportField>();
  for (const field of FIXED_FIELDS) {
    known.set(squash(field), field);
    known.set(squash(RECEIPT_IMPORT_FIELDS[field]), field);
  }
  for (const [word, field] of Object.entries(SYNONYMS)) known.set(word, field);
  for (const size of sizes) {
    const field = finishedField(size.id);
    known.set(squash(`${FINISHED_FIELD_LABEL_PREFIX}${size.name}`), field);
    known.set(squash(field), field);
  }
  const taken = new Set<ReceiptImportField>();
  const mapping: ImportMapping = {};
  for (const header of headers) {
    const field = known.get(squash(header)) ?? null;
    mapping[header] = field && !taken.has(field) ? field : null;
    if (field) taken.add(field);
  }
  return mapping;
}

/**
 * Text a spreadsheet program might run as a formula (or a DDE command) if the value is ever
 * pasted or exported back into a sheet. It is stored exactly as written and flagged.
 */
export function looksLikeFormula(value: ImportCell): boolean {
  return typeof value === 'string' && /^[=+\-@\t\r]/.test(value);
}

/** One row turned into the body the receipt form would send, plus what it says per field. */
export interface MappedRow {
  /** Plain input for ReceiptInputDto; validated exactly like a form submission. */
  input: Record<string, unknown>;
  values: Partial<Record<ReceiptImportField, ImportCell>>;
  warnings: ImportRowProblem[];
  /** Which import field each `finishedBlankets.<index>` came from. */
  finishedFields: ReceiptImportField[];
}

export interface ColumnPlan {
  index: number;
  header: string;
  field: ReceiptImportField;
}

export function mapRow(cells: ImportCell[], plan: ColumnPlan[], chapterId: number): MappedRow {
  const values: MappedRow['values'] = {};
  const warnings: ImportRowProblem[] = [];
  for (const column of plan) {
    const value = cells[column.index] ?? null;
    values[column.field] = value;
    if (TEXT_FIELDS.has(column.field) && looksLikeFormula(value))
      warnings.push({
        field: column.field,
        column: column.header,
        message: `Starts with "${printable((value as string)[0])}", as a spreadsheet formula would; it is kept as plain text and never run.`,
      });
  }
  const text = (field: ReceiptImportField): string | null => {
    const value = values[field];
    return value === undefined || value === null ? null : String(value);
  };
  const finishedFields = plan.map((c) => c.field).filter((f) => finishedSizeId(f) !== null);
  const senderGiven = ['senderName', 'senderEmail', 'senderAddress'].some(
    (field) => values[field as ReceiptImportField] != null,
  );
  return {
    input: {
      chapterId,
      receivedOn: dateOf(values.receivedOn),
      sender: senderGiven
        ? {
            name: text('senderName'),
            email: text('senderEmail'),
            address: text('senderAddress'),
          }
        : null,
      campaignCode: text('campaignCode'),
      panelsAccepted: countOf(values.panelsAccepted),
      setAside: {
        offSize: countOf(values.setAsideOffSize),
        hardCareYarn: countOf(values.setAsideHardCareYarn),
        soiledOrDamaged: countOf(values.setAsideSoiledOrDamaged),
        other: countOf(values.setAsideOther),
      },
      setAsideOtherNote: text('setAsideOtherNote'),
      finishedBlankets: finishedFields.map((field) => ({
        blanketSizeId: finishedSizeId(field),
        count: countOf(values[field]),
      })),
      otherItems: countOf(values.otherItems),
      notes: text('notes'),
      samplePanel: null,
    },
    values,
    warnings,
    finishedFields,
  };
}

function printable(character: string): string {
  return character === '\t' ? 'tab' : character === '\r' ? 'carriage return' : character;
}

/** An empty count cell means none; text that is a plain number becomes it; anything else stays. */
function countOf(value: ImportCell | undefined): unknown {
  if (value === undefined || value === null) return 0;
  if (typeof value === 'number') return value;
  const trimmed = value.trim();
  if (trimmed === '') return 0;
  if (/^[+-]?\d+(\.\d+)?$/.test(trimmed)) return Number(trimmed);
  if (/^\d{1,3}(,\d{3})+$/.test(trimmed)) return Number(trimmed.replace(/,/g, ''));
  return value;
}

// Days from 1899-12-30 (the spreadsheet date epoch) to 1970-01-01.
const SHEET_EPOCH_OFFSET_DAYS = 25569;

/**
 * A date cell: ISO text (a time part, as some programs add, is dropped), or a spreadsheet day
 * number when the cell was not formatted as a date. Anything else goes on as typed, so the
 * form's own check names it.
 */
function dateOf(value: ImportCell | undefined): unknown {
  if (value === undefined || value === null) return undefined;
  if (typeof value === 'number') {
    if (!Number.isInteger(value) || value < 1 || value > 2958465) return String(value);
    return new Date((value - SHEET_EPOCH_OFFSET_DAYS) * 86_400_000).toISOString().slice(0, 10);
  }
  const trimmed = value.trim();
  const withTime = /^(\d{4}-\d{2}-\d{2})T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?$/.exec(
    trimmed,
  );
  return withTime ? withTime[1] : trimmed;
}

const PATHS: Partial<Record<string, ReceiptImportFixedField>> = {
  chapterId: 'receivedOn',
  receivedOn: 'receivedOn',
  sender: 'senderName',
  'sender.name': 'senderName',
  'sender.email': 'senderEmail',
  'sender.address': 'senderAddress',
  campaignCode: 'campaignCode',
  panelsAccepted: 'panelsAccepted',
  setAside: 'setAsideOffSize',
  'setAside.offSize': 'setAsideOffSize',
  'setAside.hardCareYarn': 'setAsideHardCareYarn',
  'setAside.soiledOrDamaged': 'setAsideSoiledOrDamaged',
  'setAside.other': 'setAsideOther',
  setAsideOtherNote: 'setAsideOtherNote',
  otherItems: 'otherItems',
  notes: 'notes',
};

/** The form's problems (named by the body's paths) named by the import's fields and columns. */
export function rowProblems(
  problems: FieldProblem[],
  row: MappedRow,
  headerOf: Map<ReceiptImportField, string>,
): ImportRowProblem[] {
  return problems.flatMap((problem) => {
    const finished = /^finishedBlankets\.(\d+)/.exec(problem.field);
    const field: ReceiptImportField | undefined = finished
      ? row.finishedFields[Number(finished[1])]
      : PATHS[problem.field];
    const column = field ? (headerOf.get(field) ?? null) : null;
    return problem.messages.map((message) => ({ field: field ?? 'row', column, message }));
  });
}
