import { Dialog, DialogSurface } from '@fluentui/react-components';
import type { FindingView } from '@tallyloom/core';
import { useNotify } from '@/components/ui/app-toaster';
import { useUpdateFinding } from '../api/update-finding';
import { FindingForm } from './finding-form';

export interface EditFindingDialogProps {
  open: boolean;
  finding: FindingView;
  onClose: () => void;
}

/** The author's edit; a stale one shows the server's message above the form, with the new text. */
export function EditFindingDialog({ open, finding, onClose }: EditFindingDialogProps) {
  const update = useUpdateFinding();
  const notify = useNotify();
  const close = () => {
    update.reset();
    onClose();
  };
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && close()}>
      <DialogSurface>
        {open ? (
          <FindingForm
            // A new version (someone responded meanwhile) starts the form again from it.
            key={finding.version}
            finding={finding}
            pending={update.isPending}
            error={update.error}
            onSave={(draft) =>
              update.mutate(
                {
                  id: finding.id,
                  changes: {
                    version: finding.version,
                    title: draft.title,
                    body: draft.body,
                    severity: draft.severity,
                    addLinks: draft.links,
                  },
                },
                {
                  onSuccess: () => {
                    notify('Changes saved.');
                    close();
                  },
                },
              )
            }
          />
        ) : null}
      </DialogSurface>
    </Dialog>
  );
}
