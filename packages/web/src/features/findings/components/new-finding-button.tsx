import { Button, Dialog, DialogSurface, type ButtonProps } from '@fluentui/react-components';
import { DocumentAdd20Regular } from '@fluentui/react-icons';
import { can, type FindingLink, type FindingView } from '@tallyloom/core';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useNotify } from '@/components/ui/app-toaster';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/lib/session/use-session';
import { useCreateFinding } from '../api/create-finding';
import { FindingForm } from './finding-form';

export interface NewFindingDialogProps {
  open: boolean;
  /** Links the finding starts with, e.g. the trace or sample the person is looking at. */
  links?: FindingLink[];
  onClose: () => void;
  onCreated: (finding: FindingView) => void;
}

export function NewFindingDialog({ open, links = [], onClose, onCreated }: NewFindingDialogProps) {
  const create = useCreateFinding();
  const close = () => {
    // The next opening starts without the last attempt's errors.
    create.reset();
    onClose();
  };
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && close()}>
      <DialogSurface>
        {open ? (
          <FindingForm
            initialLinks={links}
            pending={create.isPending}
            error={create.error}
            onSave={(draft) =>
              create.mutate(
                {
                  title: draft.title,
                  body: draft.body,
                  severity: draft.severity,
                  links: draft.links,
                },
                { onSuccess: onCreated },
              )
            }
          />
        ) : null}
      </DialogSurface>
    </Dialog>
  );
}

export interface NewFindingButtonProps {
  /** One link to start with: `{ kind: 'trace', reference }` or `{ kind: 'sample', reference: String(id) }`. */
  link?: FindingLink;
  /** Several links to start with (added after `link`). */
  links?: FindingLink[];
  /** The button's words; "New finding" unless given. */
  label?: string;
  appearance?: ButtonProps['appearance'];
  /**
   * What to do once it is saved. Without it the app opens the new finding; with it the person
   * stays where they are (a toast says it was recorded).
   */
  onCreated?: (finding: FindingView) => void;
}

/**
 * "New finding", for the auditor only: renders nothing for anyone else, so any screen can drop it
 * in: `<NewFindingButton link={{ kind: 'trace', reference }} />`.
 */
export function NewFindingButton({
  link,
  links = [],
  label = 'New finding',
  appearance = 'secondary',
  onCreated,
}: NewFindingButtonProps) {
  const user = useSessionUser();
  const navigate = useNavigate();
  const notify = useNotify();
  const [open, setOpen] = useState(false);
  if (!can(user?.role, 'findings.write')) return null;

  const created = (finding: FindingView) => {
    setOpen(false);
    if (onCreated) {
      notify(`Finding “${finding.title}” recorded.`);
      onCreated(finding);
    } else {
      void navigate(paths.finding.getHref(finding.id));
    }
  };
  return (
    <>
      <Button appearance={appearance} icon={<DocumentAdd20Regular />} onClick={() => setOpen(true)}>
        {label}
      </Button>
      <NewFindingDialog
        open={open}
        links={link ? [link, ...links] : links}
        onClose={() => setOpen(false)}
        onCreated={created}
      />
    </>
  );
}
