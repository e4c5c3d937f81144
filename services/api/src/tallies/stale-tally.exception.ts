import type { TallyDetail } from '@tallyloom/core';
import { StaleVersionException } from '../common/filters/stale-version.filter';

/** A write based on an older version: the 409 answer carries the tally as it is now. */
export class StaleTallyException extends StaleVersionException<TallyDetail> {
  constructor(current: TallyDetail) {
    super(
      `Someone changed this tally since you opened it (it is now version ${current.version}). ` +
        'Review the current figures and make your change again.',
      current,
    );
  }
}
