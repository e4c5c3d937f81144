import { PageHeader } from '@/components/ui/page-header';
import { ExportsList } from '@/features/exports/components/exports-list';
import { useQueryInUrl } from '@/hooks/use-query-in-url';

function parsePage(params: URLSearchParams): number {
  const page = Number(params.get('page'));
  return Number.isInteger(page) && page > 0 ? page : 1;
}

function pageSearchParams(page: number): URLSearchParams {
  return new URLSearchParams(page > 1 ? { page: String(page) } : {});
}

/** The person's own exports and their download links. Loaded on demand. */
export function ExportsRoute() {
  const [page, changePage] = useQueryInUrl(parsePage, pageSearchParams);
  return (
    <>
      <PageHeader
        title="My exports"
        description="Spreadsheets you asked for: each is written in the background, and its download link works for a limited time."
      />
      <ExportsList page={page} onPageChange={changePage} />
    </>
  );
}
