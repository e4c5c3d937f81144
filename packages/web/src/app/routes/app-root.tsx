import {
  ArrowDownload20Regular,
  BoxMultiple20Regular,
  CalendarLtr20Regular,
  ChartMultiple20Regular,
  ClipboardSearch20Regular,
  ClipboardTaskListLtr20Regular,
  DataUsage20Regular,
  DocumentTable20Regular,
  Flag20Regular,
  History20Regular,
  Home20Regular,
  MailInbox20Regular,
  People20Regular,
  Pulse20Regular,
  TaskListSquareLtr20Regular,
  WrenchSettings20Regular,
} from '@fluentui/react-icons';
import { can, ROLE_LABELS, rolesFor, type Role, type SessionUser } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation, useMatches } from 'react-router-dom';
import { AppShell, type AppNavItem } from '@/components/ui/app-shell';
import { LinkButton } from '@/components/ui/link-button';
import { NoPermissionState } from '@/components/ui/no-permission-state';
import { appConfig } from '@/config/app-config';
import { paths } from '@/config/paths';
import { UserMenu } from '@/features/auth/components/user-menu';
import { scopeLabel } from '@/lib/scope';
import { useSession } from '@/lib/session/use-session';
import { accessOfMatches, mayOpen, routeAccess, type RouteAccess } from '../route-access';

interface NavEntry extends AppNavItem {
  access: RouteAccess;
  /** Roles for whom this is the main job: the entry comes first for them. */
  firstFor?: readonly Role[];
}

const navItems: NavEntry[] = [
  {
    label: routeAccess.network.name,
    to: paths.network.getHref(),
    icon: Home20Regular,
    end: true,
    access: routeAccess.network,
  },
  {
    label: routeAccess.dashboard.name,
    to: paths.dashboard.getHref(),
    icon: DataUsage20Regular,
    // Region and chapter dashboards sit under it; the campaigns have their own entry.
    access: routeAccess.dashboard,
  },
  {
    label: routeAccess.campaigns.name,
    to: paths.campaigns.getHref(),
    icon: ChartMultiple20Regular,
    access: routeAccess.campaigns,
  },
  {
    label: routeAccess.receipts.name,
    to: paths.receipts.getHref(),
    icon: BoxMultiple20Regular,
    access: routeAccess.receipts,
  },
  {
    label: routeAccess.tallies.name,
    to: paths.tallies.getHref(),
    icon: CalendarLtr20Regular,
    access: routeAccess.tallies,
    firstFor: ['chapter_lead'],
  },
  {
    // Short in the navigation; the page and the "no access" screen use the full name.
    label: 'Review',
    to: paths.tallyReview.getHref(),
    icon: ClipboardTaskListLtr20Regular,
    access: routeAccess.tallyReview,
  },
  {
    label: routeAccess.impactPack.name,
    to: paths.impactPack.getHref(),
    icon: DocumentTable20Regular,
    access: routeAccess.impactPack,
    firstFor: ['grant_writer'],
  },
  {
    label: routeAccess.samples.name,
    to: paths.samples.getHref(),
    icon: ClipboardSearch20Regular,
    access: routeAccess.samples,
    firstFor: ['auditor'],
  },
  {
    label: routeAccess.findings.name,
    to: paths.findings.getHref(),
    icon: Flag20Regular,
    access: routeAccess.findings,
  },
  {
    label: routeAccess.auditLog.name,
    to: paths.auditLog.getHref(),
    icon: History20Regular,
    access: routeAccess.auditLog,
  },
  {
    // Short in the navigation; the page says whose they are.
    label: 'Exports',
    to: paths.exports.getHref(),
    icon: ArrowDownload20Regular,
    access: routeAccess.exports,
  },
  {
    label: routeAccess.status.name,
    to: paths.status.getHref(),
    icon: Pulse20Regular,
    access: routeAccess.status,
  },
  {
    label: routeAccess.jobs.name,
    to: paths.jobs.getHref(),
    icon: TaskListSquareLtr20Regular,
    access: routeAccess.jobs,
  },
  {
    label: routeAccess.people.name,
    to: paths.people.getHref(),
    icon: People20Regular,
    access: routeAccess.people,
  },
  {
    label: routeAccess.setup.name,
    to: paths.setup.getHref(),
    icon: WrenchSettings20Regular,
    access: routeAccess.setup,
  },
  {
    label: routeAccess.outbox.name,
    to: paths.outbox.getHref(),
    icon: MailInbox20Regular,
    access: routeAccess.outbox,
  },
];

/** The entries the person's role opens; their main job's entry first. */
function navFor(user: SessionUser): AppNavItem[] {
  const open = navItems.filter((item) => mayOpen(user, item.access));
  const first = open.filter((item) => item.firstFor?.includes(user.role));
  return [...first, ...open.filter((item) => !first.includes(item))].map(
    ({ label, to, icon, end }) => ({ label, to, icon, end }),
  );
}

/** The shell as a signed-in person sees it: only the pages their role opens, and who they are. */
export function SignedInShell({ user, children }: { user: SessionUser; children: ReactNode }) {
  return (
    <AppShell
      productName={appConfig.productName}
      networkName={appConfig.networkName}
      navItems={navFor(user)}
      headerActions={<UserMenu user={user} />}
    >
      {children}
    </AppShell>
  );
}

function allowedRolesText(access: RouteAccess): string {
  if (access.policy === null) return 'everyone signed in';
  const labels = rolesFor(access.policy).map((role) => ROLE_LABELS[role]);
  if (labels.length === 1) return `the ${labels[0]} role`;
  return `the ${labels.slice(0, -1).join(', ')} and ${labels.at(-1)} roles`;
}

function NoPermission({ user, access }: { user: SessionUser; access: RouteAccess }) {
  const home = can(user.role, 'network.read')
    ? { to: paths.network.getHref(), label: `Back to ${routeAccess.network.name}` }
    : { to: paths.account.getHref(), label: `Go to ${routeAccess.account.name}` };
  return (
    <NoPermissionState
      pageName={access.name}
      signedInAs={`${user.displayName} (${ROLE_LABELS[user.role]}, ${scopeLabel(user)})`}
      allowedFor={allowedRolesText(access)}
      action={
        <LinkButton to={home.to} appearance="primary" icon={<Home20Regular />}>
          {home.label}
        </LinkButton>
      }
    />
  );
}

/**
 * The layout of every signed-in page. When the session ends (signed out, or it ran out and
 * could not be renewed) it takes the person to sign-in, with the way back unless they left on
 * purpose; a page their role does not open shows why instead of the page.
 */
export function AppRoot() {
  const session = useSession();
  const location = useLocation();
  const matches = useMatches();

  if (session.status !== 'signed-in') {
    const here = `${location.pathname}${location.search}`;
    const leftOnPurpose = session.status === 'signed-out' && session.reason === 'signed-out';
    const next = leftOnPurpose || here === paths.network.getHref() ? undefined : here;
    return <Navigate to={paths.signIn.getHref({ next })} replace />;
  }

  const access = accessOfMatches(matches);
  return (
    <SignedInShell user={session.user}>
      {access && !mayOpen(session.user, access) ? (
        <NoPermission user={session.user} access={access} />
      ) : (
        <Outlet />
      )}
    </SignedInShell>
  );
}
