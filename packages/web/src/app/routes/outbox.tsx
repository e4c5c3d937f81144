import { PageHeader } from '@/components/ui/page-header';
import { OutboxView } from '@/features/outbox/components/outbox-view';

/** Loaded on demand: only admins open it, and only in development is there anything to see. */
export function OutboxRoute() {
  return (
    <>
      <PageHeader
        title="Dev outbox"
        description="E-mails the app has sent while running in development, caught before they leave."
      />
      <OutboxView />
    </>
  );
}
