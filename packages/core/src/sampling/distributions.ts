import { DomainError } from '../errors/domain-error';
import { requireWholeNumber } from '../errors/require';

// Exact tail sums for attribute sampling. Terms are carried as logarithms and added with the
// log-sum-exp shift, so factors such as (1 − p)ⁿ may underflow a double without losing the sum.

function logSumExp(logTerms: readonly number[]): number {
  const largest = logTerms.reduce((a, b) => Math.max(a, b), -Infinity);
  if (largest === -Infinity) return -Infinity;
  return largest + Math.log(logTerms.reduce((sum, t) => sum + Math.exp(t - largest), 0));
}

/**
 * P(X ≤ k) for X ~ Binomial(n, p), from the recurrence
 * P(i) = P(i − 1) · (n − i + 1)/i · p/(1 − p), P(0) = (1 − p)ⁿ. Cost O(k).
 */
export function binomialCdf(k: number, n: number, p: number): number {
  requireWholeNumber('n', n);
  requireWholeNumber('k', k);
  if (typeof p !== 'number' || !(p >= 0 && p <= 1)) {
    throw new DomainError('p', `p must be a probability from 0 to 1; got ${String(p)}.`);
  }
  if (k >= n || p === 0) return 1;
  if (p === 1) return 0;

  const logRatio = Math.log(p) - Math.log1p(-p);
  const logTerms = [n * Math.log1p(-p)];
  for (let i = 1; i <= k; i++) {
    logTerms.push(logTerms[i - 1] + Math.log(n - i + 1) - Math.log(i) + logRatio);
  }
  return Math.min(1, Math.exp(logSumExp(logTerms)));
}

/** ln C(a, b), as a sum of min(b, a − b) logarithms. */
function logChoose(a: number, b: number): number {
  const m = Math.min(b, a - b);
  let sum = 0;
  for (let i = 1; i <= m; i++) sum += Math.log((a - m + i) / i);
  return sum;
}

/**
 * P(X ≤ k) for X ~ Hypergeometric: n items drawn without replacement from a population of
 * `population` items of which `marked` are deviations. Cost O(k · n).
 */
export function hypergeometricCdf(
  k: number,
  population: number,
  marked: number,
  n: number,
): number {
  requireWholeNumber('k', k);
  requireWholeNumber('population', population);
  requireWholeNumber('marked', marked);
  requireWholeNumber('n', n);
  if (marked > population) {
    throw new DomainError('marked', `marked (${marked}) cannot exceed population (${population}).`);
  }
  if (n > population) {
    throw new DomainError('n', `n (${n}) cannot exceed population (${population}).`);
  }
  const lowest = Math.max(0, n - (population - marked));
  const highest = Math.min(n, marked);
  if (k >= highest) return 1;
  if (k < lowest) return 0;

  const logAll = logChoose(population, n);
  const logTerms: number[] = [];
  for (let x = lowest; x <= k; x++) {
    logTerms.push(logChoose(marked, x) + logChoose(population - marked, n - x) - logAll);
  }
  return Math.min(1, Math.exp(logSumExp(logTerms)));
}
