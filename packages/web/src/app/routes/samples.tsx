import { PageHeader } from '@/components/ui/page-header';

/** Placeholder: being built. */
export function SamplesRoute() {
  return <PageHeader title="Audit samples" />;
}
