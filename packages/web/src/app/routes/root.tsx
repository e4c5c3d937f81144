import { Outlet, ScrollRestoration } from 'react-router-dom';
import { restoreSession } from '@/lib/session/session';

/** Settles the session before the first page shows ("Opening Tallyloom…" meanwhile). */
export async function rootLoader() {
  await restoreSession();
  return null;
}

export function RootRoute() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}
