import { PageHeader } from '@/components/ui/page-header';

/** Placeholder: being built. */
export function FindingsRoute() {
  return <PageHeader title="Findings" />;
}
