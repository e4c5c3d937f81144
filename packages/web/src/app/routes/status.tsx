import { PageHeader } from '@/components/ui/page-header';
import { HealthOverview } from '@/features/system/components/health-overview';

export function StatusRoute() {
  return (
    <>
      <PageHeader
        title="System status"
        description="Whether the database and the job queue answer, and which version is running."
      />
      <HealthOverview />
    </>
  );
}
