import { Dialog, DialogSurface } from '@fluentui/react-components';
import type { UserView } from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { useUpdateUser } from '../api/update-user';
import { DialogForm } from '@/components/ui/dialog-form';
import {
  PersonFields,
  personProblems,
  scopeOfDraft,
  type PersonDraft,
  type PersonField,
} from './person-fields';
import type { ScopeOptions } from './scope-options';

const personFields: PersonField[] = ['displayName', 'role', 'regionId', 'chapterId'];

function EditPersonForm({
  person,
  scopeOptions,
  onDone,
}: {
  person: UserView;
  scopeOptions: ScopeOptions;
  onDone: () => void;
}) {
  const update = useUpdateUser();
  const notify = useNotify();
  const [draft, setDraft] = useState<PersonDraft>({
    displayName: person.displayName,
    role: person.role,
    regionId: person.regionId,
    chapterId: person.chapterId,
  });
  const [submitted, setSubmitted] = useState(false);

  const local = personProblems(draft);
  const server = update.isError
    ? formProblems<PersonField>(update.error, personFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<PersonField>(local, server.fields, submitted);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean) || !draft.role) return;
    const displayName = draft.displayName.trim();
    update.mutate(
      {
        id: person.id,
        changes: { displayName, role: draft.role, ...scopeOfDraft({ ...draft, role: draft.role }) },
      },
      {
        onSuccess: () => {
          notify(`Changes to ${displayName} saved.`);
          onDone();
        },
      },
    );
  };

  return (
    <DialogForm
      title={`Edit ${person.displayName}`}
      intro={`Signs in as ${person.email}.`}
      problems={server.general}
      submitLabel="Save changes"
      pendingLabel="Saving…"
      pending={update.isPending}
      onSubmit={submit}
    >
      <PersonFields
        draft={draft}
        onChange={setDraft}
        problems={shown}
        scopeOptions={scopeOptions}
      />
    </DialogForm>
  );
}

export interface EditPersonDialogProps {
  /** The person being edited; null keeps the dialog closed. */
  person: UserView | null;
  scopeOptions: ScopeOptions;
  onClose: () => void;
}

export function EditPersonDialog({ person, scopeOptions, onClose }: EditPersonDialogProps) {
  return (
    <Dialog open={person !== null} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        {person ? (
          <EditPersonForm person={person} scopeOptions={scopeOptions} onDone={onClose} />
        ) : null}
      </DialogSurface>
    </Dialog>
  );
}
