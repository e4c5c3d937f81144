import { PageHeader } from '@/components/ui/page-header';

/** Placeholder: being built. */
export function FindingRoute() {
  return <PageHeader title="Finding" />;
}
