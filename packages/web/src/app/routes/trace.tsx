import { PageHeader } from '@/components/ui/page-header';

/** Placeholder: being built. */
export function TraceRoute() {
  return <PageHeader title="Trace a figure" />;
}
