import { useParams } from 'react-router-dom';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { useChapters } from '@/features/network/api/get-chapters';
import { useReceipt } from '@/features/receipts/api/get-receipt';
import { EditReceipt } from '@/features/receipts/components/edit-receipt';
import { parseReceiptId } from '@/features/receipts/receipt-id';
import { ReceiptFormReferences } from '@/features/receipts/components/receipt-form-references';
import { formatDate } from '@/lib/format';

/** Correct a logged parcel. Loaded on demand. */
export function ReceiptEditRoute() {
  const id = parseReceiptId(useParams().id);
  if (id === undefined) {
    return (
      <>
        <PageHeader title="Correct a parcel" />
        <ErrorState title="No such parcel" error={new Error('The address names no parcel.')} />
      </>
    );
  }
  return <EditPage id={id} />;
}

function EditPage({ id }: { id: number }) {
  const receipt = useReceipt(id);
  const chapters = useChapters();

  if (receipt.isPending) {
    return (
      <>
        <PageHeader title="Correct a parcel" />
        <LoadingState label="Loading the parcel…" />
      </>
    );
  }
  if (receipt.isError) {
    return (
      <>
        <PageHeader title="Correct a parcel" />
        <ErrorState
          title="The parcel could not be loaded"
          error={receipt.error}
          onRetry={() => void receipt.refetch()}
          retrying={receipt.isFetching}
        />
      </>
    );
  }
  return (
    <>
      <PageHeader
        title="Correct a parcel"
        description={`Received by ${receipt.data.chapterName} on ${formatDate(receipt.data.receivedOn)}.`}
      />
      <ReceiptFormReferences
        chapters={chapters.data}
        chaptersError={chapters.error}
        onRetryChapters={() => void chapters.refetch()}
        receipt={receipt.data}
      >
        {({ sizes, toleranceIn }) => (
          <EditReceipt
            receipt={receipt.data}
            chapters={chapters.data ?? []}
            sizes={sizes}
            toleranceIn={toleranceIn}
          />
        )}
      </ReceiptFormReferences>
    </>
  );
}
