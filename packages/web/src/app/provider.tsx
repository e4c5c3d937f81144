import { FluentProvider } from '@fluentui/react-components';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { lazy, Suspense, useEffect, type ReactNode } from 'react';
import { startSessionRenewal } from '@/lib/session/session';
import { currentUser, sessionStore } from '@/lib/session/session-store';
import { useGlobalStyles } from '@/theme/global-styles';
import { tallyloomTheme } from '@/theme/theme';

// Toasts follow an admin's actions only; their code loads just after the first page, not before it.
const AppToaster = lazy(async () => ({
  default: (await import('@/components/ui/app-toaster')).AppToaster,
}));

export interface AppProviderProps {
  queryClient: QueryClient;
  children: ReactNode;
}

/**
 * When a session ends (signed out, or it ran out) or another person signs in, the data fetched
 * so far is forgotten, so the next person at this screen never sees it.
 */
function useForgetDataBetweenPeople(queryClient: QueryClient) {
  useEffect(() => {
    let lastUserId = currentUser()?.id;
    return sessionStore.subscribe(() => {
      const userId = currentUser()?.id;
      if (lastUserId !== undefined && userId !== lastUserId) queryClient.clear();
      lastUserId = userId;
    });
  }, [queryClient]);
}

/** Theme, server-state cache and the session's upkeep for everything below; the router sits inside. */
export function AppProvider({ queryClient, children }: AppProviderProps) {
  useGlobalStyles();
  useForgetDataBetweenPeople(queryClient);
  useEffect(() => startSessionRenewal(), []);
  return (
    <FluentProvider theme={tallyloomTheme}>
      <QueryClientProvider client={queryClient}>
        {children}
        <Suspense fallback={null}>
          <AppToaster />
        </Suspense>
      </QueryClientProvider>
    </FluentProvider>
  );
}
