import { jStat } from 'jstat';
import { DomainError } from '../errors/domain-error';
import { binomialCdf, hypergeometricCdf } from './distributions';
import { MAX_SAMPLE_SIZE, SAMPLE_SIZE_METHOD, sampleSize } from './sample-size';

const RATES = [0.02, 0.03, 0.04, 0.05, 0.06, 0.07, 0.08, 0.09, 0.1, 0.15, 0.2];

function sizes(confidence: number, expectedDeviations: number): number[] {
  return RATES.map(
    (tolerableRate) => sampleSize({ confidence, tolerableRate, expectedDeviations }).sampleSize,
  );
}

function caught(action: () => unknown): DomainError {
  try {
    action();
  } catch (error) {
    if (error instanceof DomainError) return error;
    throw error;
  }
  throw new Error('expected a DomainError');
}

describe('sampleSize: published tables', () => {
  it('matches Table A-1 (95 % confidence) with zero expected deviations', () => {
    // Source: AICPA Audit Sampling guide (2017), Appendix A, Table A-1 (5 % risk): tolerable
    // rates 2, 3, 4, 5, 6, 7, 8, 9, 10, 15, 20 % with zero expected deviations → 149, 99, 74, 59,
    // 49, 42, 36, 32, 29, 19, 14
    expect(sizes(0.95, 0)).toEqual([149, 99, 74, 59, 49, 42, 36, 32, 29, 19, 14]);
  });

  it('matches Table A-1 (95 % confidence) with one expected deviation', () => {
    // Source: AICPA Audit Sampling guide (2017), Appendix A, Table A-1 (5 % risk): with one →
    // 236, 157, 117, 93, 78, 66, 58, 51, 46, 30, 22
    expect(sizes(0.95, 1)).toEqual([236, 157, 117, 93, 78, 66, 58, 51, 46, 30, 22]);
  });

  it('matches Table A-2 (90 % confidence) with zero expected deviations', () => {
    // Source: AICPA Audit Sampling guide (2017), Appendix A, Table A-2 (10 % risk), zero → 114,
    // 76, 57, 45, 38, 32, 28, 25, 22, 15, 11
    expect(sizes(0.9, 0)).toEqual([114, 76, 57, 45, 38, 32, 28, 25, 22, 15, 11]);
  });

  it('uses the binomial, not the Poisson shortcut (95 %, 5 %, no deviations)', () => {
    // The Poisson shortcut solves e^(−n·p) ≤ 1 − confidence: n = ceil(−ln(0.05)/0.05) = 60.
    const poisson = Math.ceil(-Math.log(0.05) / 0.05);
    expect(poisson).toBe(60);
    const result = sampleSize({ confidence: 0.95, tolerableRate: 0.05, expectedDeviations: 0 });
    expect(result.sampleSize).toBe(59);
    expect(result.method).toBe(SAMPLE_SIZE_METHOD);
    expect(result.method).toMatch(/^binomial: smallest n/);
    // 59 is enough and 58 is not, by the binomial itself
    expect(binomialCdf(0, 59, 0.05)).toBeLessThanOrEqual(0.05);
    expect(binomialCdf(0, 58, 0.05)).toBeGreaterThan(0.05);
  });
});

describe('sampleSize: cross-check with jStat', () => {
  // Source: jStat.binomial.cdf, an independent binomial CDF; for each plan the smallest n is
  // found by counting up with jStat alone.
  it('finds the same smallest n as a search on jStat over a grid of plans', () => {
    let compared = 0;
    for (const confidence of [0.9, 0.95]) {
      const risk = confidence === 0.95 ? 0.05 : 0.1;
      for (const tolerableRate of [0.01, 0.025, 0.05, 0.075, 0.1, 0.125, 0.2, 0.3, 0.5]) {
        for (const expectedDeviations of [0, 1, 2, 3, 5, 8]) {
          let n = expectedDeviations + 1;
          while (jStat.binomial.cdf(expectedDeviations, n, tolerableRate) > risk) n++;
          const ours = sampleSize({ confidence, tolerableRate, expectedDeviations }).sampleSize;
          if (ours !== n) {
            throw new Error(`${confidence}/${tolerableRate}/${expectedDeviations}: ${ours} ≠ ${n}`);
          }
          compared++;
        }
      }
    }
    expect(compared).toBe(108);
  });
});

describe('sampleSize: population', () => {
  it('has the whole population examined when n is at least N', () => {
    const result = sampleSize({
      confidence: 0.95,
      tolerableRate: 0.1,
      expectedDeviations: 0,
      population: 25,
    });
    expect(result.sampleSize).toBe(29);
    expect(result.examineWholePopulation).toBe(true);
    expect(result.itemsToDraw).toBe(25);
    expect(result.finitePopulationAdjustment).toBeNull();
  });

  it('draws the binomial n from a larger population unless the adjustment is asked for', () => {
    const result = sampleSize({
      confidence: 0.95,
      tolerableRate: 0.05,
      expectedDeviations: 0,
      population: 1200,
    });
    expect(result).toMatchObject({ sampleSize: 59, population: 1200, itemsToDraw: 59 });
    expect(result.examineWholePopulation).toBe(false);
  });

  it('shows the hypergeometric adjustment as a separate, named figure', () => {
    const result = sampleSize({
      confidence: 0.95,
      tolerableRate: 0.05,
      expectedDeviations: 0,
      population: 100,
      finitePopulationAdjustment: true,
    });
    expect(result.sampleSize).toBe(59);
    expect(result.finitePopulationAdjustment?.method).toMatch(/^hypergeometric: /);
    // By hand: 5 deviations among 100; P(none in n) = C(95, n)/C(100, n); n = 45 is the first at
    // or below 0.05 (≈ 0.0452; n = 44 gives ≈ 0.0503).
    expect(result.finitePopulationAdjustment?.sampleSize).toBe(45);
    expect(result.itemsToDraw).toBe(45);
    // The shortcut n/(1 + n/N) would give 38, which misses all 5 deviations with probability
    // ≈ 0.086, more than the 0.05 that 95 % confidence allows:
    expect(Math.ceil(59 / (1 + 59 / 100))).toBe(38);
    expect(hypergeometricCdf(0, 100, 5, 38)).toBeGreaterThan(0.08);
  });

  it('meets an exact tie: P(X ≤ 2; N 60, D 3, n 59) = 1 − 57/60 = 0.05', () => {
    const result = sampleSize({
      confidence: 0.95,
      tolerableRate: 0.05,
      expectedDeviations: 2,
      population: 60,
      finitePopulationAdjustment: true,
    });
    expect(result.finitePopulationAdjustment?.sampleSize).toBe(59);
  });

  it('agrees with a search on jStat for the adjustment', () => {
    // Source: jStat.hypgeom.cdf, an independent hypergeometric CDF.
    for (const population of [60, 150, 400, 2000]) {
      for (const tolerableRate of [0.05, 0.1]) {
        for (const expectedDeviations of [0, 1, 2]) {
          const marked = Math.ceil(tolerableRate * population - 1e-9);
          let n = expectedDeviations + 1;
          // 1e-12: ties are exact here (N 60, D 3, k 2, n 59 gives 0.05), jStat returns 0.05 + 4e-17
          while (jStat.hypgeom.cdf(expectedDeviations, population, marked, n) > 0.05 + 1e-12) n++;
          const result = sampleSize({
            confidence: 0.95,
            tolerableRate,
            expectedDeviations,
            population,
            finitePopulationAdjustment: true,
          });
          expect(result.finitePopulationAdjustment?.sampleSize).toBe(n);
          // without replacement never needs more items than with replacement
          expect(n).toBeLessThanOrEqual(result.sampleSize);
        }
      }
    }
  });
});

describe('sampleSize: bad input', () => {
  const plan = { confidence: 0.95, tolerableRate: 0.05, expectedDeviations: 0 };

  it.each([0.5, 0.8, 0.99, 1, 95, Number.NaN])('refuses a confidence of %p', (confidence) => {
    const error = caught(() => sampleSize({ ...plan, confidence }));
    expect(error.argument).toBe('confidence');
    expect(error.message).toMatch(/must be 90 % or 95 %/);
  });

  it.each([0, -0.05, 0.51, 1, 5, Number.NaN])('refuses a tolerable rate of %p', (tolerableRate) => {
    const error = caught(() => sampleSize({ ...plan, tolerableRate }));
    expect(error.argument).toBe('tolerableRate');
    expect(error.message).toMatch(/above 0 % and at most 50 %/);
  });

  it.each([-1, 0.5, 1.5, Number.NaN])('refuses %p expected deviations', (expectedDeviations) => {
    const error = caught(() => sampleSize({ ...plan, expectedDeviations }));
    expect(error.argument).toBe('expectedDeviations');
    expect(error.message).toMatch(/whole number of at least 0/);
  });

  it('refuses expected deviations as many as the population', () => {
    const error = caught(() => sampleSize({ ...plan, expectedDeviations: 8, population: 8 }));
    expect(error.argument).toBe('expectedDeviations');
    expect(error.message).toBe(
      'The expected number of deviations (8) must be smaller than the population (8 items).',
    );
  });

  it('refuses expected deviations that already reach the tolerable rate of the population', () => {
    // 5 % of 40 items is 2 deviations: expecting 2 leaves nothing a sample could show
    const error = caught(() => sampleSize({ ...plan, expectedDeviations: 2, population: 40 }));
    expect(error.argument).toBe('expectedDeviations');
    expect(error.message).toMatch(/2 deviations already reach the tolerable rate of 5 %/);
  });

  it('refuses an empty population', () => {
    const error = caught(() => sampleSize({ ...plan, population: 0 }));
    expect(error.argument).toBe('population');
  });

  it('refuses the adjustment without a population', () => {
    const error = caught(() => sampleSize({ ...plan, finitePopulationAdjustment: true }));
    expect(error.argument).toBe('population');
  });

  it('refuses a plan that needs more than the largest sample', () => {
    // 0.05 % tolerable with 3 expected deviations needs about 15 500 items
    const error = caught(() =>
      sampleSize({ ...plan, tolerableRate: 0.0005, expectedDeviations: 3 }),
    );
    expect(error.argument).toBe('expectedDeviations');
    expect(error.message).toMatch(/more than the limit of 10,000/);
    expect(MAX_SAMPLE_SIZE).toBe(10_000);
    const noDeviations = caught(() => sampleSize({ ...plan, tolerableRate: 1e-15 }));
    expect(noDeviations.argument).toBe('tolerableRate');
    expect(noDeviations.message).toMatch(/more than 10,000 items/);
  });
});
