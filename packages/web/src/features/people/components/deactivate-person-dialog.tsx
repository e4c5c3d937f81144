import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  Text,
} from '@fluentui/react-components';
import type { UserView } from '@tallyloom/core';
import { useNotify } from '@/components/ui/app-toaster';
import { FormAlert } from '@/components/ui/form-alert';
import { useUpdateUser } from '../api/update-user';

function DeactivateBody({ person, onDone }: { person: UserView; onDone: () => void }) {
  const update = useUpdateUser();
  const notify = useNotify();
  const confirm = () =>
    update.mutate(
      { id: person.id, changes: { active: false } },
      {
        onSuccess: () => {
          notify(`${person.displayName} is deactivated.`);
          onDone();
        },
      },
    );
  return (
    <DialogBody>
      <DialogTitle>Deactivate {person.displayName}?</DialogTitle>
      <DialogContent>
        <Text as="p">
          {person.displayName} ({person.email}) will no longer be able to sign in, and any session
          they have open is ended. Everything they filed stays as it is, and you can reactivate them
          at any time.
        </Text>
        <FormAlert messages={update.isError ? [update.error.message] : []} />
      </DialogContent>
      <DialogActions>
        <DialogTrigger disableButtonEnhancement>
          <Button>Keep active</Button>
        </DialogTrigger>
        <Button appearance="primary" disabledFocusable={update.isPending} onClick={confirm}>
          {update.isPending ? 'Deactivating…' : 'Deactivate'}
        </Button>
      </DialogActions>
    </DialogBody>
  );
}

export interface DeactivatePersonDialogProps {
  /** The person to deactivate; null keeps the dialog closed. */
  person: UserView | null;
  onClose: () => void;
}

/** Asks before deactivating, naming the person, so a slip of the menu costs nothing. */
export function DeactivatePersonDialog({ person, onClose }: DeactivatePersonDialogProps) {
  return (
    <Dialog
      modalType="alert"
      open={person !== null}
      onOpenChange={(_event, data) => !data.open && onClose()}
    >
      <DialogSurface>
        {person ? <DeactivateBody person={person} onDone={onClose} /> : null}
      </DialogSurface>
    </Dialog>
  );
}
