import { PageHeader } from '@/components/ui/page-header';

/** Placeholder: being built. */
export function SampleRoute() {
  return <PageHeader title="Sample worksheet" />;
}
