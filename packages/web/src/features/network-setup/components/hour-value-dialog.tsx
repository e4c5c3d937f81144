import {
  Dialog,
  DialogSurface,
  Field,
  Input,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { SaveVolunteerHourValueRequest, VolunteerHourValueView } from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { DialogForm } from '@/components/ui/dialog-form';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { parseDecimal, parseWholeNumber } from '@/lib/form-values';
import { useCreateVolunteerHourValue } from '../api/create-volunteer-hour-value';
import { useUpdateVolunteerHourValue } from '../api/update-volunteer-hour-value';

type HourValueField = 'dataYear' | 'hourlyValue' | 'currency' | 'source';

const hourValueFields: HourValueField[] = ['dataYear', 'hourlyValue', 'currency', 'source'];

const HOURLY = { min: 0.01, max: 1000, decimals: 2 };

const useStyles = makeStyles({
  row: { display: 'grid', gridTemplateColumns: '1fr 1fr 1fr', gap: tokens.spacingHorizontalM },
});

interface HourValueDraft {
  dataYear: string;
  hourlyValue: string;
  currency: string;
  source: string;
}

function hourValueProblems(draft: HourValueDraft): Partial<Record<HourValueField, string>> {
  const problems: Partial<Record<HourValueField, string>> = {};
  if (parseWholeNumber(draft.dataYear, 1990, 2100) === undefined)
    problems.dataYear = 'Enter the year the figure is for.';
  if (parseDecimal(draft.hourlyValue, HOURLY) === undefined)
    problems.hourlyValue = 'Enter more than 0 and at most 1,000, with at most 2 decimals.';
  if (!/^[A-Z]{3}$/.test(draft.currency.trim())) problems.currency = 'Enter a code such as USD.';
  if (!draft.source.trim()) problems.source = 'Name the publication the figure comes from.';
  else if (draft.source.trim().length > 255) problems.source = 'Keep it to 255 characters.';
  return problems;
}

function HourValueForm({
  value,
  onDone,
}: {
  value: VolunteerHourValueView | undefined;
  onDone: () => void;
}) {
  const styles = useStyles();
  const create = useCreateVolunteerHourValue();
  const update = useUpdateVolunteerHourValue();
  const save = value ? update : create;
  const notify = useNotify();
  const [draft, setDraft] = useState<HourValueDraft>({
    dataYear: value ? String(value.dataYear) : '',
    hourlyValue: value ? value.hourlyValue.toFixed(2) : '',
    currency: value?.currency ?? 'USD',
    source: value?.source ?? '',
  });
  const [submitted, setSubmitted] = useState(false);
  const change = (changes: Partial<HourValueDraft>) => setDraft({ ...draft, ...changes });

  const local = hourValueProblems(draft);
  const server = save.isError
    ? formProblems<HourValueField>(save.error, hourValueFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<HourValueField>(local, server.fields, submitted);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean)) return;
    const request: SaveVolunteerHourValueRequest = {
      dataYear: Number(draft.dataYear.trim()),
      hourlyValue: Number(draft.hourlyValue.trim()),
      currency: draft.currency.trim(),
      source: draft.source.trim(),
    };
    const done = (saved: VolunteerHourValueView) => {
      notify(
        value ? `The ${saved.dataYear} value is saved.` : `A value for ${saved.dataYear} is added.`,
      );
      onDone();
    };
    if (value) update.mutate({ id: value.id, changes: request }, { onSuccess: done });
    else create.mutate(request, { onSuccess: done });
  };

  return (
    <DialogForm
      title={value ? `Edit the ${value.dataYear} value` : 'Add a volunteer hour value'}
      intro="The estimated value of one volunteer hour for a data year, as a published source gives it."
      problems={server.general}
      submitLabel={value ? 'Save changes' : 'Add value'}
      pendingLabel="Saving…"
      pending={save.isPending}
      onSubmit={submit}
    >
      <div className={styles.row}>
        <Field label="Data year" required validationMessage={shown.dataYear}>
          <Input
            name="dataYear"
            type="number"
            min={1990}
            max={2100}
            step={1}
            value={draft.dataYear}
            onChange={(_event, data) => change({ dataYear: data.value })}
          />
        </Field>
        <Field label="Hourly value" required validationMessage={shown.hourlyValue}>
          <Input
            name="hourlyValue"
            inputMode="decimal"
            autoComplete="off"
            value={draft.hourlyValue}
            onChange={(_event, data) => change({ hourlyValue: data.value })}
          />
        </Field>
        <Field label="Currency" required validationMessage={shown.currency}>
          <Input
            name="currency"
            autoComplete="off"
            maxLength={3}
            value={draft.currency}
            onChange={(_event, data) => change({ currency: data.value.toUpperCase() })}
          />
        </Field>
      </div>
      <Field
        label="Published source"
        required
        hint="The publication, with its edition or data year, so a funder can look it up."
        validationMessage={shown.source}
      >
        <Input
          name="source"
          autoComplete="off"
          value={draft.source}
          onChange={(_event, data) => change({ source: data.value })}
        />
      </Field>
    </DialogForm>
  );
}

export interface HourValueDialogProps {
  open: boolean;
  /** The value to edit; left out to add one. */
  value?: VolunteerHourValueView;
  onClose: () => void;
}

export function HourValueDialog({ open, value, onClose }: HourValueDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        {open ? <HourValueForm value={value} onDone={onClose} /> : null}
      </DialogSurface>
    </Dialog>
  );
}
