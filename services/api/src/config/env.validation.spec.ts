import { envValidationSchema } from './env.validation';

describe('EXPORT_XLSX_ROWS_PER_SHEET', () => {
  const rows = envValidationSchema.extract('EXPORT_XLSX_ROWS_PER_SHEET');

  it("defaults to the xlsx format's row limit", () => {
    // Source: Microsoft, "Excel specifications and limits": 1,048,576 rows by 16,384 columns.
    expect(rows.validate(undefined).value).toBe(1_048_576);
  });

  it('takes lower whole numbers down to a header, one row and the totals', () => {
    expect(rows.validate('1000').value).toBe(1000);
    expect(rows.validate('3').error).toBeUndefined();
  });

  it('refuses more rows than Excel allows, too few, and fractions', () => {
    for (const bad of ['1048577', '2', '0', '-5', '10.5', 'many'])
      expect(rows.validate(bad).error?.message).toMatch(/must be/);
  });
});
