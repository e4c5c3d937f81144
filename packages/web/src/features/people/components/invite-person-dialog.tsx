import {
  Button,
  Dialog,
  DialogSurface,
  DialogTrigger,
  Field,
  Input,
} from '@fluentui/react-components';
import { PersonAdd20Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { useInviteUser } from '../api/invite-user';
import { DialogForm } from '@/components/ui/dialog-form';
import {
  PersonFields,
  personProblems,
  scopeOfDraft,
  type PersonDraft,
  type PersonField,
} from './person-fields';
import type { ScopeOptions } from './scope-options';

type InviteField = PersonField | 'email';

const inviteFields: InviteField[] = ['email', 'displayName', 'role', 'regionId', 'chapterId'];

const emptyDraft: PersonDraft = { displayName: '', role: '', regionId: null, chapterId: null };

function emailProblem(email: string): string | undefined {
  const address = email.trim();
  if (!address) return 'Enter their e-mail address.';
  if (!/^[^\s@]+@[^\s@]+$/.test(address)) return 'Enter an address like name@example.org.';
  return undefined;
}

function InvitePersonForm({
  scopeOptions,
  onDone,
}: {
  scopeOptions: ScopeOptions;
  onDone: () => void;
}) {
  const invite = useInviteUser();
  const notify = useNotify();
  const [email, setEmail] = useState('');
  const [draft, setDraft] = useState<PersonDraft>(emptyDraft);
  const [submitted, setSubmitted] = useState(false);

  const local = { ...personProblems(draft), email: emailProblem(email) };
  const server = invite.isError
    ? formProblems<InviteField>(invite.error, inviteFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<InviteField>(local, server.fields, submitted);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean) || !draft.role) return;
    const address = email.trim();
    invite.mutate(
      {
        email: address,
        displayName: draft.displayName.trim(),
        role: draft.role,
        ...scopeOfDraft({ ...draft, role: draft.role }),
      },
      {
        onSuccess: (person) => {
          notify(`Invitation sent to ${person.email}.`);
          onDone();
        },
      },
    );
  };

  return (
    <DialogForm
      title="Invite a person"
      intro="They get an e-mail with a link to choose a password, and can sign in from then on."
      problems={server.general}
      submitLabel="Send invitation"
      pendingLabel="Sending…"
      pending={invite.isPending}
      onSubmit={submit}
    >
      <Field label="E-mail" validationMessage={shown.email}>
        <Input
          type="email"
          name="email"
          autoComplete="off"
          value={email}
          onChange={(_event, data) => setEmail(data.value)}
        />
      </Field>
      <PersonFields
        draft={draft}
        onChange={setDraft}
        problems={shown}
        scopeOptions={scopeOptions}
      />
    </DialogForm>
  );
}

/** "Invite person": the button and its dialog. */
export function InvitePersonButton({ scopeOptions }: { scopeOptions: ScopeOptions }) {
  const [open, setOpen] = useState(false);
  return (
    <Dialog open={open} onOpenChange={(_event, data) => setOpen(data.open)}>
      <DialogTrigger disableButtonEnhancement>
        <Button appearance="primary" icon={<PersonAdd20Regular />}>
          Invite person
        </Button>
      </DialogTrigger>
      <DialogSurface>
        <InvitePersonForm scopeOptions={scopeOptions} onDone={() => setOpen(false)} />
      </DialogSurface>
    </Dialog>
  );
}
