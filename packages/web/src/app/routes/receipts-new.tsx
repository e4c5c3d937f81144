import { PageHeader } from '@/components/ui/page-header';
import { useChapters } from '@/features/network/api/get-chapters';
import { NewReceipt } from '@/features/receipts/components/new-receipt';
import { ReceiptFormReferences } from '@/features/receipts/components/receipt-form-references';

/** Log a parcel as it arrives. Loaded on demand. */
export function ReceiptNewRoute() {
  const chapters = useChapters();
  return (
    <>
      <PageHeader
        title="Log a parcel"
        description="What arrived, when, and what was accepted or set aside."
      />
      <ReceiptFormReferences
        chapters={chapters.data}
        chaptersError={chapters.error}
        onRetryChapters={() => void chapters.refetch()}
      >
        {({ sizes, toleranceIn }) => (
          <NewReceipt chapters={chapters.data ?? []} sizes={sizes} toleranceIn={toleranceIn} />
        )}
      </ReceiptFormReferences>
    </>
  );
}
