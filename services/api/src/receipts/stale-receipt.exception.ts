import type { ParcelReceiptDetail } from '@tallyloom/core';
import { StaleVersionException } from '../common/filters/stale-version.filter';

/** A correction based on an older version: the 409 answer carries the receipt as it is now. */
export class StaleReceiptException extends StaleVersionException<ParcelReceiptDetail> {
  constructor(current: ParcelReceiptDetail) {
    super(
      `Someone changed this receipt since you opened it (it is now version ${current.version}). ` +
        'Review the current values and make your change again.',
      current,
    );
  }
}
