import { RegionsSetup } from '@/features/network/components/regions-setup';

/** Set-up: regions and chapters, with Add and Edit. */
export function SetupRegionsRoute() {
  return <RegionsSetup />;
}
