import type { TallyDetail } from '@tallyloom/core';
import type { TallyNames } from './tally-fields';

/** The size and agency names a tally's lines refer to, from the detail the server sent. */
export function tallyNamesOf(tally: Pick<TallyDetail, 'checkContext' | 'agencies'>): TallyNames {
  return {
    blanketSizes: Object.fromEntries(
      tally.checkContext.blanketSizes.map((size) => [size.id, size.name]),
    ),
    agencies: Object.fromEntries(tally.agencies.map((agency) => [agency.id, agency.name])),
  };
}
