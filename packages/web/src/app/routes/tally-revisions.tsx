import { can, monthLabel, type TallyDetail } from '@tallyloom/core';
import { useParams, useSearchParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useTally } from '@/features/tallies/api';
import { RevisionCompare } from '@/features/tally-review/components/revision-compare';
import { chooseRevisions } from '@/features/tally-review/components/revision-choice';
import { parseTallyId } from '@/features/tally-review/tally-id';
import { useSessionUser } from '@/lib/session/use-session';

function revisionParam(value: string | null): number | undefined {
  return value && /^[1-9]\d*$/.test(value) ? Number(value) : undefined;
}

/** Back to where a person came from: reviewers to the review page, everyone else to the tally. */
function BackLink({ id }: { id: number }) {
  const user = useSessionUser();
  return can(user?.role, 'tallies.review') ? (
    <RouterLink to={paths.tallyReviewItem.getHref(id)}>Back to the review</RouterLink>
  ) : (
    <RouterLink to={paths.tally.getHref(id)}>Back to the tally</RouterLink>
  );
}

function Compare({ tally }: { tally: TallyDetail }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const pair = chooseRevisions(tally, {
    left: revisionParam(searchParams.get('left')),
    right: revisionParam(searchParams.get('right')),
  });
  return (
    <>
      <PageHeader
        title={`Compare revisions: ${tally.chapterName}, ${monthLabel(tally.month)}`}
        description={<BackLink id={tally.id} />}
      />
      <RevisionCompare
        tally={tally}
        pair={pair}
        onPairChange={(next) =>
          setSearchParams({ left: String(next.left), right: String(next.right) }, { replace: true })
        }
      />
    </>
  );
}

function ComparePage({ id }: { id: number }) {
  const tally = useTally(id);
  if (tally.isPending) {
    return (
      <>
        <PageHeader title="Compare revisions" description={<BackLink id={id} />} />
        <LoadingState label="Loading the tally…" />
      </>
    );
  }
  if (tally.isError) {
    return (
      <>
        <PageHeader title="Compare revisions" description={<BackLink id={id} />} />
        <ErrorState
          title="The tally could not be loaded"
          error={tally.error}
          onRetry={() => void tally.refetch()}
          retrying={tally.isFetching}
        />
      </>
    );
  }
  return <Compare tally={tally.data} />;
}

/** Two revisions of a tally side by side (an amendment against what was approved). Loaded on demand. */
export function TallyRevisionsRoute() {
  const id = parseTallyId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Compare revisions" />
        <ErrorState title="No such tally" error={new Error('The address names no tally.')} />
      </>
    );
  }
  return <ComparePage id={id} />;
}
