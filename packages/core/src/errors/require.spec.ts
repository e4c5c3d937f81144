import { DomainError } from './domain-error';
import {
  requireFiniteNumber,
  requireNonNegativeNumber,
  requirePositiveNumber,
  requireWholeNumber,
} from './require';

describe('argument guards', () => {
  it('returns the value when it is acceptable', () => {
    expect(requireWholeNumber('count', 0)).toBe(0);
    expect(requireWholeNumber('columns', 3, 1)).toBe(3);
    expect(requireFiniteNumber('delta', -2.5)).toBe(-2.5);
    expect(requirePositiveNumber('width', 0.1)).toBe(0.1);
    expect(requireNonNegativeNumber('tolerance', 0)).toBe(0);
  });

  it('throws a DomainError that is also a RangeError and names the argument', () => {
    let caught: unknown;
    try {
      requireWholeNumber('panelsInStock', 2.5);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(DomainError);
    expect(caught).toBeInstanceOf(RangeError);
    expect((caught as DomainError).argument).toBe('panelsInStock');
    expect((caught as DomainError).message).toBe(
      'panelsInStock must be a whole number of at least 0; got 2.5.',
    );
  });

  it('rejects values outside each guard', () => {
    expect(() => requireWholeNumber('rows', 0, 1)).toThrow(
      'rows must be a whole number of at least 1; got 0.',
    );
    expect(() => requireWholeNumber('count', -1)).toThrow(
      'count must be a whole number of at least 0; got -1.',
    );
    expect(() => requireWholeNumber('count', '3' as unknown as number)).toThrow(
      'count must be a whole number',
    );
    expect(() => requireFiniteNumber('delta', Number.NaN)).toThrow(
      'delta must be a finite number; got NaN.',
    );
    expect(() => requireFiniteNumber('delta', Infinity)).toThrow('delta must be a finite number');
    expect(() => requirePositiveNumber('width', 0)).toThrow('width must be greater than 0; got 0.');
    expect(() => requireNonNegativeNumber('tolerance', -0.1)).toThrow(
      'tolerance must be 0 or more; got -0.1.',
    );
  });
});
