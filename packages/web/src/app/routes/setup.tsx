import { makeStyles, Tab, TabList, tokens } from '@fluentui/react-components';
import { Outlet, useLocation, useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';

const setupTabs = [
  { id: 'setup-tab-regions', label: 'Regions & chapters', href: paths.setup.getHref() },
  { id: 'setup-tab-agencies', label: 'Partner agencies', href: paths.setupAgencies.getHref() },
  { id: 'setup-tab-campaigns', label: 'Campaigns', href: paths.setupCampaigns.getHref() },
  { id: 'setup-tab-sizes', label: 'Blanket sizes', href: paths.setupBlanketSizes.getHref() },
  { id: 'setup-tab-settings', label: 'Settings', href: paths.setupSettings.getHref() },
];

const useStyles = makeStyles({
  tabs: {
    marginBottom: tokens.spacingVerticalL,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  panel: { ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}` } },
});

/**
 * Network set-up for admins: one tab per part, each its own URL so a part can be bookmarked.
 * The tabs move with the arrow keys and open with Enter or Space, as Fluent's TabList does.
 */
export function SetupRoute() {
  const styles = useStyles();
  const location = useLocation();
  const navigate = useNavigate();
  const pathname = location.pathname.replace(/\/+$/, '') || '/';
  const selected = setupTabs.find((tab) => tab.href === pathname) ?? setupTabs[0];

  return (
    <>
      <PageHeader
        title="Network set-up"
        description="Regions and chapters, partner agencies, campaigns, the blanket size catalogue and the network’s settings."
      />
      <TabList
        className={styles.tabs}
        aria-label="Set-up sections"
        selectedValue={selected?.href}
        onTabSelect={(_event, data) => {
          if (typeof data.value === 'string' && data.value !== pathname) void navigate(data.value);
        }}
      >
        {setupTabs.map((tab) => (
          <Tab key={tab.id} id={tab.id} value={tab.href}>
            {tab.label}
          </Tab>
        ))}
      </TabList>
      <div role="tabpanel" aria-labelledby={selected?.id} className={styles.panel}>
        <Outlet />
      </div>
    </>
  );
}
