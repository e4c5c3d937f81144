import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** A refusal (4xx) will not change on a second try; a flaky network or a 5xx might. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.statusCode >= 400 && error.statusCode < 500) return false;
  return failureCount < 2;
}

export const defaultQueryOptions: DefaultOptions = {
  queries: {
    // Network figures change a few times a day; a minute of freshness keeps navigation quiet.
    staleTime: 60_000,
    retry: shouldRetry,
    refetchOnWindowFocus: false,
  },
};

export function createQueryClient(overrides: DefaultOptions = {}): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { ...defaultQueryOptions.queries, ...overrides.queries },
      mutations: { ...defaultQueryOptions.mutations, ...overrides.mutations },
    },
  });
}

/** The one client the running app uses; tests build their own with `createQueryClient`. */
export const queryClient = createQueryClient();
