import {
  Dialog,
  DialogSurface,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Select,
} from '@fluentui/react-components';
import type { ChapterView, RegionView, SaveChapterRequest } from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { DialogForm } from '@/components/ui/dialog-form';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { formatDate } from '@/lib/format';
import { parseWholeNumber } from '@/lib/form-values';
import { useCreateChapter } from '../api/create-chapter';
import { useUpdateChapter } from '../api/update-chapter';

type ChapterField = 'name' | 'regionId' | 'reportingDueDay' | 'activeFrom' | 'activeTo';

const chapterFields: ChapterField[] = [
  'name',
  'regionId',
  'reportingDueDay',
  'activeFrom',
  'activeTo',
];

interface ChapterDraft {
  name: string;
  regionId: string;
  reportingDueDay: string;
  activeFrom: string;
  activeTo: string;
}

const isoDate = /^\d{4}-\d{2}-\d{2}$/;

function chapterProblems(draft: ChapterDraft): Partial<Record<ChapterField, string>> {
  const problems: Partial<Record<ChapterField, string>> = {};
  if (!draft.name.trim()) problems.name = 'Enter the chapter’s name.';
  if (!draft.regionId) problems.regionId = 'Choose the region the chapter belongs to.';
  if (parseWholeNumber(draft.reportingDueDay, 1, 28) === undefined)
    problems.reportingDueDay = 'Enter a day from 1 to 28.';
  if (!isoDate.test(draft.activeFrom)) problems.activeFrom = 'Enter the day the chapter started.';
  if (draft.activeTo && !isoDate.test(draft.activeTo)) problems.activeTo = 'Enter a date.';
  else if (draft.activeTo && isoDate.test(draft.activeFrom) && draft.activeTo < draft.activeFrom)
    problems.activeTo = 'The chapter cannot close before it started.';
  return problems;
}

function requestOf(draft: ChapterDraft): SaveChapterRequest {
  return {
    name: draft.name.trim(),
    regionId: Number(draft.regionId),
    reportingDueDay: Number(draft.reportingDueDay.trim()),
    activeFrom: draft.activeFrom,
    activeTo: draft.activeTo || null,
  };
}

function ChapterForm({
  chapter,
  regions,
  onDone,
}: {
  chapter: ChapterView | undefined;
  regions: RegionView[];
  onDone: () => void;
}) {
  const create = useCreateChapter();
  const update = useUpdateChapter();
  const save = chapter ? update : create;
  const notify = useNotify();
  const [draft, setDraft] = useState<ChapterDraft>({
    name: chapter?.name ?? '',
    regionId: chapter ? String(chapter.regionId) : '',
    reportingDueDay: chapter ? String(chapter.reportingDueDay) : '10',
    activeFrom: chapter?.activeFrom ?? '',
    activeTo: chapter?.activeTo ?? '',
  });
  const [submitted, setSubmitted] = useState(false);
  // Closing a running chapter takes a second press, after the warning says what it means.
  const [closeConfirmed, setCloseConfirmed] = useState(false);

  const local = chapterProblems(draft);
  const server = save.isError
    ? formProblems<ChapterField>(save.error, chapterFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<ChapterField>(local, server.fields, submitted);
  const closing = !!chapter && chapter.activeTo === null && !!draft.activeTo;
  const change = (changes: Partial<ChapterDraft>) => setDraft({ ...draft, ...changes });

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean)) return;
    if (closing && !closeConfirmed) {
      setCloseConfirmed(true);
      return;
    }
    const request = requestOf(draft);
    const done = (saved: ChapterView) => {
      notify(chapter ? `Changes to ${saved.name} saved.` : `Chapter ${saved.name} added.`);
      onDone();
    };
    if (chapter) update.mutate({ id: chapter.id, changes: request }, { onSuccess: done });
    else create.mutate(request, { onSuccess: done });
  };

  return (
    <DialogForm
      title={chapter ? `Edit ${chapter.name}` : 'Add a chapter'}
      intro="Each chapter belongs to one region and files a tally every month."
      problems={server.general}
      submitLabel={
        closing && closeConfirmed
          ? 'Close chapter and save'
          : chapter
            ? 'Save changes'
            : 'Add chapter'
      }
      pendingLabel="Saving…"
      pending={save.isPending}
      onSubmit={submit}
    >
      <Field label="Name" required validationMessage={shown.name}>
        <Input
          name="name"
          autoComplete="off"
          value={draft.name}
          onChange={(_event, data) => change({ name: data.value })}
        />
      </Field>
      <Field label="Region" required validationMessage={shown.regionId}>
        <Select
          name="regionId"
          value={draft.regionId}
          onChange={(_event, data) => change({ regionId: data.value })}
        >
          <option value="">Choose a region</option>
          {regions.map((region) => (
            <option key={region.id} value={region.id}>
              {region.name}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Report due day"
        required
        hint="Day of the following month by which the month’s tally is due (1–28, so every month has it)."
        validationMessage={shown.reportingDueDay}
      >
        <Input
          name="reportingDueDay"
          type="number"
          min={1}
          max={28}
          step={1}
          value={draft.reportingDueDay}
          onChange={(_event, data) => change({ reportingDueDay: data.value })}
        />
      </Field>
      <Field label="Active from" required validationMessage={shown.activeFrom}>
        <Input
          name="activeFrom"
          type="date"
          value={draft.activeFrom}
          onChange={(_event, data) => change({ activeFrom: data.value })}
        />
      </Field>
      <Field
        label="Active to"
        hint="Leave empty while the chapter runs; on or after the start."
        validationMessage={shown.activeTo}
      >
        <Input
          name="activeTo"
          type="date"
          min={draft.activeFrom || undefined}
          value={draft.activeTo}
          onChange={(_event, data) => {
            setCloseConfirmed(false);
            change({ activeTo: data.value });
          }}
        />
      </Field>
      {closing && closeConfirmed ? (
        <MessageBar intent="warning" layout="multiline">
          <MessageBarBody>
            {chapter.name} will be shown as closed from {formatDate(draft.activeTo)} and no tally
            will be expected after that month. Its history stays. Press “Close chapter and save” to
            go ahead, or clear the date to keep it open.
          </MessageBarBody>
        </MessageBar>
      ) : null}
    </DialogForm>
  );
}

export interface ChapterDialogProps {
  open: boolean;
  /** The chapter to edit; left out to add one. */
  chapter?: ChapterView;
  regions: RegionView[];
  onClose: () => void;
}

export function ChapterDialog({ open, chapter, regions, onClose }: ChapterDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        {open ? <ChapterForm chapter={chapter} regions={regions} onDone={onClose} /> : null}
      </DialogSurface>
    </Dialog>
  );
}
