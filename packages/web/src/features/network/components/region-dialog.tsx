import { Dialog, DialogSurface, Field, Input } from '@fluentui/react-components';
import type { RegionView } from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { DialogForm } from '@/components/ui/dialog-form';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { useCreateRegion } from '../api/create-region';
import { useUpdateRegion } from '../api/update-region';

type RegionField = 'name' | 'code';

const regionFields: RegionField[] = ['name', 'code'];

/** The code as the server stores it: trimmed and upper-case, 1 to 8 letters or digits. */
export function regionCodeOf(typed: string): string {
  return typed.trim().toUpperCase();
}

function regionProblems(name: string, code: string): Partial<Record<RegionField, string>> {
  const problems: Partial<Record<RegionField, string>> = {};
  if (!name.trim()) problems.name = 'Enter the region’s name.';
  if (!/^[A-Z0-9]{1,8}$/.test(regionCodeOf(code)))
    problems.code = 'Enter 1 to 8 letters A–Z or digits, e.g. NR.';
  return problems;
}

function RegionForm({ region, onDone }: { region: RegionView | undefined; onDone: () => void }) {
  const create = useCreateRegion();
  const update = useUpdateRegion();
  const save = region ? update : create;
  const notify = useNotify();
  const [name, setName] = useState(region?.name ?? '');
  const [code, setCode] = useState(region?.code ?? '');
  const [submitted, setSubmitted] = useState(false);

  const local = regionProblems(name, code);
  const server = save.isError
    ? formProblems<RegionField>(save.error, regionFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<RegionField>(local, server.fields, submitted);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean)) return;
    const request = { name: name.trim(), code: regionCodeOf(code) };
    const done = (saved: RegionView) => {
      notify(region ? `Changes to ${saved.name} saved.` : `Region ${saved.name} added.`);
      onDone();
    };
    if (region) update.mutate({ id: region.id, changes: request }, { onSuccess: done });
    else create.mutate(request, { onSuccess: done });
  };

  return (
    <DialogForm
      title={region ? `Edit ${region.name}` : 'Add a region'}
      intro="The code is short and unique; exports and links use it."
      problems={server.general}
      submitLabel={region ? 'Save changes' : 'Add region'}
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
      <Field
        label="Code"
        required
        hint="1 to 8 letters or digits, e.g. NR."
        validationMessage={shown.code}
      >
        <Input
          name="code"
          autoComplete="off"
          maxLength={8}
          value={code}
          onChange={(_event, data) => setCode(data.value.toUpperCase())}
        />
      </Field>
    </DialogForm>
  );
}

export interface RegionDialogProps {
  open: boolean;
  /** The region to edit; left out to add one. */
  region?: RegionView;
  onClose: () => void;
}

export function RegionDialog({ open, region, onClose }: RegionDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>{open ? <RegionForm region={region} onDone={onClose} /> : null}</DialogSurface>
    </Dialog>
  );
}
