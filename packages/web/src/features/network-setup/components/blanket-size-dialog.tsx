import {
  Dialog,
  DialogSurface,
  Field,
  Input,
  makeStyles,
  Text,
  Textarea,
  tokens,
} from '@fluentui/react-components';
import {
  finishedSize,
  panelsPerBlanket,
  type BlanketSizeView,
  type SaveBlanketSizeRequest,
} from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { DialogForm } from '@/components/ui/dialog-form';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { formatCount } from '@/lib/format';
import { parseWholeNumber } from '@/lib/form-values';
import { useCreateBlanketSize } from '../api/create-blanket-size';
import { useUpdateBlanketSize } from '../api/update-blanket-size';
import { formatFinishedSize } from './size-format';

type SizeField = 'name' | 'columns' | 'rows' | 'sourceNote';

const sizeFields: SizeField[] = ['name', 'columns', 'rows', 'sourceNote'];

/** The server takes 1 to 20 panels each way. */
const MAX_PANELS_ACROSS = 20;

const useStyles = makeStyles({
  grid: { display: 'grid', gridTemplateColumns: '1fr 1fr', gap: tokens.spacingHorizontalM },
  preview: {
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
    fontVariantNumeric: 'tabular-nums',
  },
});

interface SizeDraft {
  name: string;
  columns: string;
  rows: string;
  sourceNote: string;
}

function sizeProblems(draft: SizeDraft): Partial<Record<SizeField, string>> {
  const problems: Partial<Record<SizeField, string>> = {};
  if (!draft.name.trim()) problems.name = 'Enter the size’s name, e.g. Lap.';
  if (parseWholeNumber(draft.columns, 1, MAX_PANELS_ACROSS) === undefined)
    problems.columns = 'Enter 1 to 20 panels.';
  if (parseWholeNumber(draft.rows, 1, MAX_PANELS_ACROSS) === undefined)
    problems.rows = 'Enter 1 to 20 panels.';
  if (draft.sourceNote.trim().length > 255) problems.sourceNote = 'Keep it to 255 characters.';
  return problems;
}

/** Panels and finished size for the grid as typed so far, or what is still missing. */
function SizePreview({ draft }: { draft: SizeDraft }) {
  const styles = useStyles();
  const columns = parseWholeNumber(draft.columns, 1, MAX_PANELS_ACROSS);
  const rows = parseWholeNumber(draft.rows, 1, MAX_PANELS_ACROSS);
  const grid = columns !== undefined && rows !== undefined ? { columns, rows } : undefined;
  return (
    <Text as="p" role="status" aria-live="polite" className={styles.preview}>
      {grid
        ? `${formatCount(panelsPerBlanket(grid))} panels · finished ${formatFinishedSize(finishedSize(grid))}`
        : 'Enter panels across and down to see the panels it takes and its finished size.'}
    </Text>
  );
}

function BlanketSizeForm({
  size,
  onDone,
}: {
  size: BlanketSizeView | undefined;
  onDone: () => void;
}) {
  const styles = useStyles();
  const create = useCreateBlanketSize();
  const update = useUpdateBlanketSize();
  const save = size ? update : create;
  const notify = useNotify();
  const [draft, setDraft] = useState<SizeDraft>({
    name: size?.name ?? '',
    columns: size ? String(size.columns) : '',
    rows: size ? String(size.rows) : '',
    sourceNote: size?.sourceNote ?? '',
  });
  const [submitted, setSubmitted] = useState(false);
  const change = (changes: Partial<SizeDraft>) => setDraft({ ...draft, ...changes });

  const local = sizeProblems(draft);
  const server = save.isError
    ? formProblems<SizeField>(save.error, sizeFields)
    : { fields: {}, general: [] };
  const shown = shownProblems<SizeField>(local, server.fields, submitted);

  const submit = () => {
    setSubmitted(true);
    if (Object.values(local).some(Boolean)) return;
    const request: SaveBlanketSizeRequest = {
      name: draft.name.trim(),
      columns: Number(draft.columns.trim()),
      rows: Number(draft.rows.trim()),
      sourceNote: draft.sourceNote.trim() || null,
    };
    const done = (saved: BlanketSizeView) => {
      notify(size ? `Changes to ${saved.name} saved.` : `${saved.name} added to the catalogue.`);
      onDone();
    };
    if (size) update.mutate({ id: size.id, changes: request }, { onSuccess: done });
    else create.mutate(request, { onSuccess: done });
  };

  return (
    <DialogForm
      title={size ? `Edit ${size.name}` : 'Add a blanket size'}
      intro="A size is a grid of 7 × 9 in panels; seams and edging are left out of the finished size."
      problems={server.general}
      submitLabel={size ? 'Save changes' : 'Add size'}
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
      <div className={styles.grid}>
        <Field label="Panels across" required validationMessage={shown.columns}>
          <Input
            name="columns"
            type="number"
            min={1}
            max={MAX_PANELS_ACROSS}
            step={1}
            value={draft.columns}
            onChange={(_event, data) => change({ columns: data.value })}
          />
        </Field>
        <Field label="Panels down" required validationMessage={shown.rows}>
          <Input
            name="rows"
            type="number"
            min={1}
            max={MAX_PANELS_ACROSS}
            step={1}
            value={draft.rows}
            onChange={(_event, data) => change({ rows: data.value })}
          />
        </Field>
      </div>
      <SizePreview draft={draft} />
      <Field
        label="Source note"
        hint="Where the target size comes from, e.g. a published size chart."
        validationMessage={shown.sourceNote}
      >
        <Textarea
          name="sourceNote"
          resize="vertical"
          value={draft.sourceNote}
          onChange={(_event, data) => change({ sourceNote: data.value })}
        />
      </Field>
    </DialogForm>
  );
}

export interface BlanketSizeDialogProps {
  open: boolean;
  /** The size to edit; left out to add one. */
  size?: BlanketSizeView;
  onClose: () => void;
}

export function BlanketSizeDialog({ open, size, onClose }: BlanketSizeDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        {open ? <BlanketSizeForm size={size} onDone={onClose} /> : null}
      </DialogSurface>
    </Dialog>
  );
}
