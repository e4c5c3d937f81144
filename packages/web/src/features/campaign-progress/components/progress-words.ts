import type { CampaignProgressView } from '@tallyloom/core';
import { formatCount, formatDate, formatFigure } from '@/lib/format';

/** 0.325 → "32.5%". */
export function formatShare(share: number): string {
  return `${formatFigure(Math.round(share * 1000) / 10)}%`;
}

/** 385.71… → "385.7": paces are read to one decimal. */
export function formatPace(perWeek: number): string {
  return formatFigure(Math.round(perWeek * 10) / 10);
}

/** The pace still needed, or why there is none. */
export function neededWords(
  progress: Pick<CampaignProgressView, 'neededPerWeek' | 'creditedPanels' | 'goalPanels'>,
): string {
  if (progress.creditedPanels >= progress.goalPanels) return 'Goal met';
  if (progress.neededPerWeek === null) return 'The campaign has ended';
  return `${formatPace(progress.neededPerWeek)} panels a week`;
}

/** The projection and how it was made, in a sentence. */
export function projectionWords(
  progress: Pick<CampaignProgressView, 'projection' | 'endsOn' | 'goalPanels'>,
): string {
  const { method, panelsAtEnd, goalMetOn } = progress.projection;
  const atEnd = `About ${formatCount(panelsAtEnd)} panels by ${formatDate(progress.endsOn)}`;
  const goal = goalMetOn
    ? `the goal of ${formatCount(progress.goalPanels)} met on ${formatDate(goalMetOn)}`
    : `the goal of ${formatCount(progress.goalPanels)} not met within the campaign`;
  return `${atEnd}, ${goal}. Method: ${method}.`;
}
