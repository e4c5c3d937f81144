import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { NewFindingButton } from '@/features/findings/components/new-finding-button';
import { SampleWorksheet } from '@/features/audit-sampling/components/sample-worksheet';
import { parseRouteId } from '@/lib/route-id';

function backLink() {
  return <RouterLink to={paths.samples.getHref()}>All samples</RouterLink>;
}

/** One sample's worksheet. Loaded on demand. */
export function SampleRoute() {
  const id = parseRouteId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Sample worksheet" description={backLink()} />
        <ErrorState title="No such sample" error={new Error('The address names no sample.')} />
      </>
    );
  }
  return (
    <>
      <PageHeader
        title={`Sample #${id} worksheet`}
        description={backLink()}
        actions={
          <NewFindingButton
            link={{ kind: 'sample', reference: String(id) }}
            onCreated={() => undefined}
          />
        }
      />
      <SampleWorksheet id={id} />
    </>
  );
}
