import { previousPeriod, quarterOf, type Period } from '@tallyloom/core';
import { todayIsoDate } from '@/lib/format';

/** The last `count` calendar quarters, newest first, starting with the last complete one. */
export function recentQuarters(today = todayIsoDate(), count = 12): Period[] {
  // Quarters do not depend on the fiscal year's start month; 1 is a placeholder.
  let quarter = previousPeriod(quarterOf(today.slice(0, 7)), 1);
  const quarters: Period[] = [];
  for (let index = 0; index < count; index++) {
    quarters.push(quarter);
    quarter = previousPeriod(quarter, 1);
  }
  return quarters;
}
