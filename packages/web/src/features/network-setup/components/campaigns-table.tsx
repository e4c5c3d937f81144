import { Edit20Regular } from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import type { CampaignView } from '@tallyloom/core';
import { useMemo } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';
import { RowActions } from '@/components/ui/row-actions';
import { formatDate } from '@/lib/format';
import { campaignState, CampaignStateBadge } from './campaign-state';

const column = createColumnHelper<CampaignView>();

/** "1 Nov 2025 – 28 Feb 2026". */
export function formatCampaignDates(campaign: Pick<CampaignView, 'startsOn' | 'endsOn'>): string {
  return `${formatDate(campaign.startsOn)} – ${formatDate(campaign.endsOn)}`;
}

export interface CampaignsTableProps {
  campaigns: CampaignView[];
  labelledBy: string;
  /** Adds an Actions column with "Edit…"; left out where the list is read-only. */
  onEdit?: (campaign: CampaignView) => void;
}

export function CampaignsTable({ campaigns, labelledBy, onEdit }: CampaignsTableProps) {
  const columns = useMemo(() => {
    const today = new Date();
    return [
      column.accessor('code', { header: 'Code' }),
      column.accessor('name', { header: 'Name' }),
      column.accessor('goalPanels', {
        header: 'Goal (panels)',
        cell: (info) => <NumberCell value={info.getValue()} />,
        meta: { numeric: true },
      }),
      // ISO dates sort as text; the cell shows the days a person reads.
      column.accessor('startsOn', {
        header: 'Dates',
        cell: (info) => formatCampaignDates(info.row.original),
      }),
      column.accessor((campaign) => campaign.regionName ?? 'Whole network', {
        id: 'region',
        header: 'Region',
      }),
      column.accessor((campaign) => campaignState(campaign, today), {
        id: 'state',
        header: 'State',
        cell: (info) => <CampaignStateBadge state={info.getValue()} />,
      }),
      ...(onEdit
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: (info) => (
                <RowActions
                  name={info.row.original.code}
                  actions={[
                    {
                      label: 'Edit…',
                      icon: <Edit20Regular />,
                      onClick: () => onEdit(info.row.original),
                    },
                  ]}
                />
              ),
            }),
          ]
        : []),
    ];
  }, [onEdit]);

  return (
    <DataTable
      data={campaigns}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(campaign) => String(campaign.id)}
      initialSorting={[{ id: 'startsOn', desc: true }]}
    />
  );
}
