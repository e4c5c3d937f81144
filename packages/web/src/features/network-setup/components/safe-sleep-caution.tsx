import { MessageBar, MessageBarBody, MessageBarTitle } from '@fluentui/react-components';
import type { AgencyKind } from '@tallyloom/core';

/** Agencies that may receive baby blankets for infants (BRIEF §8). */
const INFANT_KINDS: ReadonlySet<AgencyKind> = new Set([
  'neonatal_or_childrens_ward',
  'family_shelter',
]);

export function needsSafeSleepCaution(kind: AgencyKind | ''): boolean {
  return kind !== '' && INFANT_KINDS.has(kind);
}

/** The safe-sleep reminder for agencies that care for infants; calm, not an error. */
export function SafeSleepCaution() {
  return (
    <MessageBar intent="info" layout="multiline">
      <MessageBarBody>
        <MessageBarTitle>Baby blankets and safe sleep</MessageBarTitle>
        Safe-sleep guidance is that a sleeping infant has no loose blankets in the cot. Baby
        blankets given here are used as the agency’s own rules say; defer to them.
      </MessageBarBody>
    </MessageBar>
  );
}
