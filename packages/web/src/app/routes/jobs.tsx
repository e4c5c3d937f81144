import { PageHeader } from '@/components/ui/page-header';
import { JobsOverview } from '@/features/jobs/components/jobs-overview';

export function JobsRoute() {
  return (
    <>
      <PageHeader
        title="Jobs"
        description="The background work: snapshot rebuilds and reminders, what runs now, and what failed."
      />
      <JobsOverview />
    </>
  );
}
