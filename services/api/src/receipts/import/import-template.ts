import {
  FINISHED_FIELD_LABEL_PREFIX,
  RECEIPT_IMPORT_FIELDS,
  type ReceiptImportFixedField,
} from '@tallyloom/core';
import { Workbook } from 'exceljs';

/** An invented example parcel: no sender, nothing personal. */
const EXAMPLE: Record<ReceiptImportFixedField, string | number> = {
  receivedOn: '2026-01-15',
  senderName: '',
  senderEmail: '',
  senderAddress: '',
  campaignCode: '',
  panelsAccepted: 24,
  setAsideOffSize: 2,
  setAsideHardCareYarn: 1,
  setAsideSoiledOrDamaged: 0,
  setAsideOther: 0,
  setAsideOtherNote: '',
  otherItems: 0,
  notes: 'Example row: replace or delete it',
};

interface TemplateColumn {
  header: string;
  example: string | number;
}

/** The template's columns: every field's label, then one per blanket size in use. */
export function templateColumns(sizes: Array<{ name: string }>): TemplateColumn[] {
  return [
    ...(Object.keys(RECEIPT_IMPORT_FIELDS) as ReceiptImportFixedField[]).map((field) => ({
      header: RECEIPT_IMPORT_FIELDS[field],
      example: EXAMPLE[field],
    })),
    ...sizes.map((size) => ({ header: `${FINISHED_FIELD_LABEL_PREFIX}${size.name}`, example: 0 })),
  ];
}

/** RFC 4180: every field quoted, quotes doubled, CRLF line ends; a BOM so Excel reads UTF-8. */
export function templateCsv(columns: TemplateColumn[]): Buffer {
  const line = (cells: Array<string | number>) =>
    cells.map((cell) => `"${String(cell).replace(/"/g, '""')}"`).join(',');
  const text = [line(columns.map((c) => c.header)), line(columns.map((c) => c.example))].join(
    '\r\n',
  );
  return Buffer.from(`\uFEFF${text}\r\n`, 'utf8');
}

export async function templateXlsx(columns: TemplateColumn[]): Promise<Buffer> {
  const workbook = new Workbook();
  workbook.creator = 'Tallyloom';
  const sheet = workbook.addWorksheet('Parcel receipts', {
    views: [{ state: 'frozen', ySplit: 1 }],
  });
  sheet.columns = columns.map((column) => ({
    header: column.header,
    width: Math.max(12, Math.min(40, column.header.length + 4)),
  }));
  sheet.getRow(1).font = { bold: true };
  const example = sheet.addRow(columns.map((column) => column.example));
  // The date as a real date cell, so a spreadsheet shows and sorts it as one.
  const date = example.getCell(1);
  date.value = new Date(`${EXAMPLE.receivedOn}T00:00:00Z`);
  date.numFmt = 'yyyy-mm-dd';
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
