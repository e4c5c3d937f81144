import {
  FINISHED_FIELD_LABEL_PREFIX,
  RECEIPT_IMPORT_FIELDS,
  type BlanketSizeView,
  type ReceiptImportField,
  type ReceiptImportFixedField,
} from '@tallyloom/core';

export interface FieldOption {
  value: ReceiptImportField;
  label: string;
}

function isFixedField(field: string): field is ReceiptImportFixedField {
  return Object.hasOwn(RECEIPT_IMPORT_FIELDS, field);
}

function finishedSizeId(field: string): number | null {
  const match = /^finished:(\d+)$/.exec(field);
  return match ? Number(match[1]) : null;
}

/** The field's name as the template heads its column: "Received on", "Finished: Lap". */
export function fieldLabel(field: ReceiptImportField | 'row', sizes: BlanketSizeView[]): string {
  if (field === 'row') return 'The row';
  if (isFixedField(field)) return RECEIPT_IMPORT_FIELDS[field];
  const sizeId = finishedSizeId(field);
  const size = sizes.find((candidate) => candidate.id === sizeId);
  return `${FINISHED_FIELD_LABEL_PREFIX}${size ? size.name : `size ${sizeId ?? '?'}`}`;
}

/**
 * What a column can fill: the receipt's own fields, then finished blankets of each size in use,
 * plus any field the server suggested that is not among them (so a prefilled choice still shows).
 */
export function fieldOptions(
  sizes: BlanketSizeView[],
  suggested: Array<ReceiptImportField | null>,
): FieldOption[] {
  const options: FieldOption[] = [
    ...(Object.keys(RECEIPT_IMPORT_FIELDS) as ReceiptImportFixedField[]).map((field) => ({
      value: field,
      label: RECEIPT_IMPORT_FIELDS[field],
    })),
    ...sizes
      .filter((size) => size.active)
      .map((size) => ({
        value: `finished:${size.id}` as const,
        label: `${FINISHED_FIELD_LABEL_PREFIX}${size.name}`,
      })),
  ];
  for (const field of suggested) {
    if (field && !options.some((option) => option.value === field)) {
      options.push({ value: field, label: fieldLabel(field, sizes) });
    }
  }
  return options;
}

/** Parses a select's value back into a field; only values the options offered come back. */
export function asField(value: string, options: FieldOption[]): ReceiptImportField | null {
  return options.find((option) => option.value === value)?.value ?? null;
}
