import { jStat } from 'jstat';
import { DomainError } from '../errors/domain-error';
import { binomialCdf, hypergeometricCdf } from './distributions';

describe('binomialCdf', () => {
  it('sums a small case worked by hand', () => {
    // P(X ≤ 1; 3, 0.5) = (1 + 3)/8
    expect(binomialCdf(1, 3, 0.5)).toBeCloseTo(0.5, 15);
    // P(X ≤ 0; 59, 0.05) = 0.95^59
    expect(binomialCdf(0, 59, 0.05)).toBeCloseTo(0.95 ** 59, 15);
  });

  it('is 1 when k ≥ n or p = 0, and 0 when p = 1 and k < n', () => {
    expect(binomialCdf(5, 5, 0.3)).toBe(1);
    expect(binomialCdf(2, 10, 0)).toBe(1);
    expect(binomialCdf(2, 10, 1)).toBe(0);
  });

  // Source: jStat.binomial.cdf (regularised incomplete beta, rounded to 1e-10), an independent
  // implementation of the same distribution.
  const grid: Array<[number, number, number]> = [];
  for (const n of [1, 5, 29, 59, 93, 236, 500, 1000, 3000]) {
    for (const k of [0, 1, 2, 5, 10]) {
      for (const p of [0.001, 0.02, 0.05, 0.1, 0.2, 0.5]) {
        if (k <= n) grid.push([k, n, p]);
      }
    }
  }
  it(`agrees with jStat over a grid of ${grid.length} (k, n, p)`, () => {
    for (const [k, n, p] of grid) {
      const ours = binomialCdf(k, n, p);
      const theirs = jStat.binomial.cdf(k, n, p);
      if (Math.abs(ours - theirs) > 1e-9) {
        throw new Error(`P(X ≤ ${k}; ${n}, ${p}): ours ${ours}, jStat ${theirs}`);
      }
    }
  });

  it('stays finite where (1 − p)^n underflows a double', () => {
    // 0.5^5000 is about 1e-1505, below the smallest double; the tail sum is still a number
    const value = binomialCdf(2400, 5000, 0.5);
    expect(Number.isFinite(value)).toBe(true);
    expect(value).toBeCloseTo(jStat.binomial.cdf(2400, 5000, 0.5), 9);
    expect(binomialCdf(10, 5000, 0.5)).toBe(0);
  });

  it('refuses a probability outside 0 to 1 or a fractional count', () => {
    expect(() => binomialCdf(1, 10, 1.5)).toThrow(DomainError);
    expect(() => binomialCdf(1, 10, Number.NaN)).toThrow(/p must be a probability/);
    expect(() => binomialCdf(1.5, 10, 0.5)).toThrow(/k must be a whole number/);
  });
});

describe('hypergeometricCdf', () => {
  it('matches a case worked by hand', () => {
    // No deviation among 2 items drawn from 5 with 1 deviation: C(4,2)/C(5,2) = 6/10
    expect(hypergeometricCdf(0, 5, 1, 2)).toBeCloseTo(0.6, 15);
  });

  // Source: jStat.hypgeom.cdf (T. S. Ferguson's scaled-sum algorithm), an independent
  // implementation.
  it('agrees with jStat over a grid of populations, deviations and draws', () => {
    let compared = 0;
    for (const population of [10, 50, 200, 1000, 5000]) {
      for (const marked of [1, 3, Math.ceil(0.05 * population), Math.ceil(0.2 * population)]) {
        for (const drawn of [1, 5, 20, 60, 150]) {
          if (marked > population || drawn > population) continue;
          for (const k of [0, 1, 2, 4]) {
            const ours = hypergeometricCdf(k, population, marked, drawn);
            const theirs = jStat.hypgeom.cdf(k, population, marked, drawn);
            if (Math.abs(ours - theirs) > 1e-9) {
              throw new Error(
                `${k}; N ${population}, D ${marked}, n ${drawn}: ${ours} ≠ ${theirs}`,
              );
            }
            compared++;
          }
        }
      }
    }
    expect(compared).toBeGreaterThan(300);
  });

  it('refuses more marked items or draws than the population holds', () => {
    expect(() => hypergeometricCdf(0, 10, 11, 2)).toThrow(/marked \(11\) cannot exceed/);
    expect(() => hypergeometricCdf(0, 10, 1, 11)).toThrow(/n \(11\) cannot exceed/);
  });
});
