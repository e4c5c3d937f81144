import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useFinding } from '@/features/findings/api/get-finding';
import { FindingDetail } from '@/features/findings/components/finding-detail';
import { parseRouteId } from '@/lib/route-id';

function backLink() {
  return <RouterLink to={paths.findings.getHref()}>All findings</RouterLink>;
}

function FindingPage({ id }: { id: number }) {
  const finding = useFinding(id);
  if (finding.isPending) {
    return (
      <>
        <PageHeader title="Finding" description={backLink()} />
        <LoadingState label="Loading the finding…" />
      </>
    );
  }
  if (finding.isError) {
    return (
      <>
        <PageHeader title="Finding" description={backLink()} />
        <ErrorState
          title="The finding could not be loaded"
          error={finding.error}
          onRetry={() => void finding.refetch()}
          retrying={finding.isFetching}
        />
      </>
    );
  }
  return (
    <>
      <PageHeader title={finding.data.title} description={backLink()} />
      <FindingDetail finding={finding.data} />
    </>
  );
}

/** One finding: its text, links, responses, and the actions the person may take. */
export function FindingRoute() {
  const id = parseRouteId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Finding" description={backLink()} />
        <ErrorState title="No such finding" error={new Error('The address names no finding.')} />
      </>
    );
  }
  return <FindingPage id={id} />;
}
