import { Outlet } from 'react-router-dom';
import { PublicFrame } from '@/components/ui/public-frame';
import { appConfig } from '@/config/app-config';

/** The layout of the pages used without a session. */
export function PublicRoot() {
  return (
    <PublicFrame productName={appConfig.productName} networkName={appConfig.networkName}>
      <Outlet />
    </PublicFrame>
  );
}
