import type { ChapterView, HealthReport, RegionView } from '@tallyloom/core';

// A slice of the invented demo network (BRIEF §7), enough for a screen to have something to show.
export const demoRegions: RegionView[] = [
  { id: 3, name: 'Coastal Plain', code: 'CP', chapterCount: 3 },
  { id: 4, name: 'High Mesa', code: 'HM', chapterCount: 3 },
  { id: 1, name: 'North Ridge', code: 'NR', chapterCount: 4 },
  { id: 2, name: 'Riverlands', code: 'RL', chapterCount: 2 },
];

export const demoChapters: ChapterView[] = [
  {
    id: 11,
    name: 'Alder Falls',
    regionId: 1,
    regionName: 'North Ridge',
    reportingDueDay: 10,
    activeFrom: '2026-03-01',
    activeTo: null,
  },
  {
    id: 21,
    name: 'Brindle Bay',
    regionId: 2,
    regionName: 'Riverlands',
    reportingDueDay: 15,
    activeFrom: '2023-11-01',
    activeTo: null,
  },
  {
    id: 22,
    name: 'Cedar Hollow',
    regionId: 2,
    regionName: 'Riverlands',
    reportingDueDay: 7,
    activeFrom: '2022-01-15',
    activeTo: '2025-06-30',
  },
];

export const degradedHealth: HealthReport = {
  status: 'degraded',
  version: '0.1.0',
  uptimeSeconds: 3 * 86_400 + 4 * 3_600 + 12 * 60,
  database: { status: 'down', error: 'connect ECONNREFUSED 127.0.0.1:3307' },
  queue: {
    status: 'up',
    queues: [{ name: 'snapshots', waiting: 1_250, active: 2, failed: 1, delayed: 0 }],
  },
};
