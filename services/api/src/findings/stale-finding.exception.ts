import type { FindingView } from '@tallyloom/core';
import { StaleVersionException } from '../common/filters/stale-version.filter';

/** A change based on an older version: the 409 answer carries the finding as it is now. */
export class StaleFindingException extends StaleVersionException<FindingView> {
  constructor(current: FindingView) {
    super(
      `This finding changed since you opened it (it is now version ${current.version}). ` +
        'Read the current text and responses, then make your change again.',
      current,
    );
  }
}
