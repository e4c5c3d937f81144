import { Edit20Regular } from '@fluentui/react-icons';
import { can } from '@tallyloom/core';
import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { LinkButton } from '@/components/ui/link-button';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { useReceipt } from '@/features/receipts/api/get-receipt';
import { ReceiptDetail } from '@/features/receipts/components/receipt-detail';
import { parseReceiptId } from '@/features/receipts/receipt-id';
import { formatDate } from '@/lib/format';
import { useSessionUser } from '@/lib/session/use-session';

function backLink() {
  return <RouterLink to={paths.receipts.getHref()}>All parcels</RouterLink>;
}

function ReceiptPage({ id }: { id: number }) {
  const receipt = useReceipt(id);
  const user = useSessionUser();

  if (receipt.isPending) {
    return (
      <>
        <PageHeader title="Parcel" description={backLink()} />
        <LoadingState label="Loading the parcel…" />
      </>
    );
  }
  if (receipt.isError) {
    return (
      <>
        <PageHeader title="Parcel" description={backLink()} />
        <ErrorState
          title="The parcel could not be loaded"
          error={receipt.error}
          onRetry={() => void receipt.refetch()}
          retrying={receipt.isFetching}
        />
      </>
    );
  }

  const mayChange = can(user?.role, 'receipts.write');
  return (
    <>
      <PageHeader
        title={`Parcel received ${formatDate(receipt.data.receivedOn)}`}
        description={
          <>
            {receipt.data.chapterName} · {backLink()}
          </>
        }
        actions={
          mayChange ? (
            <LinkButton to={paths.receiptEdit.getHref(id)} icon={<Edit20Regular />}>
              Correct
            </LinkButton>
          ) : undefined
        }
      />
      <ReceiptDetail
        receipt={receipt.data}
        mayChange={mayChange}
        mayReadSenders={can(user?.role, 'senders.read')}
        mayEraseSender={can(user?.role, 'senders.erase')}
      />
    </>
  );
}

/** One parcel: figures, sender, scans and history. Loaded on demand. */
export function ReceiptDetailRoute() {
  const id = parseReceiptId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Parcel" description={backLink()} />
        <ErrorState title="No such parcel" error={new Error('The address names no parcel.')} />
      </>
    );
  }
  return <ReceiptPage id={id} />;
}
