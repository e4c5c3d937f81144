import type {
  CampaignProgressView,
  ComplianceFigures,
  DashboardView,
  JobQueueView,
  Period,
  SnapshotFigures,
  SnapshotScope,
  SnapshotView,
} from '@tallyloom/core';

// Invented figures for the dashboards, campaigns and jobs screens (BRIEF §7 demo network).

export const march2026: Period = {
  kind: 'month',
  key: '2026-03',
  from: '2026-03',
  to: '2026-03',
  label: 'Mar 2026',
};

export const february2026: Period = {
  kind: 'month',
  key: '2026-02',
  from: '2026-02',
  to: '2026-02',
  label: 'Feb 2026',
};

export function figures(overrides: Partial<SnapshotFigures> = {}): SnapshotFigures {
  return {
    panelsAccepted: 1_250,
    panelsSetAside: 12,
    panelsUsed: 1_100,
    blanketsAssembled: 40,
    blanketsReceived: 3,
    blanketsGiven: 36,
    peopleServed: 38,
    peopleServedByGroup: {
      infants: 4,
      children: 10,
      adults: 14,
      olderAdults: 8,
      disasterAffected: 2,
    },
    volunteerHours: 212.5,
    yarnKg: 18.4,
    panelsInStock: 2_340,
    blanketsInStock: 17,
    approvedTallies: 9,
    ...overrides,
  };
}

const compliance: ComplianceFigures = { expected: 12, onTime: 8, late: 1, missing: 2, open: 1 };

export function snapshot(
  scope: SnapshotScope,
  scopeId: number | null,
  scopeName: string,
  period: Period = march2026,
  overrides: Partial<SnapshotView> = {},
): SnapshotView {
  return {
    scope,
    scopeId,
    scopeName,
    period,
    figures: figures(),
    compliance,
    pendingTallies: 3,
    asOf: '2026-04-12T08:30:00Z',
    ...overrides,
  };
}

/** The network in March 2026 against February, with two regions. */
export function networkDashboard(overrides: Partial<DashboardView> = {}): DashboardView {
  const current = snapshot('network', null, 'Emberfold network');
  const previous = snapshot('network', null, 'Emberfold network', february2026, {
    figures: figures({
      panelsAccepted: 1_000,
      blanketsAssembled: 50,
      blanketsGiven: 36,
      peopleServed: 0,
    }),
  });
  return {
    scope: 'network',
    scopeId: null,
    scopeName: 'Emberfold network',
    period: march2026,
    current,
    previous,
    trend: [previous, current],
    breakdown: [
      snapshot('region', 1, 'North Ridge'),
      snapshot('region', 2, 'Riverlands', march2026, {
        figures: figures({ panelsAccepted: 480 }),
      }),
    ],
    asOf: '2026-04-12T08:30:00Z',
    ...overrides,
  };
}

export function regionDashboard(id = 1, name = 'North Ridge'): DashboardView {
  const current = snapshot('region', id, name);
  return {
    scope: 'region',
    scopeId: id,
    scopeName: name,
    period: march2026,
    current,
    previous: null,
    trend: [current],
    breakdown: [snapshot('chapter', 11, 'Alder Falls')],
    asOf: current.asOf,
  };
}

/** The hand-worked pace of issue #6: goal 4,000, 1,300 credited after 5 of 12 weeks. */
export const springCampaign: CampaignProgressView = {
  campaignId: 41,
  code: 'SPRING26',
  name: 'Spring warmth drive',
  goalPanels: 4_000,
  startsOn: '2026-03-02',
  endsOn: '2026-05-24',
  creditedPanels: 1_300,
  pendingPanels: 220,
  shareDone: 0.325,
  weeksElapsed: 5,
  weeksTotal: 12,
  weeksLeft: 7,
  pacePerWeek: 260,
  neededPerWeek: 2_700 / 7,
  projection: {
    method: 'least-squares line over the last 5 weeks of credited panels',
    panelsAtEnd: 3_120,
    goalMetOn: null,
  },
  weekly: [
    { weekStart: '2026-03-02', panels: 200, cumulative: 200 },
    { weekStart: '2026-03-09', panels: 240, cumulative: 440 },
    { weekStart: '2026-03-16', panels: 260, cumulative: 700 },
    { weekStart: '2026-03-23', panels: 280, cumulative: 980 },
    { weekStart: '2026-03-30', panels: 320, cumulative: 1_300 },
  ],
  asOf: '2026-04-05T06:00:00Z',
};

export const snapshotQueue: JobQueueView = {
  name: 'snapshots',
  counts: { waiting: 1_250, active: 1, completed: 48_210, failed: 1, delayed: 0 },
  active: [{ id: '901', name: 'rebuild', progress: 40, startedAt: '2026-04-12T08:29:00Z' }],
  failed: [
    {
      id: '877',
      name: 'rebuild',
      failedReason: 'Deadlock found when trying to get lock',
      attemptsMade: 3,
      failedAt: '2026-04-12T07:10:00Z',
    },
  ],
  repeatable: [{ name: 'nightly-rebuild', cron: '0 2 * * *', next: '2026-04-13T02:00:00Z' }],
};
