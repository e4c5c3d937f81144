import { PageHeader } from '@/components/ui/page-header';
import { ImportWizard } from '@/features/receipt-import/components/import-wizard';

/** Many parcels at once from a chapter's spreadsheet. Loaded on demand. */
export function ReceiptImportRoute() {
  return (
    <>
      <PageHeader
        title="Import parcels"
        description="Bring in a chapter's parcels from a spreadsheet: every row is checked first, then all are imported together, or none."
      />
      <ImportWizard />
    </>
  );
}
