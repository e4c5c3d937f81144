import { Button } from '@fluentui/react-components';
import { Add20Regular } from '@fluentui/react-icons';
import type { PartnerAgencyView } from '@tallyloom/core';
import { useMemo, useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { useUpdateAgency } from '../api/update-agency';
import { AgenciesList } from './agencies-list';
import type { AgencyActions } from './agencies-table';
import { AgencyDialog } from './agency-dialog';
import type { NetworkOptions } from './network-options';

/** Partner agencies for network admins: Add, Edit, and deactivation after a confirmation. */
export function AgenciesPanel({ options }: { options: NetworkOptions }) {
  const update = useUpdateAgency();
  const notify = useNotify();
  const [editing, setEditing] = useState<{ row?: PartnerAgencyView } | null>(null);
  const [deactivating, setDeactivating] = useState<PartnerAgencyView | null>(null);

  const actions = useMemo<AgencyActions>(
    () => ({
      onEdit: (row) => setEditing({ row }),
      onDeactivate: setDeactivating,
      onReactivate: (agency) =>
        update.mutate(
          { id: agency.id, changes: { active: true } },
          {
            onSuccess: () => notify(`${agency.name} is active again.`),
            onError: (error) => notify(error.message, 'error'),
          },
        ),
    }),
    // `mutate` is stable across renders; the whole mutation object is not.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [update.mutate, notify],
  );

  const deactivate = (agency: PartnerAgencyView) =>
    update.mutate(
      { id: agency.id, changes: { active: false } },
      {
        onSuccess: () => {
          notify(`${agency.name} is deactivated.`);
          setDeactivating(null);
        },
      },
    );

  return (
    <>
      <AgenciesList
        actions={actions}
        headerAction={
          <Button icon={<Add20Regular />} onClick={() => setEditing({})}>
            Add agency
          </Button>
        }
        emptyHint="Add the shelters, wards, care homes and teams the chapters hand blankets to with “Add agency”."
      />
      <AgencyDialog
        open={editing !== null}
        agency={editing?.row}
        options={options}
        onClose={() => setEditing(null)}
      />
      <ConfirmDialog
        open={deactivating !== null}
        title={`Deactivate ${deactivating?.name ?? 'this agency'}?`}
        confirmLabel="Deactivate"
        pendingLabel="Deactivating…"
        cancelLabel="Keep active"
        pending={update.isPending}
        error={update.isError ? update.error.message : undefined}
        onConfirm={() => deactivating && deactivate(deactivating)}
        onClose={() => {
          update.reset();
          setDeactivating(null);
        }}
      >
        Chapters will no longer be offered this agency when they record blankets given out. What was
        given to it so far stays in the figures, and you can reactivate it at any time.
      </ConfirmDialog>
    </>
  );
}
