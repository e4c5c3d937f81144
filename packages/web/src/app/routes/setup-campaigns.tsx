import { CampaignsPanel } from '@/features/network-setup/components/campaigns-panel';
import { useNetworkLists } from '@/features/network/hooks/use-network-lists';

/** Set-up: campaigns (drives), network-wide or for one region. */
export function SetupCampaignsRoute() {
  return <CampaignsPanel options={useNetworkLists()} />;
}
