import { BlanketSizesPanel } from '@/features/network-setup/components/blanket-sizes-panel';

/** Set-up: the blanket size catalogue, retired sizes included. */
export function SetupBlanketSizesRoute() {
  return <BlanketSizesPanel />;
}
