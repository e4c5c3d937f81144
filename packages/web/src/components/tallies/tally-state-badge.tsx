import { Badge, type BadgeProps } from '@fluentui/react-components';
import { TALLY_STATE_LABELS, type TallyState } from '@tallyloom/core';

/** "Draft", "Approved", or "Amendment in progress" while an approved tally is being changed. */
function tallyStateText(state: TallyState | null, amendmentPending = false): string {
  if (state === null) return 'Not started';
  if (amendmentPending && state !== 'approved') {
    return `Amendment in progress (${TALLY_STATE_LABELS[state].toLowerCase()})`;
  }
  return TALLY_STATE_LABELS[state];
}

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
