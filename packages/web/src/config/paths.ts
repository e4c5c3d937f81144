/** A query string from the values that are set; "/" is left readable (`?next=/people`). */
function query(values: Record<string, string | undefined>): string {
  const parts = Object.entries(values)
    .filter((entry): entry is [string, string] => entry[1] !== undefined && entry[1] !== '')
    .map(([key, value]) => `${key}=${encodeURIComponent(value).replace(/%2F/g, '/')}`);
  return parts.length ? `?${parts.join('&')}` : '';
}

/** What the sign-in page says above the form, after another page sent the person there. */
export type SignInNotice = 'password-changed';

/** Every route path in one place; components link through `getHref`, never a typed string. */
export const paths = {
  network: {
    path: '/',
    getHref: () => '/',
  },
  status: {
    path: '/status',
    getHref: () => '/status',
  },
  people: {
    path: '/people',
    getHref: () => '/people',
  },
  outbox: {
    path: '/outbox',
    getHref: () => '/outbox',
  },
  receipts: {
    path: '/receipts',
    /** `search`: the list's filters, page and order, as the list keeps them in its URL. */
    getHref: (search = '') => `/receipts${search}`,
  },
  receiptNew: {
    path: '/receipts/new',
    getHref: () => '/receipts/new',
  },
  receiptImport: {
    path: '/receipts/import',
    getHref: () => '/receipts/import',
  },
  receipt: {
    path: '/receipts/:id',
    getHref: (id: number) => `/receipts/${id}`,
  },
  receiptEdit: {
    path: '/receipts/:id/edit',
    getHref: (id: number) => `/receipts/${id}/edit`,
  },
  tallies: {
    path: '/tallies',
    getHref: () => '/tallies',
  },
  tally: {
    path: '/tallies/:id',
    getHref: (id: number) => `/tallies/${id}`,
  },
  tallyRevisions: {
    path: '/tallies/:id/revisions',
    /** `left`, `right`: the revisions to compare side by side. */
    getHref: (id: number, { left, right }: { left?: number; right?: number } = {}) =>
      `/tallies/${id}/revisions${query({ left: left?.toString(), right: right?.toString() })}`,
  },
  tallyReview: {
    path: '/review',
    /** `search`: the queue's filters, as the queue keeps them in its URL. */
    getHref: (search = '') => `/review${search}`,
  },
  tallyReviewItem: {
    path: '/review/:id',
    getHref: (id: number) => `/review/${id}`,
  },
  dashboard: {
    path: '/dashboard',
    /** `search`: the period, as the dashboard keeps it in its URL. */
    getHref: (search = '') => `/dashboard${search}`,
  },
  dashboardRegion: {
    path: '/dashboard/regions/:id',
    getHref: (id: number, search = '') => `/dashboard/regions/${id}${search}`,
  },
  dashboardChapter: {
    path: '/dashboard/chapters/:id',
    getHref: (id: number, search = '') => `/dashboard/chapters/${id}${search}`,
  },
  campaigns: {
    path: '/dashboard/campaigns',
    getHref: () => '/dashboard/campaigns',
  },
  campaign: {
    path: '/dashboard/campaigns/:id',
    getHref: (id: number) => `/dashboard/campaigns/${id}`,
  },
  publicProgress: {
    path: '/progress/:code',
    getHref: (code: string) => `/progress/${encodeURIComponent(code)}`,
  },
  jobs: {
    path: '/jobs',
    getHref: () => '/jobs',
  },
  exports: {
    path: '/exports',
    getHref: () => '/exports',
  },
  impactPack: {
    path: '/impact-pack',
    getHref: () => '/impact-pack',
  },
  auditLog: {
    path: '/audit-log',
    /** `search`: the log's filters and page, as the viewer keeps them in its URL. */
    getHref: (search = '') => `/audit-log${search}`,
  },
  trace: {
    path: '/trace/:reference',
    /** `reference`: the figure's stable trace reference (see core contract/trace). */
    getHref: (reference: string, measure?: string) =>
      `/trace/${encodeURIComponent(reference)}${query({ measure })}`,
  },
  samples: {
    path: '/samples',
    getHref: () => '/samples',
  },
  sample: {
    path: '/samples/:id',
    getHref: (id: number) => `/samples/${id}`,
  },
  findings: {
    path: '/findings',
    getHref: () => '/findings',
  },
  finding: {
    path: '/findings/:id',
    getHref: (id: number) => `/findings/${id}`,
  },
  setup: {
    path: '/setup',
    getHref: () => '/setup',
  },
  setupAgencies: {
    path: '/setup/agencies',
    getHref: () => '/setup/agencies',
  },
  setupCampaigns: {
    path: '/setup/campaigns',
    getHref: () => '/setup/campaigns',
  },
  setupBlanketSizes: {
    path: '/setup/blanket-sizes',
    getHref: () => '/setup/blanket-sizes',
  },
  setupSettings: {
    path: '/setup/settings',
    getHref: () => '/setup/settings',
  },
  account: {
    path: '/account',
    getHref: () => '/account',
  },
  signIn: {
    path: '/sign-in',
    /** `next`: the page to return to once signed in. */
    getHref: ({ next, notice }: { next?: string; notice?: SignInNotice } = {}) =>
      `/sign-in${query({ next, notice })}`,
  },
  forgotPassword: {
    path: '/forgot-password',
    getHref: () => '/forgot-password',
  },
  resetPassword: {
    path: '/reset-password',
    getHref: (token?: string) => `/reset-password${query({ token })}`,
  },
  acceptInvitation: {
    path: '/accept-invitation',
    getHref: (token?: string) => `/accept-invitation${query({ token })}`,
  },
} as const;
