import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { TallyPage } from '@/features/tallies/components/tally-page';
import { parseTallyId } from '@/features/tally-review/tally-id';

/** One monthly tally: the form with its live checks, or its figures once submitted. */
export function TallyRoute() {
  const id = parseTallyId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Monthly tally" />
        <ErrorState title="No such tally" error={new Error('The address names no tally.')} />
      </>
    );
  }
  return <TallyPage id={id} />;
}
