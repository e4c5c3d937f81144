import { Field, Input, Radio, RadioGroup, Textarea } from '@fluentui/react-components';
import {
  FINDING_BODY_MAX,
  FINDING_SEVERITIES,
  FINDING_TITLE_MAX,
  type FindingLink,
  type FindingSeverity,
  type FindingView,
} from '@tallyloom/core';
import { useState } from 'react';
import { DialogForm } from '@/components/ui/dialog-form';
import { ApiError } from '@/lib/api-client';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { LinkEditor } from './link-editor';
import { severityLabels } from './labels';

type FindingField = 'title' | 'body' | 'severity';
const findingFields: FindingField[] = ['title', 'body', 'severity'];

/** What the form holds; `links` are the ones this save adds. */
export interface FindingDraft {
  title: string;
  body: string;
  severity: FindingSeverity;
  links: FindingLink[];
}

function localProblems(draft: FindingDraft): Partial<Record<FindingField, string>> {
  const problems: Partial<Record<FindingField, string>> = {};
  if (!draft.title.trim()) problems.title = 'Give the finding a short title.';
  if (!draft.body.trim()) problems.body = 'Say what you found and where.';
  return problems;
}

/** The server names a bad link `links.2.reference` (or `addLinks.…`): one message for the list. */
function linkProblem(error: unknown): string | undefined {
  if (!(error instanceof ApiError)) return undefined;
  const problem = error.fields?.find((p) => /^(links|addLinks)\b/.test(p.field));
  return problem?.messages.join(' ');
}

export interface FindingFormProps {
  /** The finding being edited; left out for a new one. */
  finding?: FindingView;
  initialLinks?: FindingLink[];
  pending: boolean;
  error: unknown;
  onSave: (draft: FindingDraft) => void;
}

/** Title, text, severity and links: the body of the new-finding and edit dialogs. */
export function FindingForm({
  finding,
  initialLinks = [],
  pending,
  error,
  onSave,
}: FindingFormProps) {
  const [draft, setDraft] = useState<FindingDraft>({
    title: finding?.title ?? '',
    body: finding?.body ?? '',
    severity: finding?.severity ?? 'medium',
    links: initialLinks,
  });
  const [submitted, setSubmitted] = useState(false);
  const local = localProblems(draft);
  const server = error ? formProblems<FindingField>(error, findingFields) : null;
  const shown = shownProblems<FindingField>(local, server?.fields ?? {}, submitted);
  const badLink = linkProblem(error);
  const general = (server?.general ?? []).filter((message) => message !== badLink);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean)) return;
    onSave({ ...draft, title: draft.title.trim(), body: draft.body.trim() });
  };

  return (
    <DialogForm
      title={finding ? 'Edit the finding' : 'New finding'}
      intro={
        finding
          ? 'Your edit is kept in the audit log beside the earlier text. Links can be added, not removed.'
          : 'Staff will see it and can respond; you can close it once it is settled.'
      }
      problems={general}
      submitLabel={finding ? 'Save changes' : 'Record finding'}
      pendingLabel="Saving…"
      pending={pending}
      onSubmit={submit}
    >
      <Field label="Title" required validationMessage={shown.title}>
        <Input
          name="title"
          autoComplete="off"
          maxLength={FINDING_TITLE_MAX}
          value={draft.title}
          onChange={(_event, data) => setDraft({ ...draft, title: data.value })}
        />
      </Field>
      <Field label="What you found" required validationMessage={shown.body}>
        <Textarea
          name="body"
          resize="vertical"
          rows={5}
          maxLength={FINDING_BODY_MAX}
          value={draft.body}
          onChange={(_event, data) => setDraft({ ...draft, body: data.value })}
        />
      </Field>
      <Field label="Severity" required validationMessage={shown.severity}>
        <RadioGroup
          layout="horizontal"
          value={draft.severity}
          onChange={(_event, data) =>
            setDraft({ ...draft, severity: data.value as FindingSeverity })
          }
        >
          {FINDING_SEVERITIES.map((severity) => (
            <Radio key={severity} value={severity} label={severityLabels[severity]} />
          ))}
        </RadioGroup>
      </Field>
      <LinkEditor
        kept={finding?.links}
        added={draft.links}
        onChange={(links) => setDraft({ ...draft, links })}
        problem={badLink}
      />
    </DialogForm>
  );
}
