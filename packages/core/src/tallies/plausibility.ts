import type { HeadlineCount, PlausibilityScore } from '../contract/tallies';
import { DomainError } from '../errors/domain-error';
import { requireFiniteNumber } from '../errors/require';

// Source: Iglewicz and Hoaglin (1993), "How to Detect and Handle Outliers", ASQC Basic
// References in Quality Control vol. 16; NIST/SEMATECH e-Handbook of Statistical Methods
// §1.3.5.17 "Detection of Outliers": M = 0.6745·(x − median)/MAD, potential outlier when |M| > 3.5.
export const MODIFIED_Z_THRESHOLD = 3.5;
/** 0.6745 is the 0.75 quantile of the standard normal, making MAD comparable to σ. */
export const MODIFIED_Z_FACTOR = 0.6745;
/**
 * When MAD is 0 (more than half the figures equal the median) the score uses the mean absolute
 * deviation around the median instead: M = (x − median)/(1.253314·MeanAD). 1.253314 ≈ √(π/2)
 * makes MeanAD comparable to σ for normal data. // from memory: the fallback IBM documents for
 * its modified z-score.
 */
export const MEAN_AD_FACTOR = 1.253314;
/** Fewer approved months than this say too little about a chapter's usual month. */
export const MIN_HISTORY_MONTHS = 6;
/** The history window: the chapter's last (up to) 12 approved months. */
export const MAX_HISTORY_MONTHS = 12;
/**
 * When every past month had the same figure there is no spread to score against; a month is then
 * flagged when it differs from that figure by more than this many units or this share of it,
 * whichever is larger.
 */
export const CONSTANT_HISTORY_SLACK = { units: 2, share: 0.5 } as const;

function requireFigures(argument: string, values: readonly number[]): readonly number[] {
  // Checked through an unknown: Array.isArray would widen a readonly number[] to any[].
  const given: unknown = values;
  if (!Array.isArray(given)) {
    throw new DomainError(argument, `${argument} must be a list of numbers.`);
  }
  values.forEach((value, index) => requireFiniteNumber(`${argument}[${index}]`, value));
  return values;
}

/** The middle value (the mean of the two middle ones for an even count). */
export function medianOf(values: readonly number[]): number {
  requireFigures('values', values);
  if (values.length === 0) throw new DomainError('values', 'values must not be empty.');
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

/** Median absolute deviation around the median (unscaled). */
export function medianAbsoluteDeviationOf(values: readonly number[]): number {
  const median = medianOf(values);
  return medianOf(values.map((value) => Math.abs(value - median)));
}

/** Mean absolute deviation around the median. */
export function meanAbsoluteDeviationOf(values: readonly number[]): number {
  const median = medianOf(values);
  return values.reduce((total, value) => total + Math.abs(value - median), 0) / values.length;
}

/**
 * Modified z-score of every figure against the whole set. When MAD is 0 the mean absolute
 * deviation stands in (see MEAN_AD_FACTOR); when that is 0 too every figure equals the median
 * and scores 0.
 */
export function modifiedZScores(values: readonly number[]): number[] {
  requireFigures('values', values);
  if (values.length === 0) return [];
  const median = medianOf(values);
  const mad = medianAbsoluteDeviationOf(values);
  if (mad > 0) return values.map((x) => (MODIFIED_Z_FACTOR * (x - median)) / mad);
  const meanAd = meanAbsoluteDeviationOf(values);
  if (meanAd > 0) return values.map((x) => (x - median) / (MEAN_AD_FACTOR * meanAd));
  return values.map(() => 0);
}

/**
 * Scores this month's figure against the chapter's own approved history (this month excluded),
 * oldest first; only the last MAX_HISTORY_MONTHS are used.
 */
export function scoreAgainstHistory(
  count: HeadlineCount,
  value: number,
  history: readonly number[],
): PlausibilityScore {
  requireFiniteNumber('value', value);
  requireFigures('history', history);
  const window = history.slice(-MAX_HISTORY_MONTHS);
  if (window.length < MIN_HISTORY_MONTHS) {
    return {
      count,
      value,
      median: null,
      mad: null,
      score: null,
      flagged: false,
      method: 'too-little-history',
    };
  }
  const median = medianOf(window);
  const mad = medianAbsoluteDeviationOf(window);
  if (mad > 0) {
    const score = (MODIFIED_Z_FACTOR * (value - median)) / mad;
    return { count, value, median, mad, score, flagged: isBeyond(score), method: 'mad' };
  }
  const meanAd = meanAbsoluteDeviationOf(window);
  if (meanAd > 0) {
    const score = (value - median) / (MEAN_AD_FACTOR * meanAd);
    return {
      count,
      value,
      median,
      mad,
      score,
      flagged: isBeyond(score),
      method: 'meanAbsoluteDeviation',
    };
  }
  const slack = constantHistorySlack(median);
  return {
    count,
    value,
    median,
    mad,
    score: null,
    flagged: Math.abs(value - median) > slack,
    method: 'constant',
  };
}

/** How far a figure may stray from a history where every month was `figure`. */
export function constantHistorySlack(figure: number): number {
  return Math.max(CONSTANT_HISTORY_SLACK.units, CONSTANT_HISTORY_SLACK.share * Math.abs(figure));
}

function isBeyond(score: number): boolean {
  return Math.abs(score) > MODIFIED_Z_THRESHOLD;
}
