import { monthLabel } from '@tallyloom/core';
import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useTally } from '@/features/tallies/api';
import { TallyReview } from '@/features/tally-review/components/tally-review';
import { parseTallyId } from '@/features/tally-review/tally-id';

function backLink() {
  return <RouterLink to={paths.tallyReview.getHref()}>Review queue</RouterLink>;
}

function ReviewPage({ id }: { id: number }) {
  const tally = useTally(id);

  if (tally.isPending) {
    return (
      <>
        <PageHeader title="Review a tally" description={backLink()} />
        <LoadingState label="Loading the tally…" />
      </>
    );
  }
  if (tally.isError) {
    return (
      <>
        <PageHeader title="Review a tally" description={backLink()} />
        <ErrorState
          title="The tally could not be loaded"
          error={tally.error}
          onRetry={() => void tally.refetch()}
          retrying={tally.isFetching}
        />
      </>
    );
  }
  return (
    <>
      <PageHeader
        title={`${tally.data.chapterName}, ${monthLabel(tally.data.month)}`}
        description={
          <>
            {tally.data.regionName} · {backLink()}
          </>
        }
      />
      <TallyReview tally={tally.data} />
    </>
  );
}

/** One tally as a reviewer reads it, with Approve and Return. Loaded on demand, with its charts. */
export function TallyReviewItemRoute() {
  const id = parseTallyId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Review a tally" description={backLink()} />
        <ErrorState title="No such tally" error={new Error('The address names no tally.')} />
      </>
    );
  }
  return <ReviewPage id={id} />;
}
