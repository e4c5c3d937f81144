import type { ExportState, ExportView } from '@tallyloom/core';

/** While an export waits or runs, its state is asked for once a second. */
export const EXPORT_POLL_MS = 1_000;

export function isUnderWay(state: ExportState): boolean {
  return state === 'queued' || state === 'running';
}

/** TanStack's `refetchInterval`: poll while the export (or any export on the list) is under way. */
export function pollWhileUnderWay(views: ExportView[] | undefined): number | false {
  return views?.some((view) => isUnderWay(view.state)) ? EXPORT_POLL_MS : false;
}
