import { FluentProvider } from '@fluentui/react-components';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useGlobalStyles } from '@/theme/global-styles';
import { tallyloomTheme } from '@/theme/theme';

export interface AppProviderProps {
  queryClient: QueryClient;
  children: ReactNode;
}

/** Theme and server-state cache for everything below; the router sits inside. */
export function AppProvider({ queryClient, children }: AppProviderProps) {
  useGlobalStyles();
  return (
    <FluentProvider theme={tallyloomTheme}>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </FluentProvider>
  );
}
