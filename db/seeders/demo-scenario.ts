/**
 * The invented demo network (BRIEF §7): the Emberfold Blanket Network. Every name here is made up;
 * no real people, organisations or brands.
 */

export const DEMO_NETWORK_NAME = 'Emberfold Blanket Network';

export interface DemoChapter {
  name: string;
  activeFrom: string;
  reportingDueDay: number;
  activeTo?: string;
}

export interface DemoRegion {
  name: string;
  code: string;
  chapters: DemoChapter[];
}

export const DEMO_REGIONS: DemoRegion[] = [
  {
    name: 'North Ridge',
    code: 'NR',
    chapters: [
      { name: 'Alder Falls', activeFrom: '2022-09-01', reportingDueDay: 10 },
      { name: 'Elkhorn', activeFrom: '2022-09-01', reportingDueDay: 10 },
      { name: 'Glenmoor', activeFrom: '2023-02-01', reportingDueDay: 12 },
      { name: 'Kestrel Point', activeFrom: '2024-03-01', reportingDueDay: 10 },
    ],
  },
  {
    name: 'Riverlands',
    code: 'RL',
    chapters: [
      { name: 'Cedar Hollow', activeFrom: '2022-09-01', reportingDueDay: 10 },
      { name: 'Dunmore', activeFrom: '2022-11-01', reportingDueDay: 15 },
      { name: 'Fernwick', activeFrom: '2023-01-01', reportingDueDay: 10 },
      { name: 'Ivybridge', activeFrom: '2023-06-01', reportingDueDay: 10 },
      { name: 'Millbrook Crossing', activeFrom: '2024-01-01', reportingDueDay: 10 },
    ],
  },
  {
    name: 'Coastal Plain',
    code: 'CP',
    chapters: [
      { name: 'Brindle Bay', activeFrom: '2022-09-01', reportingDueDay: 10 },
      { name: 'Harrowgate', activeFrom: '2023-03-01', reportingDueDay: 12 },
      {
        name: 'Saltmarsh End',
        activeFrom: '2023-09-01',
        reportingDueDay: 10,
        activeTo: '2026-06-30',
      },
    ],
  },
  {
    name: 'High Mesa',
    code: 'HM',
    chapters: [
      { name: 'Juniper Flats', activeFrom: '2022-10-01', reportingDueDay: 10 },
      { name: 'Larkspur', activeFrom: '2023-04-01', reportingDueDay: 10 },
      { name: 'Sagebrush Gap', activeFrom: '2024-06-01', reportingDueDay: 14 },
    ],
  },
];
