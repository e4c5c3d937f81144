import { Button, Field, Input, makeStyles, Select, tokens } from '@fluentui/react-components';
import { Save20Regular } from '@fluentui/react-icons';
import { inchesToCm, type NetworkSettings } from '@tallyloom/core';
import { format } from 'date-fns';
import { useState, type FormEvent } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { ErrorState } from '@/components/ui/error-state';
import { FormAlert } from '@/components/ui/form-alert';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { parseDecimal, parseWholeNumber } from '@/lib/form-values';
import { useSettings } from '../api/get-settings';
import { useUpdateSettings } from '../api/update-settings';

type SettingsField = keyof NetworkSettings;

const settingsFields: SettingsField[] = [
  'fiscalYearStartMonth',
  'panelToleranceIn',
  'receiptCountCeiling',
  'servedPerBlanketWarnFactor',
  'reminderDaysBeforeDue',
  'reminderDaysAfterDue',
];

const headingId = 'settings-heading';

const TOLERANCE = { min: 0, max: 3, decimals: 2 };
const MAX_CEILING = 1_000_000;
const SERVED_FACTOR = { min: 1, max: 100, decimals: 1 };
const MAX_REMINDER_DAYS = 28;

/** 1 → "January" … 12 → "December". */
const MONTHS = Array.from({ length: 12 }, (_, index) => ({
  value: index + 1,
  name: format(new Date(2000, index, 1), 'MMMM'),
}));

const centimetres = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

const useStyles = makeStyles({
  form: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    maxWidth: '440px',
  },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

interface SettingsDraft {
  fiscalYearStartMonth: string;
  panelToleranceIn: string;
  receiptCountCeiling: string;
  servedPerBlanketWarnFactor: string;
  reminderDaysBeforeDue: string;
  reminderDaysAfterDue: string;
}

function settingsProblems(draft: SettingsDraft): Partial<Record<SettingsField, string>> {
  const problems: Partial<Record<SettingsField, string>> = {};
  if (parseWholeNumber(draft.fiscalYearStartMonth, 1, 12) === undefined)
    problems.fiscalYearStartMonth = 'Choose the month the fiscal year starts.';
  if (parseDecimal(draft.panelToleranceIn, TOLERANCE) === undefined)
    problems.panelToleranceIn = 'Enter inches from 0 to 3, with at most 2 decimals.';
  if (parseWholeNumber(draft.receiptCountCeiling, 1, MAX_CEILING) === undefined)
    problems.receiptCountCeiling = 'Enter a whole number from 1 to 1,000,000.';
  if (parseDecimal(draft.servedPerBlanketWarnFactor, SERVED_FACTOR) === undefined)
    problems.servedPerBlanketWarnFactor = 'Enter a number from 1 to 100, with at most 1 decimal.';
  if (parseWholeNumber(draft.reminderDaysBeforeDue, 1, MAX_REMINDER_DAYS) === undefined)
    problems.reminderDaysBeforeDue = 'Enter a whole number of days from 1 to 28.';
  if (parseWholeNumber(draft.reminderDaysAfterDue, 1, MAX_REMINDER_DAYS) === undefined)
    problems.reminderDaysAfterDue = 'Enter a whole number of days from 1 to 28.';
  return problems;
}

function toleranceHint(typed: string): string {
  const inches = parseDecimal(typed, TOLERANCE);
  const base = 'How far a measured panel may be from 7 × 9 in and still be accepted.';
  return inches === undefined
    ? base
    : `${base} ${typed.trim()} in = ${centimetres.format(inchesToCm(inches))} cm.`;
}

function SettingsFormFields({ settings }: { settings: NetworkSettings }) {
  const styles = useStyles();
  const save = useUpdateSettings();
  const notify = useNotify();
  const [draft, setDraft] = useState<SettingsDraft>({
    fiscalYearStartMonth: String(settings.fiscalYearStartMonth),
    panelToleranceIn: String(settings.panelToleranceIn),
    receiptCountCeiling: String(settings.receiptCountCeiling),
    servedPerBlanketWarnFactor: String(settings.servedPerBlanketWarnFactor),
    reminderDaysBeforeDue: String(settings.reminderDaysBeforeDue),
    reminderDaysAfterDue: String(settings.reminderDaysAfterDue),
  });
  const [submitted, setSubmitted] = useState(false);
  const change = (changes: Partial<SettingsDraft>) => setDraft({ ...draft, ...changes });

  const local = settingsProblems(draft);
  const server = save.isError
    ? formProblems<SettingsField>(save.error, settingsFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<SettingsField>(local, server.fields, submitted);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(true);
    if (Object.values(local).some(Boolean)) return;
    save.mutate(
      {
        fiscalYearStartMonth: Number(draft.fiscalYearStartMonth),
        panelToleranceIn: Number(draft.panelToleranceIn.trim()),
        receiptCountCeiling: Number(draft.receiptCountCeiling.trim()),
        servedPerBlanketWarnFactor: Number(draft.servedPerBlanketWarnFactor.trim()),
        reminderDaysBeforeDue: Number(draft.reminderDaysBeforeDue.trim()),
        reminderDaysAfterDue: Number(draft.reminderDaysAfterDue.trim()),
      },
      { onSuccess: () => notify('Settings saved.') },
    );
  };

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-labelledby={headingId}>
      <FormAlert messages={server.general} />
      <Field
        label="Fiscal year starts in"
        hint="Quarters and fiscal-year reports count from this month."
        validationMessage={shown.fiscalYearStartMonth}
      >
        <Select
          name="fiscalYearStartMonth"
          value={draft.fiscalYearStartMonth}
          onChange={(_event, data) => change({ fiscalYearStartMonth: data.value })}
        >
          {MONTHS.map((month) => (
            <option key={month.value} value={month.value}>
              {month.name}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Panel size tolerance (in)"
        hint={toleranceHint(draft.panelToleranceIn)}
        validationMessage={shown.panelToleranceIn}
      >
        <Input
          name="panelToleranceIn"
          inputMode="decimal"
          autoComplete="off"
          contentAfter="in"
          value={draft.panelToleranceIn}
          onChange={(_event, data) => change({ panelToleranceIn: data.value })}
        />
      </Field>
      <Field
        label="Receipt count ceiling"
        hint="A count above this on one parcel receipt is refused as implausible."
        validationMessage={shown.receiptCountCeiling}
      >
        <Input
          name="receiptCountCeiling"
          type="number"
          min={1}
          max={MAX_CEILING}
          step={1}
          value={draft.receiptCountCeiling}
          onChange={(_event, data) => change({ receiptCountCeiling: data.value })}
        />
      </Field>
      <Field
        label="People served per blanket, warn above"
        hint="A monthly tally warns when people served exceed the blankets given out × this number."
        validationMessage={shown.servedPerBlanketWarnFactor}
      >
        <Input
          name="servedPerBlanketWarnFactor"
          inputMode="decimal"
          autoComplete="off"
          value={draft.servedPerBlanketWarnFactor}
          onChange={(_event, data) => change({ servedPerBlanketWarnFactor: data.value })}
        />
      </Field>
      <Field
        label="Remind before the due day (days)"
        hint="Chapter leads whose monthly tally is not yet submitted get an e-mail this many days before it is due."
        validationMessage={shown.reminderDaysBeforeDue}
      >
        <Input
          name="reminderDaysBeforeDue"
          type="number"
          min={1}
          max={MAX_REMINDER_DAYS}
          step={1}
          value={draft.reminderDaysBeforeDue}
          onChange={(_event, data) => change({ reminderDaysBeforeDue: data.value })}
        />
      </Field>
      <Field
        label="Remind after the due day (days)"
        hint="… and another this many days after, if it is still missing."
        validationMessage={shown.reminderDaysAfterDue}
      >
        <Input
          name="reminderDaysAfterDue"
          type="number"
          min={1}
          max={MAX_REMINDER_DAYS}
          step={1}
          value={draft.reminderDaysAfterDue}
          onChange={(_event, data) => change({ reminderDaysAfterDue: data.value })}
        />
      </Field>
      <div className={styles.actions}>
        <Button
          type="submit"
          appearance="primary"
          icon={<Save20Regular />}
          disabledFocusable={save.isPending}
        >
          {save.isPending ? 'Saving…' : 'Save settings'}
        </Button>
      </div>
    </form>
  );
}

/** The network-wide settings, read whole and saved whole. */
export function SettingsForm() {
  const settings = useSettings();

  let body;
  if (settings.isPending) body = <LoadingState label="Loading settings…" />;
  else if (settings.isError)
    body = (
      <ErrorState
        title="Settings could not be loaded"
        error={settings.error}
        onRetry={() => void settings.refetch()}
        retrying={settings.isFetching}
        headingLevel={3}
      />
    );
  else body = <SettingsFormFields settings={settings.data} />;

  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Settings</SectionHeading>
      {body}
    </section>
  );
}
