import type { SnapshotFigures } from '@tallyloom/core';
import { FactList } from '@/components/ui/fact-list';
import { formatCount } from '@/lib/format';

/** Stock at the end of the period: the closing stock of each chapter's last approved month. */
export function StockFacts({ figures }: { figures: SnapshotFigures }) {
  return (
    <FactList
      rows={[
        ['Panels in stock', formatCount(figures.panelsInStock)],
        ['Blankets in stock', formatCount(figures.blanketsInStock)],
        ['Panels set aside', formatCount(figures.panelsSetAside)],
        ['Approved tallies counted', formatCount(figures.approvedTallies)],
      ]}
    />
  );
}
