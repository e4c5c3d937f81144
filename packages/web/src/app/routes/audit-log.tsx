import { PageHeader } from '@/components/ui/page-header';

/** Placeholder: being built. */
export function AuditLogRoute() {
  return <PageHeader title="Audit log" />;
}
