import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { Add20Regular, Grid20Regular } from '@fluentui/react-icons';
import type { BlanketSizeView } from '@tallyloom/core';
import { useMemo, useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useBlanketSizes } from '../api/get-blanket-sizes';
import { useUpdateBlanketSize } from '../api/update-blanket-size';
import { BlanketSizeDialog } from './blanket-size-dialog';
import { BlanketSizesTable, type BlanketSizeActions } from './blanket-sizes-table';

const headingId = 'blanket-sizes-heading';

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalS,
  },
  heading: { marginBottom: 0 },
});

/** The blanket size catalogue, retired sizes included, with Add, Edit and (de)activation. */
export function BlanketSizesPanel() {
  const styles = useStyles();
  const sizes = useBlanketSizes({ includeInactive: true });
  const update = useUpdateBlanketSize();
  const notify = useNotify();
  const [editing, setEditing] = useState<{ row?: BlanketSizeView } | null>(null);
  const [deactivating, setDeactivating] = useState<BlanketSizeView | null>(null);

  const actions = useMemo<BlanketSizeActions>(
    () => ({
      onEdit: (row) => setEditing({ row }),
      onDeactivate: setDeactivating,
      onReactivate: (size) =>
        update.mutate(
          { id: size.id, changes: { active: true } },
          {
            onSuccess: () => notify(`${size.name} is offered again.`),
            onError: (error) => notify(error.message, 'error'),
          },
        ),
    }),
    // `mutate` is stable across renders; the whole mutation object is not.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [update.mutate, notify],
  );

  const deactivate = (size: BlanketSizeView) =>
    update.mutate(
      { id: size.id, changes: { active: false } },
      {
        onSuccess: () => {
          notify(`${size.name} is deactivated.`);
          setDeactivating(null);
        },
      },
    );

  let body;
  if (sizes.isPending) body = <LoadingState label="Loading blanket sizes…" />;
  else if (sizes.isError)
    body = (
      <ErrorState
        title="Blanket sizes could not be loaded"
        error={sizes.error}
        onRetry={() => void sizes.refetch()}
        retrying={sizes.isFetching}
        headingLevel={3}
      />
    );
  else if (sizes.data.length === 0)
    body = (
      <EmptyState title="No blanket sizes yet" icon={<Grid20Regular />} headingLevel={3}>
        Add the sizes chapters sew with “Add size”: each is a grid of panels across and down.
      </EmptyState>
    );
  else body = <BlanketSizesTable sizes={sizes.data} labelledBy={headingId} actions={actions} />;

  return (
    <section aria-labelledby={headingId}>
      <div className={styles.toolbar}>
        <SectionHeading id={headingId} className={styles.heading}>
          Blanket sizes
        </SectionHeading>
        <Button icon={<Add20Regular />} onClick={() => setEditing({})}>
          Add size
        </Button>
      </div>
      {body}
      <BlanketSizeDialog
        open={editing !== null}
        size={editing?.row}
        onClose={() => setEditing(null)}
      />
      <ConfirmDialog
        open={deactivating !== null}
        title={`Deactivate ${deactivating?.name ?? 'this size'}?`}
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
        Chapters will no longer be offered this size for new blankets. Blankets already recorded in
        it keep it, and you can reactivate it at any time.
      </ConfirmDialog>
    </section>
  );
}
