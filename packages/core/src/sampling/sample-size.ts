import { DomainError } from '../errors/domain-error';
import { binomialCdf, hypergeometricCdf } from './distributions';

/** The confidence levels an auditor may choose (issue #8): 90 % or 95 %. */
export const SAMPLING_CONFIDENCES = [0.9, 0.95] as const;
export type SamplingConfidence = (typeof SAMPLING_CONFIDENCES)[number];

/** Above this the plan is no longer a sample: the form should ask for a wider tolerable rate. */
export const MAX_SAMPLE_SIZE = 10_000;

export const SAMPLE_SIZE_METHOD = 'binomial: smallest n with P(X ≤ k; n, p) ≤ 1 − confidence';

// The finite-population adjustment is the exact hypergeometric n (items drawn without
// replacement), with D = ⌈p · N⌉ deviations in the population, the fewest that reach the tolerable
// rate. We do not use the shortcut n′ = n / (1 + n/N) (common practice): it falls short of the
// stated confidence, e.g. N = 100, p = 5 %, k = 0 at 95 % gives n′ = 38, where the hypergeometric
// needs 45 (38 items still miss all 5 deviations with probability 0.086).
export const FINITE_POPULATION_METHOD =
  'hypergeometric: smallest n with P(X ≤ k; N, D = ⌈p · N⌉, n) ≤ 1 − confidence';

export interface SampleSizeInput {
  confidence: number;
  /** Tolerable deviation rate as a fraction, above 0 and at most 0.5 (0.05 = 5 %). */
  tolerableRate: number;
  /** Deviations the auditor expects to find in the sample (a count, 0 or more). */
  expectedDeviations: number;
  /** Items in the population; needed for the finite-population adjustment. */
  population?: number;
  finitePopulationAdjustment?: boolean;
}

export interface SampleSizeResult {
  /** The binomial n, before any population limit or adjustment. */
  sampleSize: number;
  method: string;
  population: number | null;
  /** True when the binomial n is at least the population: every item is examined. */
  examineWholePopulation: boolean;
  /** Present only when asked for: n for drawing without replacement from the population. */
  finitePopulationAdjustment: { method: string; sampleSize: number } | null;
  /** What to draw: the adjusted n when asked for, else n; never more than the population. */
  itemsToDraw: number;
}

export function requireSamplingConfidence(confidence: number): SamplingConfidence {
  if (!SAMPLING_CONFIDENCES.some((allowed) => allowed === confidence)) {
    throw new DomainError(
      'confidence',
      `The confidence level must be 90 % or 95 % (0.9 or 0.95); got ${String(confidence)}.`,
    );
  }
  return confidence as SamplingConfidence;
}

/** 1 − confidence, exactly 0.05 or 0.1 (1 − 0.95 is 0.050000000000000044 in floating point). */
export function samplingRisk(confidence: SamplingConfidence): number {
  return confidence === 0.95 ? 0.05 : 0.1;
}

export function requireTolerableRate(tolerableRate: number): number {
  if (typeof tolerableRate !== 'number' || !(tolerableRate > 0 && tolerableRate <= 0.5)) {
    throw new DomainError(
      'tolerableRate',
      `The tolerable deviation rate must be above 0 % and at most 50 % (a fraction above 0 and ` +
        `at most 0.5); got ${String(tolerableRate)}.`,
    );
  }
  return tolerableRate;
}

function requireCount(argument: string, value: number, minimum: number, what: string): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < minimum) {
    throw new DomainError(
      argument,
      `${what} must be a whole number of at least ${minimum}; got ${String(value)}.`,
    );
  }
  return value;
}

/**
 * The smallest n with P(X ≤ expectedDeviations; n, tolerableRate) ≤ 1 − confidence: a sample
 * that large, showing no more than the expected deviations, lets the auditor say at that
 * confidence that the population's deviation rate is below the tolerable rate.
 */
export function sampleSize(input: SampleSizeInput): SampleSizeResult {
  const confidence = requireSamplingConfidence(input.confidence);
  const p = requireTolerableRate(input.tolerableRate);
  const k = requireCount(
    'expectedDeviations',
    input.expectedDeviations,
    0,
    'The expected number of deviations',
  );
  const population =
    input.population === undefined
      ? null
      : requireCount('population', input.population, 1, 'The population (items to sample from)');
  if (population !== null && k >= population) {
    throw new DomainError(
      'expectedDeviations',
      `The expected number of deviations (${k}) must be smaller than the population ` +
        `(${population} items).`,
    );
  }
  // The fewest deviations in the population that reach the tolerable rate; no sample can tell a
  // population with k of them apart from one at the tolerable rate.
  // (The 1e-9 keeps 0.07 · 100 = 7.000000000000001 at 7.)
  const tolerableCount = population === null ? null : Math.max(1, Math.ceil(p * population - 1e-9));
  if (population !== null && tolerableCount !== null && k >= tolerableCount) {
    throw new DomainError(
      'expectedDeviations',
      `In a population of ${population} items, ${tolerableCount} deviation` +
        `${tolerableCount === 1 ? '' : 's'} already reach the tolerable rate of ` +
        `${formatTolerableRate(p)}, so no sample can support the control when ${k} are expected. Raise ` +
        `the tolerable rate or lower the expected deviations.`,
    );
  }
  if (input.finitePopulationAdjustment && population === null) {
    throw new DomainError(
      'population',
      'The finite-population adjustment needs the number of items in the population.',
    );
  }

  // Exact ties occur (N = 60, D = 3, k = 2, n = 59 gives 1 − 57/60 = 0.05 exactly), and rounding
  // must not push such an n out.
  const risk = samplingRisk(confidence) + 1e-12;
  const limit = MAX_SAMPLE_SIZE.toLocaleString('en-US');
  const tooLarge = (needed: number | null) =>
    new DomainError(
      k > 0 ? 'expectedDeviations' : 'tolerableRate',
      `With ${k} expected deviation${k === 1 ? '' : 's'} and a tolerable rate of ` +
        `${formatTolerableRate(p)}, the sample would need ` +
        (needed === null
          ? `more than ${limit} items`
          : `${needed.toLocaleString('en-US')} items, more than the limit of ${limit}`) +
        `. Raise the tolerable rate or lower the expected deviations.`,
    );
  const n = smallestN(k, (items) => binomialCdf(k, items, p) <= risk);
  if (n === null) throw tooLarge(null);
  const adjustment =
    input.finitePopulationAdjustment && population !== null && tolerableCount !== null
      ? {
          method: FINITE_POPULATION_METHOD,
          sampleSize:
            smallestN(
              k,
              (items) =>
                items >= population ||
                hypergeometricCdf(k, population, tolerableCount, items) <= risk,
            ) ?? population, // never null: at n = N every deviation is seen, and k < D
        }
      : null;
  const wanted = adjustment ? adjustment.sampleSize : n;
  const itemsToDraw = population === null ? wanted : Math.min(wanted, population);
  if (itemsToDraw > MAX_SAMPLE_SIZE) throw tooLarge(itemsToDraw);
  return {
    sampleSize: n,
    method: SAMPLE_SIZE_METHOD,
    population,
    examineWholePopulation: population !== null && n >= population,
    finitePopulationAdjustment: adjustment,
    itemsToDraw,
  };
}

/**
 * The smallest n above `tooSmall` for which `enough(n)` holds, given that once it holds it holds
 * for every larger n (more items can only reveal more deviations): double to bracket, then bisect.
 */
function smallestN(tooSmall: number, enough: (n: number) => boolean): number | null {
  let low = tooSmall;
  let high = tooSmall + 1;
  while (!enough(high)) {
    low = high;
    high *= 2;
    // Only a tolerable rate below about 1e-11 gets here; it keeps the loop finite.
    if (high > 2 ** 40) return null;
  }
  while (high - low > 1) {
    const middle = Math.floor((low + high) / 2);
    if (enough(middle)) high = middle;
    else low = middle;
  }
  return high;
}

/** 0.05 → "5 %", 0.025 → "2.5 %" (up to two decimals, no trailing zeros). */
export function formatTolerableRate(fraction: number): string {
  return `${Number((fraction * 100).toFixed(2))} %`;
}
