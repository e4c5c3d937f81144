import { Badge, type BadgeProps } from '@fluentui/react-components';
import type { TallyState } from '@tallyloom/core';
import { tallyStateText } from './tally-labels';

const COLOR: Record<TallyState | 'none', BadgeProps['color']> = {
  none: 'subtle',
  draft: 'informative',
  submitted: 'brand',
  returned: 'warning',
  approved: 'success',
};

/** The tally's state in a word; the colour only repeats what the word says. */
export function TallyStateBadge({
  state,
  amendmentPending = false,
}: {
  state: TallyState | null;
  amendmentPending?: boolean;
}) {
  return (
    <Badge
      appearance="tint"
      shape="rounded"
      color={amendmentPending && state !== 'approved' ? 'important' : COLOR[state ?? 'none']}
    >
      {tallyStateText(state, amendmentPending)}
    </Badge>
  );
}
