import { Dialog, DialogSurface, Field, Input, Select } from '@fluentui/react-components';
import type { CampaignView, RegionView, SaveCampaignRequest } from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { DialogForm } from '@/components/ui/dialog-form';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { parseWholeNumber } from '@/lib/form-values';
import { useCreateCampaign } from '../api/create-campaign';
import { useUpdateCampaign } from '../api/update-campaign';

type CampaignField = 'code' | 'name' | 'goalPanels' | 'startsOn' | 'endsOn' | 'regionId';

const campaignFields: CampaignField[] = [
  'code',
  'name',
  'goalPanels',
  'startsOn',
  'endsOn',
  'regionId',
];

interface CampaignDraft {
  code: string;
  name: string;
  goalPanels: string;
  startsOn: string;
  endsOn: string;
  regionId: string;
}

const MAX_GOAL = 10_000_000;
const isoDate = /^\d{4}-\d{2}-\d{2}$/;

function campaignProblems(draft: CampaignDraft): Partial<Record<CampaignField, string>> {
  const problems: Partial<Record<CampaignField, string>> = {};
  if (!/^[A-Z0-9-]{2,24}$/.test(draft.code.trim()))
    problems.code = 'Enter 2 to 24 letters A–Z, digits or hyphens, e.g. DWD26.';
  if (!draft.name.trim()) problems.name = 'Enter the campaign’s name.';
  if (parseWholeNumber(draft.goalPanels, 1, MAX_GOAL) === undefined)
    problems.goalPanels = 'Enter the number of panels asked for, from 1 to 10,000,000.';
  if (!isoDate.test(draft.startsOn)) problems.startsOn = 'Enter the first day.';
  if (!isoDate.test(draft.endsOn)) problems.endsOn = 'Enter the last day.';
  else if (isoDate.test(draft.startsOn) && draft.endsOn < draft.startsOn)
    problems.endsOn = 'The last day cannot come before the first.';
  return problems;
}

function requestOf(draft: CampaignDraft): SaveCampaignRequest {
  return {
    code: draft.code.trim(),
    name: draft.name.trim(),
    goalPanels: Number(draft.goalPanels.trim()),
    startsOn: draft.startsOn,
    endsOn: draft.endsOn,
    regionId: draft.regionId ? Number(draft.regionId) : null,
  };
}

function CampaignForm({
  campaign,
  regions,
  onDone,
}: {
  campaign: CampaignView | undefined;
  regions: RegionView[];
  onDone: () => void;
}) {
  const create = useCreateCampaign();
  const update = useUpdateCampaign();
  const save = campaign ? update : create;
  const notify = useNotify();
  const [draft, setDraft] = useState<CampaignDraft>({
    code: campaign?.code ?? '',
    name: campaign?.name ?? '',
    goalPanels: campaign ? String(campaign.goalPanels) : '',
    startsOn: campaign?.startsOn ?? '',
    endsOn: campaign?.endsOn ?? '',
    regionId: campaign?.regionId ? String(campaign.regionId) : '',
  });
  const [submitted, setSubmitted] = useState(false);
  const change = (changes: Partial<CampaignDraft>) => setDraft({ ...draft, ...changes });

  const local = campaignProblems(draft);
  const server = save.isError
    ? formProblems<CampaignField>(save.error, campaignFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<CampaignField>(local, server.fields, submitted);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean)) return;
    const request = requestOf(draft);
    const done = (saved: CampaignView) => {
      notify(campaign ? `Changes to ${saved.code} saved.` : `Campaign ${saved.code} added.`);
      onDone();
    };
    if (campaign) update.mutate({ id: campaign.id, changes: request }, { onSuccess: done });
    else create.mutate(request, { onSuccess: done });
  };

  return (
    <DialogForm
      title={campaign ? `Edit ${campaign.code}` : 'Add a campaign'}
      intro="Senders write the code on the parcel label, so the panels are credited to the drive."
      problems={server.general}
      submitLabel={campaign ? 'Save changes' : 'Add campaign'}
      pendingLabel="Saving…"
      pending={save.isPending}
      onSubmit={submit}
    >
      <Field
        label="Code"
        required
        hint="As written on labels: letters, digits or hyphens, e.g. DWD26."
        validationMessage={shown.code}
      >
        <Input
          name="code"
          autoComplete="off"
          maxLength={24}
          value={draft.code}
          onChange={(_event, data) => change({ code: data.value.toUpperCase() })}
        />
      </Field>
      <Field label="Name" required validationMessage={shown.name}>
        <Input
          name="name"
          autoComplete="off"
          value={draft.name}
          onChange={(_event, data) => change({ name: data.value })}
        />
      </Field>
      <Field label="Goal (panels)" required validationMessage={shown.goalPanels}>
        <Input
          name="goalPanels"
          type="number"
          min={1}
          step={1}
          value={draft.goalPanels}
          onChange={(_event, data) => change({ goalPanels: data.value })}
        />
      </Field>
      <Field label="First day" required validationMessage={shown.startsOn}>
        <Input
          name="startsOn"
          type="date"
          value={draft.startsOn}
          onChange={(_event, data) => change({ startsOn: data.value })}
        />
      </Field>
      <Field label="Last day" required validationMessage={shown.endsOn}>
        <Input
          name="endsOn"
          type="date"
          min={draft.startsOn || undefined}
          value={draft.endsOn}
          onChange={(_event, data) => change({ endsOn: data.value })}
        />
      </Field>
      <Field
        label="Region"
        hint="Only that region’s chapters credit a regional drive."
        validationMessage={shown.regionId}
      >
        <Select
          name="regionId"
          value={draft.regionId}
          onChange={(_event, data) => change({ regionId: data.value })}
        >
          <option value="">Whole network</option>
          {regions.map((region) => (
            <option key={region.id} value={region.id}>
              {region.name}
            </option>
          ))}
        </Select>
      </Field>
    </DialogForm>
  );
}

export interface CampaignDialogProps {
  open: boolean;
  /** The campaign to edit; left out to add one. */
  campaign?: CampaignView;
  regions: RegionView[];
  onClose: () => void;
}

export function CampaignDialog({ open, campaign, regions, onClose }: CampaignDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        {open ? <CampaignForm campaign={campaign} regions={regions} onDone={onClose} /> : null}
      </DialogSurface>
    </Dialog>
  );
}
