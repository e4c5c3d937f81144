import { DomainError } from '../errors/domain-error';
import { binomialCdf } from './distributions';
import {
  formatTolerableRate,
  requireSamplingConfidence,
  requireTolerableRate,
  samplingRisk,
} from './sample-size';

export const UPPER_DEVIATION_LIMIT_METHOD =
  'exact binomial (Clopper–Pearson, one-sided): the p with P(X ≤ d; n, p) = 1 − confidence';

export interface UpperDeviationLimitInput {
  /** Items examined. */
  sampleSize: number;
  /** Deviations found among them. */
  deviations: number;
  confidence: number;
}

/**
 * The highest population deviation rate still consistent, at the given confidence, with finding
 * `deviations` in `sampleSize` items: the p where P(X ≤ d; n, p) = 1 − confidence, found by
 * bisection to 1e-9 (the upper end of the last interval, so the limit never comes out low).
 */
export function upperDeviationLimit(input: UpperDeviationLimitInput): number {
  const risk = samplingRisk(requireSamplingConfidence(input.confidence));
  const n = input.sampleSize;
  if (typeof n !== 'number' || !Number.isInteger(n) || n < 1) {
    throw new DomainError(
      'sampleSize',
      `The sample size must be a whole number of at least 1; got ${String(n)}.`,
    );
  }
  const d = input.deviations;
  if (typeof d !== 'number' || !Number.isInteger(d) || d < 0 || d > n) {
    throw new DomainError(
      'deviations',
      `The deviations found must be a whole number from 0 to the sample size (${n}); got ` +
        `${String(d)}.`,
    );
  }
  if (d === n) return 1;

  // P(X ≤ d; n, p) falls from 1 at p = 0 to 0 at p = 1.
  let low = 0;
  let high = 1;
  while (high - low > 1e-10) {
    const middle = (low + high) / 2;
    if (binomialCdf(d, n, middle) > risk) low = middle;
    else high = middle;
  }
  return high;
}

export interface SampleConclusion {
  /** True when the upper deviation limit is at or below the tolerable rate. */
  supportsReliance: boolean;
  /** One plain sentence for the worksheet and the finding. */
  text: string;
}

/**
 * Compares the upper deviation limit with the tolerable rate. The limit is shown rounded up to
 * one decimal, so a limit just over the rate never reads as equal to it.
 */
export function conclusion(input: { upperLimit: number; tolerableRate: number }): SampleConclusion {
  const tolerableRate = requireTolerableRate(input.tolerableRate);
  const { upperLimit } = input;
  if (typeof upperLimit !== 'number' || !(upperLimit >= 0 && upperLimit <= 1)) {
    throw new DomainError(
      'upperLimit',
      `The upper deviation limit must be a fraction from 0 to 1; got ${String(upperLimit)}.`,
    );
  }
  const shown = `${formatUpperLimit(upperLimit)} %`;
  const rate = formatTolerableRate(tolerableRate);
  if (upperLimit <= tolerableRate) {
    return {
      supportsReliance: true,
      text:
        `The upper deviation limit, ${shown}, is ${upperLimit < tolerableRate ? 'below' : 'at'} ` +
        `the tolerable rate of ${rate}: the sample supports relying on the control.`,
    };
  }
  return {
    supportsReliance: false,
    text:
      `The upper deviation limit, ${shown}, is above the tolerable rate of ${rate}: the sample ` +
      'does not support relying on the control.',
  };
}

/** 0.0487 → "4.9", rounded up to one decimal of a percent (0.0800000001 → "8.1"). */
export function formatUpperLimit(upperLimit: number): string {
  // The 1e-6 absorbs floating-point noise such as 0.077 · 1000 = 77.00000000000001.
  return (Math.ceil(upperLimit * 1000 - 1e-6) / 10).toFixed(1);
}

export interface SampleEvaluationInput extends UpperDeviationLimitInput {
  tolerableRate: number;
}

export interface SampleEvaluation extends SampleConclusion {
  upperDeviationLimit: number;
  method: string;
}

/** The worksheet's result: the upper deviation limit and the conclusion in one call. */
export function evaluateSample(input: SampleEvaluationInput): SampleEvaluation {
  requireTolerableRate(input.tolerableRate);
  const upperLimit = upperDeviationLimit(input);
  return {
    upperDeviationLimit: upperLimit,
    method: UPPER_DEVIATION_LIMIT_METHOD,
    ...conclusion({ upperLimit, tolerableRate: input.tolerableRate }),
  };
}
