import { linearRegressionLine, linearRegression } from 'simple-statistics';
import { campaignProgress, PROJECTION_WEEKS, type CampaignPaceInput } from './campaign-pace';
import { addDays } from './days';

// A 12-week drive: Monday 5 Jan 2026 to Sunday 29 Mar 2026 (84 days).
const STARTS_ON = '2026-01-05';
const ENDS_ON = '2026-03-29';

function weeksOf(panels: number[], startsOn = STARTS_ON) {
  return panels.map((p, i) => ({ weekStart: addDays(startsOn, i * 7), panels: p }));
}

function input(overrides: Partial<CampaignPaceInput>): CampaignPaceInput {
  const weekly = overrides.weekly ?? [];
  return {
    goalPanels: 4000,
    startsOn: STARTS_ON,
    endsOn: ENDS_ON,
    today: '2026-02-09',
    weekly,
    creditedPanels: weekly.reduce((sum, w) => sum + w.panels, 0),
    pendingPanels: 0,
    asOf: '2026-02-09T06:00:00.000Z',
    ...overrides,
  };
}

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

describe('campaignProgress: the worked example of issue #6', () => {
  // Goal 4,000 panels; 1,300 credited after 5 of 12 weeks.
  // Pace so far: 1,300 ÷ 5 = 260 per week. Still needed: (4,000 − 1,300) ÷ 7 = 2,700 ÷ 7 = 385.71…
  const progress = campaignProgress(
    input({ weekly: weeksOf([200, 240, 260, 280, 320]), pendingPanels: 90 }),
  );

  it('counts weeks as 7-day blocks from the start', () => {
    expect(progress.weeksTotal).toBe(12);
    expect(progress.weeksElapsed).toBe(5);
    expect(progress.weeksLeft).toBe(7);
  });

  it('gives 260 per week so far and 385.7 per week still needed', () => {
    expect(progress.creditedPanels).toBe(1300);
    expect(progress.pacePerWeek).toBe(260);
    expect(progress.neededPerWeek).toBeCloseTo(385.714, 3);
    expect(progress.shareDone).toBeCloseTo(0.325, 10);
    expect(progress.pendingPanels).toBe(90);
  });

  it('projects with a least-squares line over the complete weeks', () => {
    // Cumulative 200, 440, 700, 980, 1300 at weeks 1–5 → slope 274, intercept −98 (by hand);
    // at week 12: 274 × 12 − 98 = 3,190, short of 4,000, so no date for the goal.
    expect(progress.projection).toEqual({
      method: 'least-squares line over the last 5 complete weeks of credited panels',
      panelsAtEnd: 3190,
      goalMetOn: null,
    });
  });

  it('adds the running total to each week', () => {
    expect(progress.weekly.map((w) => w.cumulative)).toEqual([200, 440, 700, 980, 1300]);
    expect(progress.weekly[4].weekStart).toBe('2026-02-02');
  });
});

describe('campaignProgress: projection', () => {
  it('dates the goal where a steady line reaches it', () => {
    // 400 a week for 4 weeks: the line is 400·x, so 4,000 at week 10, i.e. day 70 = 15 Mar 2026.
    const progress = campaignProgress(
      input({ weekly: weeksOf([400, 400, 400, 400]), today: '2026-02-02' }),
    );
    expect(progress.projection.panelsAtEnd).toBe(4800);
    expect(progress.projection.goalMetOn).toBe('2026-03-15');
  });

  it(`fits only the last ${PROJECTION_WEEKS} complete weeks`, () => {
    // A strong opening (1,000 twice) then 100 a week: the last 8 weeks give slope 100 and
    // intercept 1,800, so 3,800 at the end of a 20-week drive, not the steeper all-weeks line.
    const endsOn = addDays(STARTS_ON, 20 * 7 - 1);
    const weekly = weeksOf([1000, 1000, 100, 100, 100, 100, 100, 100, 100, 100]);
    const progress = campaignProgress(input({ weekly, endsOn, today: addDays(STARTS_ON, 70) }));
    expect(progress.projection.method).toBe(
      'least-squares line over the last 8 complete weeks of credited panels',
    );
    expect(progress.projection.panelsAtEnd).toBe(3800);
    // 100·x + 1,800 reaches 4,000 at week 22, after the end.
    expect(progress.projection.goalMetOn).toBeNull();
  });

  it('leaves the current, incomplete week out of the line', () => {
    // Day 31: weeks 1–4 complete (400 each), week 5 has 3 days in with 50 panels.
    const progress = campaignProgress(
      input({ weekly: weeksOf([400, 400, 400, 400, 50]), today: addDays(STARTS_ON, 31) }),
    );
    expect(progress.projection.method).toContain('last 4 complete weeks');
    expect(progress.projection.panelsAtEnd).toBe(4800);
    expect(progress.creditedPanels).toBe(1650);
  });

  it('never projects below what is already credited', () => {
    // Cumulative 0, 0, 1,200 → slope 600, intercept −800; at week 3.43 (the end) the line gives 1,257,
    // but a late surge in the current week already brought the count to 1,700.
    const endsOn = addDays(STARTS_ON, 23);
    const progress = campaignProgress(
      input({ weekly: weeksOf([0, 0, 1200, 500]), endsOn, today: addDays(STARTS_ON, 22) }),
    );
    expect(progress.projection.panelsAtEnd).toBe(1700);
  });

  it('gives no date when the line is flat', () => {
    const progress = campaignProgress(
      input({ weekly: weeksOf([500, 0, 0, 0]), today: addDays(STARTS_ON, 28) }),
    );
    expect(progress.projection.panelsAtEnd).toBe(500);
    expect(progress.projection.goalMetOn).toBeNull();
  });

  it('continues the pace so far with fewer than 2 complete weeks', () => {
    // Day 10: 1 complete week; 700 credited ÷ 10/7 weeks = 490 a week; 74 days left
    // = 10.571 weeks → 700 + 490 × 10.571 = 5,880; goal at 700 + 490·w = 4,000 → w = 6.73 more
    // weeks after week 1.43, i.e. week 8.16 → day 58 = 3 Mar 2026.
    const progress = campaignProgress(
      input({ weekly: weeksOf([500, 200]), today: addDays(STARTS_ON, 10) }),
    );
    expect(progress.pacePerWeek).toBeCloseTo(490, 10);
    expect(progress.projection.method).toBe(
      'pace so far continued to the end date (fewer than 2 complete weeks for a trend line)',
    );
    expect(progress.projection.panelsAtEnd).toBe(5880);
    expect(progress.projection.goalMetOn).toBe('2026-03-03');
  });

  it.each([3, 17, 256, 8080])(
    'agrees with simple-statistics on a random drive (seed %i)',
    (seed) => {
      // Source: simple-statistics linearRegression / linearRegressionLine, an independent
      // ordinary least-squares implementation.
      const random = seeded(seed);
      const weeksTotal = 6 + Math.floor(random() * 20);
      const endsOn = addDays(STARTS_ON, weeksTotal * 7 - 1);
      const complete = 2 + Math.floor(random() * (weeksTotal - 2));
      const panels = Array.from({ length: complete }, () => Math.floor(random() * 600));
      const progress = campaignProgress(
        input({
          weekly: weeksOf(panels),
          endsOn,
          today: addDays(STARTS_ON, complete * 7),
          goalPanels: 100_000,
        }),
      );
      let cumulative = 0;
      const points = panels.map((p, i) => [i + 1, (cumulative += p)]);
      const line = linearRegressionLine(linearRegression(points.slice(-PROJECTION_WEEKS)));
      expect(progress.projection.panelsAtEnd).toBe(
        Math.max(cumulative, Math.round(line(weeksTotal))),
      );
    },
  );
});

describe('campaignProgress: edge cases', () => {
  it('before the start: no weeks elapsed, pace 0, the whole goal spread over the run', () => {
    const progress = campaignProgress(input({ weekly: [], today: '2025-12-20' }));
    expect(progress.weeksElapsed).toBe(0);
    expect(progress.weeksLeft).toBe(12);
    expect(progress.pacePerWeek).toBe(0);
    expect(progress.neededPerWeek).toBeCloseTo(4000 / 12, 10);
    expect(progress.projection.panelsAtEnd).toBe(0);
    expect(progress.projection.goalMetOn).toBeNull();
  });

  it('on the first day: 0 weeks elapsed, pace 0 even with early parcels credited', () => {
    const progress = campaignProgress(
      input({ weekly: weeksOf([120]), today: STARTS_ON, creditedPanels: 120 }),
    );
    expect(progress.weeksElapsed).toBe(0);
    expect(progress.pacePerWeek).toBe(0);
    expect(progress.neededPerWeek).toBeCloseTo(3880 / 12, 10);
  });

  it('goal already met: nothing more needed, dated to the week it was reached', () => {
    // Cumulative 1,500, 3,000, 4,200: reached in week 3 (19–25 Jan), so 25 Jan.
    const progress = campaignProgress(
      input({ weekly: weeksOf([1500, 1500, 1200, 300]), today: '2026-02-01' }),
    );
    expect(progress.shareDone).toBeCloseTo(4500 / 4000, 10);
    expect(progress.neededPerWeek).toBe(0);
    expect(progress.projection.goalMetOn).toBe('2026-01-25');
  });

  it('after the end: no pace still needed, the final count as projection', () => {
    const progress = campaignProgress(
      input({ weekly: weeksOf(Array<number>(12).fill(300)), today: '2026-04-02' }),
    );
    expect(progress.weeksElapsed).toBe(12);
    expect(progress.weeksLeft).toBe(0);
    expect(progress.pacePerWeek).toBe(300);
    expect(progress.neededPerWeek).toBeNull();
    expect(progress.projection).toEqual({
      method: 'final count: the campaign has ended',
      panelsAtEnd: 3600,
      goalMetOn: null,
    });
  });

  it('on the last day one day is left', () => {
    const progress = campaignProgress(input({ weekly: weeksOf([300]), today: ENDS_ON }));
    expect(progress.weeksLeft).toBeCloseTo(1 / 7, 10);
    expect(progress.neededPerWeek).toBeCloseTo(3700 * 7, 6);
  });

  it('handles a drive that is not a whole number of weeks', () => {
    // 10 days: weeks of 7 and 3 days; after the end both are complete.
    const endsOn = addDays(STARTS_ON, 9);
    const progress = campaignProgress(
      input({ weekly: weeksOf([70, 30]), endsOn, today: addDays(STARTS_ON, 5), goalPanels: 100 }),
    );
    expect(progress.weeksTotal).toBeCloseTo(10 / 7, 10);
    expect(progress.pacePerWeek).toBeCloseTo(100 / (5 / 7), 10);
  });

  it('refuses bad input, naming the field', () => {
    expect(() => campaignProgress(input({ goalPanels: 0 }))).toThrow(
      /goalPanels must be a whole number of at least 1/,
    );
    expect(() => campaignProgress(input({ endsOn: '2026-01-01' }))).toThrow(
      /endsOn \(2026-01-01\) must not be earlier than startsOn/,
    );
    expect(() => campaignProgress(input({ today: '2026-02-30' }))).toThrow(/today must be a date/);
    expect(() =>
      campaignProgress(
        input({ weekly: [{ weekStart: '2026-01-07', panels: 5 }], creditedPanels: 5 }),
      ),
    ).toThrow(/weekly\[0\]\.weekStart must fall on startsOn or a multiple of 7 days after it/);
    expect(() => campaignProgress(input({ weekly: weeksOf([-1]), creditedPanels: 0 }))).toThrow(
      /weekly\[0\]\.panels must be a whole number/,
    );
  });
});
