import type { ChapterView, RegionView } from '@tallyloom/core';
import { useCallback, useMemo } from 'react';
import { useChapters } from '../api/get-chapters';
import { useRegions } from '../api/get-regions';

/** The network's regions and every chapter, with one status for both, for other pages' pickers. */
export interface NetworkLists {
  regions: RegionView[];
  chapters: ChapterView[];
  status: 'pending' | 'error' | 'success';
  error?: unknown;
  retry: () => void;
}

export function useNetworkLists(): NetworkLists {
  const regions = useRegions();
  const chapters = useChapters();
  const { refetch: refetchRegions } = regions;
  const { refetch: refetchChapters } = chapters;
  const retry = useCallback(() => {
    void refetchRegions();
    void refetchChapters();
  }, [refetchRegions, refetchChapters]);
  return useMemo(() => {
    const failed = regions.error ?? chapters.error;
    return {
      regions: regions.data ?? [],
      chapters: chapters.data ?? [],
      status: failed ? 'error' : regions.data && chapters.data ? 'success' : 'pending',
      error: failed ?? undefined,
      retry,
    };
  }, [regions.data, regions.error, chapters.data, chapters.error, retry]);
}
