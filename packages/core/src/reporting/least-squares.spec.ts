import { linearRegression } from 'simple-statistics';
import { leastSquaresLine } from './least-squares';

/** A small deterministic generator (mulberry32), so the cross-check runs the same every time. */
function seeded(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('leastSquaresLine', () => {
  it('fits a worked example by hand', () => {
    // x̄ = 3, ȳ = 724; Σ(x−x̄)(y−ȳ) = 2740, Σ(x−x̄)² = 10 → slope 274, intercept 724 − 822 = −98
    const line = leastSquaresLine([
      [1, 200],
      [2, 440],
      [3, 700],
      [4, 980],
      [5, 1300],
    ]);
    expect(line.slope).toBeCloseTo(274, 9);
    expect(line.intercept).toBeCloseTo(-98, 9);
  });

  it('goes exactly through points on a line', () => {
    const line = leastSquaresLine([
      [2, 7],
      [4, 11],
    ]);
    expect(line).toEqual({ slope: 2, intercept: 3 });
  });

  it.each([1, 7, 42, 2026, 99991])(
    'agrees with simple-statistics on a random series (seed %i)',
    (seed) => {
      // Source: simple-statistics linearRegression (ordinary least squares), an independent
      // implementation of the same formula.
      const random = seeded(seed);
      const length = 2 + Math.floor(random() * 10);
      let cumulative = random() * 500;
      const points: Array<[number, number]> = [];
      for (let i = 0; i < length; i++) {
        cumulative += Math.floor(random() * 400);
        points.push([(i + 1) * (0.5 + random()), cumulative]);
      }
      const ours = leastSquaresLine(points);
      const theirs = linearRegression(points);
      expect(ours.slope).toBeCloseTo(theirs.m, 6);
      expect(ours.intercept).toBeCloseTo(theirs.b, 6);
    },
  );

  it('refuses fewer than 2 points or a single x value', () => {
    expect(() => leastSquaresLine([[1, 2]])).toThrow(/at least 2 points; got 1/);
    expect(() =>
      leastSquaresLine([
        [3, 1],
        [3, 5],
      ]),
    ).toThrow(/two or more different x values/);
    expect(() =>
      leastSquaresLine([
        [1, 1],
        [2, Number.NaN],
      ]),
    ).toThrow(/points\[1\]\.y must be a finite number/);
  });
});
