import { Add20Regular, TableArrowUp20Regular } from '@fluentui/react-icons';
import { can, type ReceiptListParams } from '@tallyloom/core';
import { useMemo } from 'react';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { ExportMenu } from '@/features/exports/components/export-menu';
import { useChapters } from '@/features/network/api/get-chapters';
import { useRegions } from '@/features/network/api/get-regions';
import { useCampaigns } from '@/features/receipts/api/get-campaigns';
import type { ReceiptFilterOptions } from '@/features/receipts/components/receipt-filters';
import {
  defaultReceiptOrder,
  ReceiptsList,
  type ReceiptsQuery,
} from '@/features/receipts/components/receipts-list';
import { useQueryInUrl } from '@/hooks/use-query-in-url';
import { useSessionUser } from '@/lib/session/use-session';

const isoDate = /^\d{4}-\d{2}-\d{2}$/;

function idParam(value: string | null): number | undefined {
  if (!value || !/^\d+$/.test(value)) return undefined;
  const id = Number(value);
  return id > 0 ? id : undefined;
}

function dateParam(value: string | null): string {
  return value && isoDate.test(value) ? value : '';
}

/** The list's page, filters and order live in the URL, so a view can be bookmarked or shared. */
function parseQuery(params: URLSearchParams): ReceiptsQuery {
  const page = Number(params.get('page'));
  const sort = params.get('sort');
  const direction = params.get('direction');
  return {
    page: Number.isInteger(page) && page > 0 ? page : 1,
    from: dateParam(params.get('from')),
    to: dateParam(params.get('to')),
    regionId: idParam(params.get('region')),
    chapterId: idParam(params.get('chapter')),
    campaignId: idParam(params.get('campaign')),
    hasScan: params.get('hasScan') === 'true',
    sort:
      sort === 'receivedOn' || sort === 'chapterName' || sort === 'panelsAccepted'
        ? sort
        : defaultReceiptOrder.sort,
    direction:
      direction === 'asc' || direction === 'desc' ? direction : defaultReceiptOrder.direction,
  };
}

/** What the list shows, every page of it: the filters and order the list asks the server for. */
function exportFilters(query: ReceiptsQuery): ReceiptListParams {
  return {
    from: query.from || undefined,
    to: query.to || undefined,
    regionId: query.regionId,
    chapterId: query.chapterId,
    campaignId: query.campaignId,
    hasScan: query.hasScan ? true : undefined,
    sort: query.sort,
    direction: query.direction,
  };
}

function toSearchParams(query: ReceiptsQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (query.page > 1) params.set('page', String(query.page));
  if (query.from) params.set('from', query.from);
  if (query.to) params.set('to', query.to);
  if (query.regionId) params.set('region', String(query.regionId));
  if (query.chapterId) params.set('chapter', String(query.chapterId));
  if (query.campaignId) params.set('campaign', String(query.campaignId));
  if (query.hasScan) params.set('hasScan', 'true');
  if (
    query.sort !== defaultReceiptOrder.sort ||
    query.direction !== defaultReceiptOrder.direction
  ) {
    params.set('sort', query.sort);
    params.set('direction', query.direction);
  }
  return params;
}

/** Parcels received across the person's scope. Loaded on demand. */
export function ReceiptsRoute() {
  const [query, changeQuery] = useQueryInUrl(parseQuery, toSearchParams);
  const user = useSessionUser();
  const regions = useRegions();
  const chapters = useChapters();
  const campaigns = useCampaigns();
  const mayLog = can(user?.role, 'receipts.write');

  const filterOptions = useMemo<ReceiptFilterOptions>(
    () => ({
      regions: regions.data ?? [],
      chapters: chapters.data ?? [],
      campaigns: campaigns.data ?? [],
    }),
    [regions.data, chapters.data, campaigns.data],
  );

  const exportMenu = (
    <ExportMenu target={{ table: 'receipts', filters: exportFilters(query) }} what="parcels" />
  );
  const logButton = (
    <>
      {exportMenu}
      <LinkButton to={paths.receiptImport.getHref()} icon={<TableArrowUp20Regular />}>
        Import a sheet
      </LinkButton>
      <LinkButton to={paths.receiptNew.getHref()} appearance="primary" icon={<Add20Regular />}>
        Log a parcel
      </LinkButton>
    </>
  );

  return (
    <>
      <PageHeader
        title="Parcels"
        description="Every parcel of panels and finished items logged by the chapters you can see."
        actions={mayLog ? logButton : exportMenu}
      />
      <ReceiptsList
        query={query}
        onQueryChange={changeQuery}
        filterOptions={filterOptions}
        firstParcelAction={
          mayLog ? (
            <LinkButton to={paths.receiptNew.getHref()} icon={<Add20Regular />}>
              Log the first parcel
            </LinkButton>
          ) : undefined
        }
      />
    </>
  );
}
