import { jStat } from 'jstat';
import { DomainError } from '../errors/domain-error';
import { binomialCdf } from './distributions';
import {
  UPPER_DEVIATION_LIMIT_METHOD,
  conclusion,
  evaluateSample,
  formatUpperLimit,
  upperDeviationLimit,
} from './upper-deviation-limit';

function caught(action: () => unknown): DomainError {
  try {
    action();
  } catch (error) {
    if (error instanceof DomainError) return error;
    throw error;
  }
  throw new Error('expected a DomainError');
}

describe('upperDeviationLimit', () => {
  it('matches Table A-3 for 60 items at 95 % confidence', () => {
    // Source: AICPA Audit Sampling guide (2017), Appendix A, Table A-3: n = 60 with 0, 1, 2
    // deviations → 4.9 %, 7.7 %, 10.2 % at 95 %
    const limits = [0, 1, 2].map((deviations) =>
      upperDeviationLimit({ sampleSize: 60, deviations, confidence: 0.95 }),
    );
    // The table rounds up: 2 deviations give 10.12 %, printed as 10.2.
    expect(limits.map(formatUpperLimit)).toEqual(['4.9', '7.7', '10.2']);
    expect(limits[2]).toBeCloseTo(0.10124, 5);
  });

  it('solves P(X ≤ d; n, p) = 1 − confidence to 1e-9', () => {
    const limit = upperDeviationLimit({ sampleSize: 60, deviations: 1, confidence: 0.95 });
    expect(Math.abs(binomialCdf(1, 60, limit) - 0.05)).toBeLessThan(1e-9);
    expect(binomialCdf(1, 60, limit)).toBeLessThanOrEqual(0.05);
    // with no deviations the limit has a closed form: 1 − (1 − confidence)^(1/n)
    const none = upperDeviationLimit({ sampleSize: 60, deviations: 0, confidence: 0.95 });
    expect(none).toBeCloseTo(1 - 0.05 ** (1 / 60), 9);
  });

  // Source: jStat.beta.inv(confidence, d + 1, n − d), the Clopper–Pearson one-sided upper bound
  // computed through the inverse beta distribution, an independent route to the same value.
  it('agrees with jStat’s inverse beta over a grid', () => {
    let compared = 0;
    for (const confidence of [0.9, 0.95]) {
      for (const sampleSize of [1, 10, 25, 60, 100, 200, 500, 1500]) {
        for (const deviations of [0, 1, 2, 3, 5, 10]) {
          if (deviations >= sampleSize) continue;
          const ours = upperDeviationLimit({ sampleSize, deviations, confidence });
          const theirs = jStat.beta.inv(confidence, deviations + 1, sampleSize - deviations);
          if (Math.abs(ours - theirs) > 1e-8) {
            throw new Error(`${confidence}, n ${sampleSize}, d ${deviations}: ${ours} ≠ ${theirs}`);
          }
          compared++;
        }
      }
    }
    expect(compared).toBe(84);
  });

  it('is 1 when every item is a deviation', () => {
    expect(upperDeviationLimit({ sampleSize: 4, deviations: 4, confidence: 0.9 })).toBe(1);
  });

  it.each([
    [{ sampleSize: 0, deviations: 0, confidence: 0.95 }, 'sampleSize'],
    [{ sampleSize: 12.5, deviations: 0, confidence: 0.95 }, 'sampleSize'],
    [{ sampleSize: 60, deviations: -1, confidence: 0.95 }, 'deviations'],
    [{ sampleSize: 60, deviations: 1.5, confidence: 0.95 }, 'deviations'],
    [{ sampleSize: 60, deviations: 61, confidence: 0.95 }, 'deviations'],
    [{ sampleSize: 60, deviations: 1, confidence: 0.99 }, 'confidence'],
  ])('refuses %j, naming %s', (input, argument) => {
    expect(caught(() => upperDeviationLimit(input)).argument).toBe(argument);
  });
});

describe('conclusion', () => {
  it('supports reliance when the limit is below the tolerable rate', () => {
    const upperLimit = upperDeviationLimit({ sampleSize: 60, deviations: 1, confidence: 0.95 });
    expect(conclusion({ upperLimit, tolerableRate: 0.1 })).toEqual({
      supportsReliance: true,
      text:
        'The upper deviation limit, 7.7 %, is below the tolerable rate of 10 %: the sample ' +
        'supports relying on the control.',
    });
  });

  it('does not when the limit is above it', () => {
    const upperLimit = upperDeviationLimit({ sampleSize: 60, deviations: 2, confidence: 0.95 });
    expect(conclusion({ upperLimit, tolerableRate: 0.1 })).toEqual({
      supportsReliance: false,
      text:
        'The upper deviation limit, 10.2 %, is above the tolerable rate of 10 %: the sample ' +
        'does not support relying on the control.',
    });
  });

  it('rounds the shown limit up, so a limit just over the rate never reads as equal', () => {
    const { text, supportsReliance } = conclusion({ upperLimit: 0.0500001, tolerableRate: 0.05 });
    expect(supportsReliance).toBe(false);
    expect(text).toMatch(/^The upper deviation limit, 5\.1 %, is above the tolerable rate of 5 %/);
    expect(conclusion({ upperLimit: 0.05, tolerableRate: 0.05 }).text).toMatch(
      /5\.0 %, is at the tolerable rate of 5 %: the sample supports/,
    );
  });

  it('refuses a tolerable rate or limit out of range', () => {
    expect(caught(() => conclusion({ upperLimit: 0.05, tolerableRate: 0 })).argument).toBe(
      'tolerableRate',
    );
    expect(caught(() => conclusion({ upperLimit: 1.2, tolerableRate: 0.05 })).argument).toBe(
      'upperLimit',
    );
  });
});

describe('evaluateSample', () => {
  it('gives the worksheet result in one call', () => {
    const result = evaluateSample({
      sampleSize: 60,
      deviations: 0,
      confidence: 0.95,
      tolerableRate: 0.05,
    });
    expect(result.method).toBe(UPPER_DEVIATION_LIMIT_METHOD);
    expect(result.upperDeviationLimit).toBeCloseTo(0.0487, 4);
    expect(result.supportsReliance).toBe(true);
    expect(result.text).toMatch(/^The upper deviation limit, 4\.9 %, is below/);
  });
});
