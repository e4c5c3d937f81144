import type { FindingLink, FindingLinkKind, FindingSeverity, FindingStatus } from '@tallyloom/core';
import { paths } from '@/config/paths';

export const severityLabels: Record<FindingSeverity, string> = {
  low: 'Low',
  medium: 'Medium',
  high: 'High',
};

export const statusLabels: Record<FindingStatus, string> = {
  open: 'Open',
  responded: 'Responded',
  closed: 'Closed',
};

export const linkKindLabels: Record<FindingLinkKind, string> = {
  trace: 'Trace',
  sample: 'Audit sample',
  sample_item: 'Sample item',
  tally: 'Monthly tally',
  receipt: 'Parcel',
};

/** How to type each kind's reference, shown as the field's hint. */
export const linkReferenceHints: Record<FindingLinkKind, string> = {
  trace: "A trace reference, e.g. 'region:3:2026-Q1' or 'chapter:12:2025-07'.",
  sample: 'The audit sample number, e.g. 12.',
  sample_item: "The sample and the item, e.g. '12:345'.",
  tally: 'The monthly tally number.',
  receipt: 'The parcel number.',
};

/** Where a link leads in the app; a sample item opens its sample's worksheet. */
export function linkHref(link: FindingLink): string {
  switch (link.kind) {
    case 'trace':
      return paths.trace.getHref(link.reference);
    case 'sample':
      return paths.sample.getHref(Number(link.reference));
    case 'sample_item':
      return paths.sample.getHref(Number(link.reference.split(':')[0]));
    case 'tally':
      return paths.tally.getHref(Number(link.reference));
    case 'receipt':
      return paths.receipt.getHref(Number(link.reference));
  }
}

/** "Trace region:3:2026-Q1", "Sample item 12:345": the link's words. */
export function linkText(link: FindingLink): string {
  return `${linkKindLabels[link.kind]} ${link.reference}`;
}
