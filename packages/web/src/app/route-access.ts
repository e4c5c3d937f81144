import { can, type Policy, type SessionUser } from '@tallyloom/core';
import {
  redirect,
  type LoaderFunction,
  type LoaderFunctionArgs,
  type UIMatch,
} from 'react-router-dom';
import { paths } from '@/config/paths';
import { restoreSession } from '@/lib/session/session';

/** What a signed-in page asks of the person: a policy from core, or just a session (null). */
export interface RouteAccess {
  /** The page's name, for the navigation and the "no access" screen. */
  name: string;
  policy: Policy | null;
}

export const routeAccess = {
  network: { name: 'Network', policy: 'network.read' },
  status: { name: 'System status', policy: 'system.read' },
  people: { name: 'People', policy: 'people.manage' },
  outbox: { name: 'Dev outbox', policy: 'outbox.read' },
  receipts: { name: 'Parcels', policy: 'receipts.read' },
  receipt: { name: 'Parcel', policy: 'receipts.read' },
  receiptNew: { name: 'Log a parcel', policy: 'receipts.write' },
  receiptImport: { name: 'Import parcels', policy: 'receipts.write' },
  receiptEdit: { name: 'Correct a parcel', policy: 'receipts.write' },
  tallies: { name: 'Monthly tallies', policy: 'tallies.read' },
  tally: { name: 'Monthly tally', policy: 'tallies.read' },
  tallyRevisions: { name: 'Compare revisions', policy: 'tallies.read' },
  tallyReview: { name: 'Review tallies', policy: 'tallies.review' },
  tallyReviewItem: { name: 'Review a tally', policy: 'tallies.review' },
  setup: { name: 'Network set-up', policy: 'network.manage' },
  dashboard: { name: 'Dashboard', policy: 'reports.read' },
  dashboardRegion: { name: 'Region dashboard', policy: 'reports.read' },
  dashboardChapter: { name: 'Chapter dashboard', policy: 'reports.read' },
  campaigns: { name: 'Campaigns', policy: 'reports.read' },
  campaign: { name: 'Campaign progress', policy: 'reports.read' },
  jobs: { name: 'Jobs', policy: 'jobs.manage' },
  exports: { name: 'My exports', policy: 'exports.tables' },
  impactPack: { name: 'Impact pack', policy: 'exports.impact-pack' },
  auditLog: { name: 'Audit log', policy: 'audit.read' },
  trace: { name: 'Trace a figure', policy: 'trace.read' },
  samples: { name: 'Audit samples', policy: 'audit.sample' },
  sample: { name: 'Sample worksheet', policy: 'audit.sample' },
  findings: { name: 'Findings', policy: 'findings.read' },
  finding: { name: 'Finding', policy: 'findings.read' },
  account: { name: 'My account', policy: null },
} as const satisfies Record<string, RouteAccess>;

/** Carried in a route's `handle`, so the layout can tell which page it is guarding. */
export interface AccessHandle {
  access: RouteAccess;
}

export function mayOpen(user: SessionUser, access: RouteAccess): boolean {
  return access.policy === null || can(user.role, access.policy);
}

/** The route's access rule, read from the deepest matched route that declares one. */
export function accessOfMatches(matches: UIMatch[]): RouteAccess | undefined {
  return matches
    .map((match) => (match.handle as Partial<AccessHandle> | undefined)?.access)
    .filter((access): access is RouteAccess => access !== undefined)
    .at(-1);
}

function pathOf(request: Request): string {
  const url = new URL(request.url);
  return `${url.pathname}${url.search}`;
}

/**
 * Guards a signed-in page's loader: without a session, off to sign-in with the way back; with
 * one but without the policy, the page's own loader does not run (its data would be refused)
 * and the layout shows the "no access" screen.
 */
export function requireAccess(access: RouteAccess, loader?: LoaderFunction) {
  return async (args: LoaderFunctionArgs) => {
    const user = await restoreSession();
    if (!user) return redirect(paths.signIn.getHref({ next: pathOf(args.request) }));
    if (!mayOpen(user, access) || !loader) return null;
    return loader(args);
  };
}
