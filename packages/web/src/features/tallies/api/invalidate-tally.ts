import type { QueryClient } from '@tanstack/react-query';
import type { TallyDetail } from '@tallyloom/core';
import { tallyKeys } from './get-tallies';

/**
 * After any write. The answer is the tally as it is now, so it replaces the cached detail
 * outright (no second GET after every autosave); its revisions, the lists and the calendars that
 * show its state are fetched again.
 */
export function refreshAfterTallyWrite(queryClient: QueryClient, tally: TallyDetail) {
  queryClient.setQueryData(tallyKeys.detail(tally.id), tally);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: tallyKeys.revisions(tally.id) }),
    queryClient.invalidateQueries({ queryKey: tallyKeys.lists() }),
    queryClient.invalidateQueries({ queryKey: tallyKeys.calendars() }),
  ]);
}
