import { AgenciesPanel } from '@/features/network-setup/components/agencies-panel';
import { useNetworkLists } from '@/features/network/hooks/use-network-lists';

/** Set-up: partner agencies and the chapters that serve them. */
export function SetupAgenciesRoute() {
  return <AgenciesPanel options={useNetworkLists()} />;
}
