import { changeBetween } from './change';

describe('changeBetween', () => {
  it('gives the absolute and relative change and its direction', () => {
    expect(changeBetween(125, 100)).toEqual({ absolute: 25, percent: 25, direction: 'up' });
    expect(changeBetween(60, 80)).toEqual({ absolute: -20, percent: -25, direction: 'down' });
    expect(changeBetween(42, 42)).toEqual({ absolute: 0, percent: 0, direction: 'same' });
  });

  it('has no percentage when the previous value is 0', () => {
    expect(changeBetween(30, 0)).toEqual({ absolute: 30, percent: null, direction: 'up' });
    expect(changeBetween(0, 0)).toEqual({ absolute: 0, percent: null, direction: 'same' });
  });

  it('keeps decimals of hours and kilograms', () => {
    const change = changeBetween(12.5, 10);
    expect(change.percent).toBeCloseTo(25, 10);
    expect(change.absolute).toBeCloseTo(2.5, 10);
  });

  it('refuses a value that is not a number', () => {
    expect(() => changeBetween(Number.NaN, 1)).toThrow(/current must be a finite number/);
  });
});
