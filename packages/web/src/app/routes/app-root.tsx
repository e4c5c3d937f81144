import { Home20Regular, Pulse20Regular, Person20Regular } from '@fluentui/react-icons';
import { Outlet, ScrollRestoration } from 'react-router-dom';
import { AppShell, type AppNavItem } from '@/components/ui/app-shell';
import { LinkButton } from '@/components/ui/link-button';
import { appConfig } from '@/config/app-config';
import { paths } from '@/config/paths';

const navItems: AppNavItem[] = [
  { label: 'Network', to: paths.network.getHref(), icon: Home20Regular, end: true },
  { label: 'System status', to: paths.status.getHref(), icon: Pulse20Regular },
];

/** The layout route: the shell around whichever page the URL picks. */
export function AppRoot() {
  return (
    <AppShell
      productName={appConfig.productName}
      networkName={appConfig.networkName}
      navItems={navItems}
      headerActions={
        <LinkButton to={paths.signIn.getHref()} appearance="subtle" icon={<Person20Regular />}>
          Sign in
        </LinkButton>
      }
    >
      <Outlet />
      <ScrollRestoration />
    </AppShell>
  );
}
