import { ArrowUndo20Regular, Edit20Regular, SubtractCircle20Regular } from '@fluentui/react-icons';
import { createColumnHelper } from '@tanstack/react-table';
import { AGENCY_KIND_LABELS, type PartnerAgencyView } from '@tallyloom/core';
import { useMemo } from 'react';
import { ActiveBadge } from '@/components/ui/active-badge';
import { DataTable } from '@/components/ui/data-table';
import { RowActions } from '@/components/ui/row-actions';

export interface AgencyActions {
  onEdit: (agency: PartnerAgencyView) => void;
  onDeactivate: (agency: PartnerAgencyView) => void;
  onReactivate: (agency: PartnerAgencyView) => void;
}

const column = createColumnHelper<PartnerAgencyView>();

export interface AgenciesTableProps {
  agencies: PartnerAgencyView[];
  labelledBy: string;
  /** Left out where the list is read-only. */
  actions?: AgencyActions;
}

export function AgenciesTable({ agencies, labelledBy, actions }: AgenciesTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Agency' }),
      column.accessor((agency) => AGENCY_KIND_LABELS[agency.kind], { id: 'kind', header: 'Kind' }),
      column.accessor((agency) => agency.chapters.map((chapter) => chapter.name).join(', '), {
        id: 'chapters',
        header: 'Served by',
      }),
      column.accessor('active', {
        header: 'Status',
        cell: (info) => <ActiveBadge active={info.getValue()} />,
      }),
      ...(actions
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: (info) => {
                const agency = info.row.original;
                return (
                  <RowActions
                    name={agency.name}
                    actions={[
                      {
                        label: 'Edit…',
                        icon: <Edit20Regular />,
                        onClick: () => actions.onEdit(agency),
                      },
                      agency.active
                        ? {
                            label: 'Deactivate…',
                            icon: <SubtractCircle20Regular />,
                            onClick: () => actions.onDeactivate(agency),
                          }
                        : {
                            label: 'Reactivate',
                            icon: <ArrowUndo20Regular />,
                            onClick: () => actions.onReactivate(agency),
                          },
                    ]}
                  />
                );
              },
            }),
          ]
        : []),
    ],
    [actions],
  );

  return (
    <DataTable
      data={agencies}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(agency) => String(agency.id)}
      initialSorting={[{ id: 'name', desc: false }]}
    />
  );
}
