import { DomainError } from '../errors/domain-error';
import { requireFiniteNumber } from '../errors/require';

export interface Line {
  slope: number;
  intercept: number;
}

/**
 * The ordinary least-squares line y = slope·x + intercept through the points.
 * Source: NIST/SEMATECH e-Handbook of Statistical Methods §4.1.4.1 "Linear Least Squares
 * Regression": slope = Σ(x − x̄)(y − ȳ) / Σ(x − x̄)², intercept = ȳ − slope·x̄.
 */
export function leastSquaresLine(points: ReadonlyArray<readonly [number, number]>): Line {
  if (points.length < 2) {
    throw new DomainError('points', `A line needs at least 2 points; got ${points.length}.`);
  }
  points.forEach(([x, y], i) => {
    requireFiniteNumber(`points[${i}].x`, x);
    requireFiniteNumber(`points[${i}].y`, y);
  });
  const meanX = points.reduce((sum, [x]) => sum + x, 0) / points.length;
  const meanY = points.reduce((sum, [, y]) => sum + y, 0) / points.length;
  let sxy = 0;
  let sxx = 0;
  for (const [x, y] of points) {
    sxy += (x - meanX) * (y - meanY);
    sxx += (x - meanX) ** 2;
  }
  if (sxx === 0) {
    throw new DomainError('points', 'A line needs points at two or more different x values.');
  }
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX };
}
