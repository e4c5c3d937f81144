import { median, medianAbsoluteDeviation } from 'simple-statistics';
import { DomainError } from '../errors/domain-error';
import {
  MODIFIED_Z_THRESHOLD,
  constantHistorySlack,
  meanAbsoluteDeviationOf,
  medianAbsoluteDeviationOf,
  medianOf,
  modifiedZScores,
  scoreAgainstHistory,
} from './plausibility';

// Source: Iglewicz and Hoaglin (1993), "How to Detect and Handle Outliers", ASQC Basic
// References in Quality Control vol. 16; NIST/SEMATECH e-Handbook of Statistical Methods
// §1.3.5.17 "Detection of Outliers": M_i = 0.6745·(x_i − x̃)/MAD, outlier when |M_i| > 3.5.
const VECTOR = [12, 14, 13, 15, 14, 13, 60];

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

describe('the modified z-score threshold', () => {
  it('is 3.5', () => {
    // Source: Iglewicz and Hoaglin (1993); NIST/SEMATECH e-Handbook §1.3.5.17
    expect(MODIFIED_Z_THRESHOLD).toBe(3.5);
  });
});

describe('modifiedZScores', () => {
  it('flags only 60 in the test vector, at M ≈ 31.03', () => {
    // median 14, absolute deviations [2,0,1,1,0,1,46] → MAD 1; M(60) = 0.6745·46/1 = 31.027
    const scores = modifiedZScores(VECTOR);
    expect(scores[6]).toBeCloseTo(31.027, 3);
    expect(scores[0]).toBeCloseTo(-1.349, 3);
    expect(scores[1]).toBe(0);
    const flagged = VECTOR.filter((_, i) => Math.abs(scores[i]) > MODIFIED_Z_THRESHOLD);
    expect(flagged).toEqual([60]);
  });

  it('agrees with simple-statistics on the median and MAD of the test vector', () => {
    expect(medianOf(VECTOR)).toBe(median(VECTOR));
    expect(medianAbsoluteDeviationOf(VECTOR)).toBe(medianAbsoluteDeviation(VECTOR));
    expect(medianOf(VECTOR)).toBe(14);
    expect(medianAbsoluteDeviationOf(VECTOR)).toBe(1);
  });

  it('agrees with simple-statistics on 400 seeded random sets', () => {
    const random = seeded(20261202);
    let scored = 0;
    for (let run = 0; run < 400; run += 1) {
      const size = 1 + Math.floor(random() * 40);
      // Every fourth set uses a few repeated small whole numbers, where MAD is often 0.
      const spread = run % 4 === 0 ? 3 : 500;
      const values = Array.from({ length: size }, () =>
        run % 3 === 0 ? random() * spread : Math.floor(random() * spread),
      );
      const ssMedian = median(values);
      const ssMad = medianAbsoluteDeviation(values);
      expect(medianOf(values)).toBeCloseTo(ssMedian, 9);
      expect(medianAbsoluteDeviationOf(values)).toBeCloseTo(ssMad, 9);
      if (ssMad > 0) {
        scored += 1;
        const scores = modifiedZScores(values);
        values.forEach((x, i) =>
          expect(scores[i]).toBeCloseTo((0.6745 * (x - ssMedian)) / ssMad, 9),
        );
      }
    }
    expect(scored).toBeGreaterThan(250);
  });

  it('falls back to the mean absolute deviation when MAD is 0', () => {
    // median 10, deviations [0,0,0,0,2,4,0] → MAD 0; MeanAD = 6/7; M(14) = 4/(1.253314·6/7) = 3.7235
    const scores = modifiedZScores([10, 10, 10, 10, 12, 14, 10]);
    expect(scores[5]).toBeCloseTo(4 / (1.253314 * (6 / 7)), 9);
    expect(scores[5]).toBeCloseTo(3.7235, 4);
    expect(scores[0]).toBe(0);
  });

  it('scores every figure 0 when all are the same, and an empty set as empty', () => {
    expect(modifiedZScores([7, 7, 7])).toEqual([0, 0, 0]);
    expect(modifiedZScores([])).toEqual([]);
  });

  it('refuses figures that are not finite numbers', () => {
    expect(() => modifiedZScores([1, Number.NaN])).toThrow(DomainError);
    expect(() => modifiedZScores([1, Number.NaN])).toThrow('values[1] must be a finite number');
  });
});

describe('meanAbsoluteDeviationOf', () => {
  it('averages the distances from the median', () => {
    // median 3; |x − 3| = [2,1,0,1,6] → mean 2
    expect(meanAbsoluteDeviationOf([1, 2, 3, 4, 9])).toBe(2);
  });
});

describe('scoreAgainstHistory', () => {
  const GIVEN = [36, 38, 40, 40, 41, 44, 39, 42, 40, 35, 45, 40];

  it('scores against the median and MAD of the history', () => {
    // sorted [35,36,38,39,40,40,40,40,41,42,44,45] → median 40; |x − 40| sorted
    // [0,0,0,0,1,1,2,2,4,4,5,5] → MAD 1.5; M(212) = 0.6745·172/1.5 = 77.3427
    const score = scoreAgainstHistory('blanketsGiven', 212, GIVEN);
    expect(score).toMatchObject({
      count: 'blanketsGiven',
      value: 212,
      median: 40,
      mad: 1.5,
      flagged: true,
      method: 'mad',
    });
    expect(score.score).toBeCloseTo(77.3427, 4);
  });

  it('flags a month far below the usual too, and not one inside the band', () => {
    // M(30) = 0.6745·(−10)/1.5 = −4.4967; M(33) = 0.6745·(−7)/1.5 = −3.1477
    const low = scoreAgainstHistory('blanketsGiven', 30, GIVEN);
    expect(low.score).toBeCloseTo(-4.4967, 4);
    expect(low.flagged).toBe(true);
    const near = scoreAgainstHistory('blanketsGiven', 33, GIVEN);
    expect(near.score).toBeCloseTo(-3.1477, 4);
    expect(near.flagged).toBe(false);
  });

  it('needs at least 6 months of history', () => {
    const five = scoreAgainstHistory('panelsAccepted', 9999, [100, 110, 90, 105, 95]);
    expect(five).toEqual({
      count: 'panelsAccepted',
      value: 9999,
      median: null,
      mad: null,
      score: null,
      flagged: false,
      method: 'too-little-history',
    });
    const six = scoreAgainstHistory('panelsAccepted', 9999, [100, 110, 90, 105, 95, 100]);
    expect(six.method).toBe('mad');
    expect(six.flagged).toBe(true);
  });

  it('uses only the last 12 months', () => {
    // The two oldest months would move the median to 1,000 if they were counted.
    const history = [1000, 1000, ...GIVEN.map((x) => x)];
    const withOld = scoreAgainstHistory('blanketsGiven', 212, history);
    expect(withOld.median).toBe(40);
    expect(withOld.score).toBeCloseTo(77.3427, 4);
  });

  it('uses the mean absolute deviation when MAD is 0', () => {
    // history [10×5, 12, 14]: median 10, MAD 0, MeanAD 6/7;
    // M(20) = 10/(1.253314·6/7) = 9.3087 → flagged; M(13) = 3/(1.253314·6/7) = 2.7926 → not
    const history = [10, 10, 10, 10, 10, 12, 14];
    const far = scoreAgainstHistory('volunteerHours', 20, history);
    expect(far.method).toBe('meanAbsoluteDeviation');
    expect(far.mad).toBe(0);
    expect(far.score).toBeCloseTo(9.3087, 4);
    expect(far.flagged).toBe(true);
    const close = scoreAgainstHistory('volunteerHours', 13, history);
    expect(close.score).toBeCloseTo(2.7926, 4);
    expect(close.flagged).toBe(false);
  });

  it('with a constant history, flags a change of more than max(2, 50 %)', () => {
    const fives = [5, 5, 5, 5, 5, 5, 5, 5];
    // slack max(2, 2.5) = 2.5
    expect(scoreAgainstHistory('blanketsAssembled', 8, fives)).toMatchObject({
      method: 'constant',
      score: null,
      median: 5,
      mad: 0,
      flagged: true,
    });
    expect(scoreAgainstHistory('blanketsAssembled', 7, fives).flagged).toBe(false);
    expect(scoreAgainstHistory('blanketsAssembled', 2, fives).flagged).toBe(true);
    expect(scoreAgainstHistory('blanketsAssembled', 5, fives).flagged).toBe(false);
    // slack max(2, 20) = 20
    const forties = Array(12).fill(40) as number[];
    expect(scoreAgainstHistory('blanketsGiven', 60, forties).flagged).toBe(false);
    expect(scoreAgainstHistory('blanketsGiven', 61, forties).flagged).toBe(true);
    expect(scoreAgainstHistory('blanketsGiven', 19, forties).flagged).toBe(true);
    // a chapter that never gave out blankets: slack 2
    const zeros = Array(6).fill(0) as number[];
    expect(scoreAgainstHistory('blanketsGiven', 2, zeros).flagged).toBe(false);
    expect(scoreAgainstHistory('blanketsGiven', 3, zeros).flagged).toBe(true);
    expect(constantHistorySlack(40)).toBe(20);
    expect(constantHistorySlack(1)).toBe(2);
  });

  it('refuses a value that is not a number', () => {
    expect(() => scoreAgainstHistory('peopleServed', Number.NaN, GIVEN)).toThrow(
      'value must be a finite number',
    );
  });
});
