import { Dialog, DialogSurface, Field, Input, Select } from '@fluentui/react-components';
import {
  AGENCY_KIND_LABELS,
  AGENCY_KINDS,
  type AgencyKind,
  type PartnerAgencyView,
} from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { DialogForm } from '@/components/ui/dialog-form';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { useCreateAgency } from '../api/create-agency';
import { useUpdateAgency } from '../api/update-agency';
import { ChapterChecklist } from './chapter-checklist';
import type { NetworkOptions } from './network-options';
import { needsSafeSleepCaution, SafeSleepCaution } from './safe-sleep-caution';

type AgencyField = 'name' | 'kind' | 'chapterIds';

const agencyFields: AgencyField[] = ['name', 'kind', 'chapterIds'];

function isAgencyKind(value: string): value is AgencyKind {
  return (AGENCY_KINDS as readonly string[]).includes(value);
}

function AgencyForm({
  agency,
  options,
  onDone,
}: {
  agency: PartnerAgencyView | undefined;
  options: NetworkOptions;
  onDone: () => void;
}) {
  const create = useCreateAgency();
  const update = useUpdateAgency();
  const save = agency ? update : create;
  const notify = useNotify();
  const [name, setName] = useState(agency?.name ?? '');
  const [kind, setKind] = useState<AgencyKind | ''>(agency?.kind ?? '');
  const [chapterIds, setChapterIds] = useState<number[]>(
    agency?.chapters.map((chapter) => chapter.id) ?? [],
  );
  const [submitted, setSubmitted] = useState(false);

  const local: Partial<Record<AgencyField, string>> = {
    name: name.trim() ? undefined : 'Enter the agency’s name.',
    kind: kind ? undefined : 'Choose the kind of agency.',
    chapterIds: chapterIds.length ? undefined : 'Choose at least one chapter.',
  };
  const server = save.isError
    ? formProblems<AgencyField>(save.error, agencyFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<AgencyField>(local, server.fields, submitted);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean) || !kind) return;
    const request = { name: name.trim(), kind, chapterIds: [...chapterIds].sort((a, b) => a - b) };
    const done = (saved: PartnerAgencyView) => {
      notify(agency ? `Changes to ${saved.name} saved.` : `${saved.name} added.`);
      onDone();
    };
    if (agency) update.mutate({ id: agency.id, changes: request }, { onSuccess: done });
    else create.mutate(request, { onSuccess: done });
  };

  return (
    <DialogForm
      title={agency ? `Edit ${agency.name}` : 'Add a partner agency'}
      intro="An organisation that receives blankets from one or more chapters."
      problems={server.general}
      submitLabel={agency ? 'Save changes' : 'Add agency'}
      pendingLabel="Saving…"
      pending={save.isPending}
      onSubmit={submit}
    >
      <Field label="Name" required validationMessage={shown.name}>
        <Input
          name="name"
          autoComplete="off"
          value={name}
          onChange={(_event, data) => setName(data.value)}
        />
      </Field>
      <Field label="Kind" required validationMessage={shown.kind}>
        <Select
          name="kind"
          value={kind}
          onChange={(_event, data) => setKind(isAgencyKind(data.value) ? data.value : '')}
        >
          <option value="">Choose a kind</option>
          {AGENCY_KINDS.map((candidate) => (
            <option key={candidate} value={candidate}>
              {AGENCY_KIND_LABELS[candidate]}
            </option>
          ))}
        </Select>
      </Field>
      {needsSafeSleepCaution(kind) ? <SafeSleepCaution /> : null}
      <ChapterChecklist
        value={chapterIds}
        onChange={setChapterIds}
        options={options}
        validationMessage={shown.chapterIds}
      />
    </DialogForm>
  );
}

export interface AgencyDialogProps {
  open: boolean;
  /** The agency to edit; left out to add one. */
  agency?: PartnerAgencyView;
  options: NetworkOptions;
  onClose: () => void;
}

export function AgencyDialog({ open, agency, options, onClose }: AgencyDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        {open ? <AgencyForm agency={agency} options={options} onDone={onClose} /> : null}
      </DialogSurface>
    </Dialog>
  );
}
