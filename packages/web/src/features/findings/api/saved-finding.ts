import type { QueryClient } from '@tanstack/react-query';
import type { FindingView } from '@tallyloom/core';
import { ApiError } from '@/lib/api-client';
import { findingKeys } from './keys';

/** After any write: the answer is the finding as it is now, and every list may have moved. */
export function storeSavedFinding(queryClient: QueryClient, finding: FindingView) {
  queryClient.setQueryData(findingKeys.detail(finding.id), finding);
  return queryClient.invalidateQueries({ queryKey: findingKeys.lists() });
}

/** The finding as it is now, when a change was refused because someone changed it first. */
export function conflictingFinding(error: unknown): FindingView | undefined {
  if (!(error instanceof ApiError) || error.statusCode !== 409) return undefined;
  const { current } = error.body as { current?: FindingView };
  return current && typeof current.version === 'number' ? current : undefined;
}
