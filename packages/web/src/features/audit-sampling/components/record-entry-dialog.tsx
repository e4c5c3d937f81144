import {
  Button,
  Dialog,
  DialogSurface,
  DialogTrigger,
  Field,
  Radio,
  RadioGroup,
  Textarea,
} from '@fluentui/react-components';
import type { SampleItemView, WorksheetResult } from '@tallyloom/core';
import { useState } from 'react';
import { DialogForm } from '@/components/ui/dialog-form';
import { ATTACHMENT_ACCEPT, useRecordItem } from '../api/record-item';
import { serverProblems } from './server-problems';

export interface RecordEntryDialogProps {
  sampleId: number;
  item: SampleItemView;
  /** "Parcel #501" or "Tally #77": what the auditor is recording. */
  itemName: string;
  /** What the dialog starts on: a new deviation, or the entry as recorded. */
  initialResult: WorksheetResult;
  triggerLabel: string;
}

/** Records a deviation (a note is required) or changes an entry, with optional evidence. */
export function RecordEntryDialog({
  sampleId,
  item,
  itemName,
  initialResult,
  triggerLabel,
}: RecordEntryDialogProps) {
  const [open, setOpen] = useState(false);
  const [result, setResult] = useState<WorksheetResult>(initialResult);
  const [note, setNote] = useState(item.note ?? '');
  const [file, setFile] = useState<File | undefined>();
  const [noteProblem, setNoteProblem] = useState<string>();
  const record = useRecordItem();

  const reset = () => {
    setResult(initialResult);
    setNote(item.note ?? '');
    setFile(undefined);
    setNoteProblem(undefined);
    record.reset();
  };

  const submit = () => {
    const trimmed = note.trim();
    if (result === 'deviation' && !trimmed) {
      setNoteProblem('Say what was wrong: a deviation needs a note.');
      return;
    }
    setNoteProblem(undefined);
    record.mutate(
      {
        sampleId,
        itemId: item.itemId,
        entry: { result, ...(trimmed ? { note: trimmed } : {}) },
        attachment: file,
      },
      { onSuccess: () => setOpen(false) },
    );
  };

  const problems = record.isError ? serverProblems(record.error) : [];

  return (
    <Dialog
      open={open}
      onOpenChange={(_event, data) => {
        if (data.open) reset();
        setOpen(data.open);
      }}
    >
      <DialogTrigger disableButtonEnhancement>
        <Button size="small" aria-label={`${triggerLabel}: ${itemName}`}>
          {triggerLabel}
        </Button>
      </DialogTrigger>
      <DialogSurface>
        <DialogForm
          title={`${itemName}: worksheet entry`}
          intro="Compare the item with its evidence (the parcel's scans, the tally's receipts) and record what you found."
          problems={problems}
          submitLabel="Record"
          pendingLabel="Recording…"
          pending={record.isPending}
          onSubmit={submit}
        >
          <Field label="Result" required>
            <RadioGroup
              value={result}
              onChange={(_event, data) => setResult(data.value as WorksheetResult)}
            >
              <Radio value="agrees" label="Agrees" />
              <Radio value="deviation" label="Deviation" />
            </RadioGroup>
          </Field>
          <Field
            label="Note"
            required={result === 'deviation'}
            validationMessage={noteProblem}
            hint={result === 'deviation' ? 'What was wrong, and where you saw it.' : undefined}
          >
            <Textarea
              value={note}
              onChange={(_event, data) => setNote(data.value)}
              resize="vertical"
            />
          </Field>
          <Field label="Attachment (optional)" hint="JPEG, PNG, WebP or PDF.">
            {(fieldProps) => (
              <input
                {...fieldProps}
                type="file"
                accept={ATTACHMENT_ACCEPT}
                onChange={(event) => setFile(event.currentTarget.files?.[0])}
              />
            )}
          </Field>
        </DialogForm>
      </DialogSurface>
    </Dialog>
  );
}
