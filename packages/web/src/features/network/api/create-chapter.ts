import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChapterView, SaveChapterRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { chapterKeys } from './get-chapters';
import { regionKeys } from './get-regions';

/** Adds a chapter to a region; the name is unique (409). */
export function createChapter(request: SaveChapterRequest): Promise<ChapterView> {
  return apiPost<ChapterView>('/chapters', request);
}

export function useCreateChapter() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createChapter,
    // Regions count their chapters.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: chapterKeys.all }),
        queryClient.invalidateQueries({ queryKey: regionKeys.all }),
      ]),
  });
}
