/**
 * Characters that make a spreadsheet program read a cell as a formula (or, for tab and carriage
 * return, that hide one behind leading whitespace).
 */
// Source: OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection).
export const FORMULA_TRIGGERS = ['=', '+', '-', '@', '\t', '\r'] as const;

export type CsvCellValue = string | number | boolean | null | undefined;

/**
 * A cell as it goes into a CSV file. Text that begins with a formula trigger gets a leading single
 * quote, so the program shows it as text instead of running it. Numbers stay numbers: a JS number
 * is only ever digits with an optional minus sign, which no spreadsheet program reads as a
 * formula. Text that merely looks like a negative number ('-5') is still quoted, because we cannot
 * tell it from '-2+3+…'. Quoting for commas, quotes and line breaks is the writer's job (RFC 4180).
 */
export function neutraliseCsvCell(value: CsvCellValue): string | number | boolean {
  if (value === null || value === undefined) return '';
  if (typeof value !== 'string') {
    if (typeof value === 'number' && !Number.isFinite(value))
      throw new RangeError(`a CSV cell cannot hold ${value}`);
    return value;
  }
  return (FORMULA_TRIGGERS as readonly string[]).includes(value.charAt(0)) ? `'${value}` : value;
}
