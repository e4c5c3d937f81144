import { Button, Field, Input, makeStyles, tokens } from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
  },
  text: { width: '200px' },
  short: { width: '140px' },
  date: { width: '160px' },
  buttons: { display: 'flex', gap: tokens.spacingHorizontalS },
});

export interface AuditLogFilterValues {
  /** An actor's e-mail (or part of it) or user id. */
  who: string;
  /** An action or its start, e.g. 'tally.'. */
  what: string;
  entityType: string;
  entityId: string;
  /** YYYY-MM-DD, on or after. */
  from: string;
  /** YYYY-MM-DD, on or before. */
  to: string;
}

export const noAuditLogFilters: AuditLogFilterValues = {
  who: '',
  what: '',
  entityType: '',
  entityId: '',
  from: '',
  to: '',
};

export function isFiltered(values: AuditLogFilterValues): boolean {
  return Object.values(values).some((value) => value !== '');
}

export interface AuditLogFiltersProps {
  values: AuditLogFilterValues;
  onChange: (values: AuditLogFilterValues) => void;
}

/**
 * Who, what, entity and when. Text filters apply on "Apply" (or Enter), not on every key, so a
 * half-typed address does not send a request per letter; dates apply at once.
 */
export function AuditLogFilters({ values, onChange }: AuditLogFiltersProps) {
  const styles = useStyles();
  // The list remounts this form when the URL's filters change (back button, "Clear filters").
  const [draft, setDraft] = useState(values);

  const set = (field: keyof AuditLogFilterValues, value: string) =>
    setDraft((current) => ({ ...current, [field]: value }));
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onChange(trimmed(draft));
  };
  const setDate = (field: 'from' | 'to', value: string) => {
    const next = { ...draft, [field]: value };
    setDraft(next);
    onChange(trimmed(next));
  };

  return (
    <form className={styles.root} role="search" aria-label="Filter the audit log" onSubmit={submit}>
      <Field label="Who" hint="E-mail or user id">
        <Input
          className={styles.text}
          value={draft.who}
          maxLength={254}
          onChange={(_, data) => set('who', data.value)}
        />
      </Field>
      <Field label="What" hint="Action, or its start">
        <Input
          className={styles.text}
          value={draft.what}
          maxLength={64}
          placeholder="tally."
          onChange={(_, data) => set('what', data.value)}
        />
      </Field>
      <Field label="Entity type">
        <Input
          className={styles.short}
          value={draft.entityType}
          maxLength={64}
          placeholder="monthly_tally"
          onChange={(_, data) => set('entityType', data.value)}
        />
      </Field>
      <Field label="Entity id">
        <Input
          className={styles.short}
          value={draft.entityId}
          maxLength={64}
          onChange={(_, data) => set('entityId', data.value)}
        />
      </Field>
      <Field label="From">
        <Input
          className={styles.date}
          type="date"
          value={draft.from}
          onChange={(_, data) => setDate('from', data.value)}
        />
      </Field>
      <Field label="To">
        <Input
          className={styles.date}
          type="date"
          value={draft.to}
          onChange={(_, data) => setDate('to', data.value)}
        />
      </Field>
      <div className={styles.buttons}>
        <Button type="submit" appearance="primary">
          Apply
        </Button>
        <Button
          type="button"
          disabled={!isFiltered(values) && !isFiltered(draft)}
          onClick={() => onChange(noAuditLogFilters)}
        >
          Clear
        </Button>
      </div>
    </form>
  );
}

function trimmed(values: AuditLogFilterValues): AuditLogFilterValues {
  return {
    who: values.who.trim(),
    what: values.what.trim(),
    entityType: values.entityType.trim(),
    entityId: values.entityId.trim(),
    from: values.from,
    to: values.to,
  };
}
