import type {
  ApiErrorBody,
  CampaignView,
  ChapterView,
  HealthReport,
  Page,
  PartnerAgencyView,
  RegionView,
  Role,
  SessionResponse,
  SessionUser,
  UserStatus,
  UserView,
} from '@tallyloom/core';

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

// The six roles of BRIEF §2, one invented person each (addresses on the reserved .example domain).
const person = (
  id: number,
  displayName: string,
  role: Role,
  scope: Partial<Pick<SessionUser, 'regionId' | 'regionName' | 'chapterId' | 'chapterName'>> = {},
): SessionUser => ({
  id,
  email: `${displayName.toLowerCase().replace(/\s+/g, '.')}@emberfold.example`,
  displayName,
  role,
  regionId: null,
  regionName: null,
  chapterId: null,
  chapterName: null,
  ...scope,
});

export const demoPeople = {
  admin: person(1, 'Maren Holt', 'network_admin'),
  staff: person(2, 'Tobias Wren', 'national_staff'),
  coordinator: person(3, 'Priya Castell', 'regional_coordinator', {
    regionId: 1,
    regionName: 'North Ridge',
  }),
  chapterLead: person(4, 'Dana Whitlock', 'chapter_lead', {
    regionId: 1,
    regionName: 'North Ridge',
    chapterId: 11,
    chapterName: 'Alder Falls',
  }),
  grantWriter: person(5, 'Ines Farrow', 'grant_writer'),
  auditor: person(6, 'Oskar Lind', 'auditor'),
} satisfies Record<string, SessionUser>;

/** What sign-in or refresh answers for `user`; the token names the user, to tell tokens apart. */
export function sessionFor(user: SessionUser, token = `token-${user.id}`): SessionResponse {
  return {
    accessToken: token,
    accessTokenExpiresAt: new Date(Date.now() + 15 * 60_000).toISOString(),
    user,
  };
}

const firstNames = ['Ada', 'Bram', 'Cleo', 'Dev', 'Edda', 'Finn', 'Greta', 'Hal'];
const lastNames = ['Ashby', 'Brook', 'Corr', 'Dale', 'Eyre'];
const statuses: UserStatus[] = ['active', 'active', 'invited', 'locked', 'deactivated'];

/** Forty people for the People list: enough for two pages of 25. */
export const demoUserViews: UserView[] = Array.from({ length: 40 }, (_, index) => {
  const displayName = `${firstNames[index % firstNames.length]} ${lastNames[Math.floor(index / firstNames.length)]}`;
  const status = statuses[index % statuses.length] ?? 'active';
  const role: Role =
    index % 3 === 0 ? 'chapter_lead' : index % 3 === 1 ? 'regional_coordinator' : 'auditor';
  return {
    ...person(100 + index, displayName, role, {
      ...(role === 'chapter_lead'
        ? { regionId: 2, regionName: 'Riverlands', chapterId: 21, chapterName: 'Brindle Bay' }
        : {}),
      ...(role === 'regional_coordinator' ? { regionId: 2, regionName: 'Riverlands' } : {}),
    }),
    status,
    lastSignInAt: status === 'invited' ? null : '2026-03-14T09:05:00Z',
    invitedAt: '2026-01-05T10:00:00Z',
    createdAt: '2026-01-05T10:00:00Z',
  };
});

/** The server's answer to `GET /api/users` for these query parameters, over `people`. */
export function usersPage(url: URL, people: UserView[] = demoUserViews): Page<UserView> {
  const page = Number(url.searchParams.get('page') ?? '1');
  const pageSize = Number(url.searchParams.get('pageSize') ?? '25');
  const search = url.searchParams.get('search')?.toLowerCase();
  const role = url.searchParams.get('role');
  const status = url.searchParams.get('status');
  const matching = people.filter(
    (candidate) =>
      (!search ||
        candidate.displayName.toLowerCase().includes(search) ||
        candidate.email.includes(search)) &&
      (!role || candidate.role === role) &&
      (!status || candidate.status === status),
  );
  return {
    items: matching.slice((page - 1) * pageSize, page * pageSize),
    total: matching.length,
    page,
    pageSize,
  };
}

export function apiErrorBody(
  statusCode: number,
  message: string,
  extra: Partial<ApiErrorBody> = {},
) {
  const error: Record<number, string> = {
    400: 'Bad Request',
    401: 'Unauthorized',
    403: 'Forbidden',
    404: 'Not Found',
    423: 'Locked',
    429: 'Too Many Requests',
  };
  return { statusCode, error: error[statusCode] ?? 'Error', message, ...extra };
}

// Partner agencies and campaigns of the demo network (BRIEF §7), for the set-up and network pages.
export const demoAgencies: PartnerAgencyView[] = [
  {
    id: 31,
    name: 'Maple Street Family Shelter',
    kind: 'family_shelter',
    active: true,
    chapters: [{ id: 11, name: 'Alder Falls' }],
  },
  {
    id: 32,
    name: 'Riverside Care Home',
    kind: 'care_home',
    active: true,
    chapters: [
      { id: 21, name: 'Brindle Bay' },
      { id: 22, name: 'Cedar Hollow' },
    ],
  },
  {
    id: 33,
    name: 'Brindle Bay Community Pantry',
    kind: 'other',
    active: false,
    chapters: [{ id: 21, name: 'Brindle Bay' }],
  },
];

export const demoCampaigns: CampaignView[] = [
  {
    id: 41,
    code: 'DWD26',
    name: 'Deep Winter Drive',
    goalPanels: 4000,
    startsOn: '2025-11-01',
    endsOn: '2026-02-28',
    regionId: null,
    regionName: null,
  },
  {
    id: 42,
    code: 'RL-SPRING25',
    name: 'Riverlands Spring Stitch-In',
    goalPanels: 1200,
    startsOn: '2025-03-01',
    endsOn: '2025-05-31',
    regionId: 2,
    regionName: 'Riverlands',
  },
];
