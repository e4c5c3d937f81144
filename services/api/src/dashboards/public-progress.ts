import type { CampaignProgressView, PublicCampaignProgress } from '@tallyloom/core';

/**
 * The public page's fields, listed one by one so that a field added to the full view later is
 * not published by accident: counts only, nothing about people, chapters or senders.
 */
export function toPublicProgress(view: CampaignProgressView): PublicCampaignProgress {
  return {
    code: view.code,
    name: view.name,
    goalPanels: view.goalPanels,
    startsOn: view.startsOn,
    endsOn: view.endsOn,
    creditedPanels: view.creditedPanels,
    shareDone: view.shareDone,
    weeksLeft: view.weeksLeft,
    pacePerWeek: view.pacePerWeek,
    neededPerWeek: view.neededPerWeek,
    weekly: view.weekly.map(({ weekStart, panels, cumulative }) => ({
      weekStart,
      panels,
      cumulative,
    })),
    asOf: view.asOf,
  };
}
