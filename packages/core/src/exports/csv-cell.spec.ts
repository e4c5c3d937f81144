import { neutraliseCsvCell } from './csv-cell';

describe('neutraliseCsvCell', () => {
  // Source: OWASP, "CSV Injection": cells beginning with =, +, -, @, tab (0x09) or carriage
  // return (0x0D) are prefixed with a single quote.
  it.each([
    ['=SUM(A1:A9)', "'=SUM(A1:A9)"],
    ['+1+cmd', "'+1+cmd"],
    ["-2+3+cmd|' /C calc'!A0", "'-2+3+cmd|' /C calc'!A0"],
    ['@SUM(1)', "'@SUM(1)"],
    ['\t=1', "'\t=1"],
    ['\r=1', "'\r=1"],
  ])('prefixes %j with a single quote', (cell, expected) => {
    expect(neutraliseCsvCell(cell)).toBe(expected);
  });

  it('leaves text that does not begin with a trigger alone, even with one inside', () => {
    expect(neutraliseCsvCell('Alder Falls')).toBe('Alder Falls');
    expect(neutraliseCsvCell('a=b, "quoted"\nnext line')).toBe('a=b, "quoted"\nnext line');
    expect(neutraliseCsvCell(' =1')).toBe(' =1');
  });

  it('keeps numbers as numbers, a negative one included: it is data, not a formula', () => {
    expect(neutraliseCsvCell(42)).toBe(42);
    expect(neutraliseCsvCell(-5)).toBe(-5);
    expect(neutraliseCsvCell(0)).toBe(0);
  });

  it('quotes text that only looks like a negative number', () => {
    expect(neutraliseCsvCell('-5')).toBe("'-5");
  });

  it('writes empty cells for absent values and refuses non-finite numbers', () => {
    expect(neutraliseCsvCell(null)).toBe('');
    expect(neutraliseCsvCell(undefined)).toBe('');
    expect(() => neutraliseCsvCell(Number.NaN)).toThrow(RangeError);
  });
});
