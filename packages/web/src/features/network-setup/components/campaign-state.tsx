import { Badge, type BadgeProps } from '@fluentui/react-components';
import {
  CalendarClock16Regular,
  CheckmarkCircle16Regular,
  PlayCircle16Regular,
} from '@fluentui/react-icons';
import type { CampaignView } from '@tallyloom/core';
import { isAfter, isBefore, parseISO, startOfDay } from 'date-fns';
import type { ReactElement } from 'react';

export type CampaignState = 'upcoming' | 'running' | 'ended';

/**
 * Where a campaign stands on `today`: both its first and last day count as running. Dates are
 * read as local days, so the state turns over at the reader's midnight.
 */
export function campaignState(
  campaign: Pick<CampaignView, 'startsOn' | 'endsOn'>,
  today: Date = new Date(),
): CampaignState {
  const day = startOfDay(today);
  if (isBefore(day, parseISO(campaign.startsOn))) return 'upcoming';
  if (isAfter(day, parseISO(campaign.endsOn))) return 'ended';
  return 'running';
}

const looks: Record<
  CampaignState,
  { label: string; color: BadgeProps['color']; icon: ReactElement }
> = {
  upcoming: { label: 'Upcoming', color: 'informative', icon: <CalendarClock16Regular /> },
  running: { label: 'Running', color: 'success', icon: <PlayCircle16Regular /> },
  ended: { label: 'Ended', color: 'subtle', icon: <CheckmarkCircle16Regular /> },
};

/** The state in words with an icon, so it never rests on colour alone. */
export function CampaignStateBadge({ state }: { state: CampaignState }) {
  const { label, color, icon } = looks[state];
  return (
    <Badge appearance="tint" color={color} icon={icon}>
      {label}
    </Badge>
  );
}
