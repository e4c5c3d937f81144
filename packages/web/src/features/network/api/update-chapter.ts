import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChapterView, SaveChapterRequest } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { chapterKeys } from './get-chapters';
import { regionKeys } from './get-regions';

export interface UpdateChapterInput {
  id: number;
  /** Only the fields sent change; `activeTo: null` reopens a closed chapter. */
  changes: Partial<SaveChapterRequest>;
}

export function updateChapter({ id, changes }: UpdateChapterInput): Promise<ChapterView> {
  return apiPatch<ChapterView>(`/chapters/${id}`, changes);
}

export function useUpdateChapter() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateChapter,
    // A chapter moved to another region changes both regions' counts.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: chapterKeys.all }),
        queryClient.invalidateQueries({ queryKey: regionKeys.all }),
      ]),
  });
}
