import type { ChapterView, RegionView } from '@tallyloom/core';

/**
 * The regions and chapters the dialogs offer, handed in by the page (the network's own lists),
 * so this feature does not fetch another feature's data itself.
 */
export interface NetworkOptions {
  regions: RegionView[];
  chapters: ChapterView[];
  status: 'pending' | 'error' | 'success';
  error?: unknown;
  retry?: () => void;
}
