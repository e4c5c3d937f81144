import { Dialog, DialogSurface } from '@fluentui/react-components';
import { useForm } from 'react-hook-form';
import { DialogForm } from '@/components/ui/dialog-form';
import { TextAreaField } from './text-area-field';

export interface AmendTallyDialogProps {
  open: boolean;
  pending: boolean;
  problems: string[];
  onAmend: (reason: string) => void;
  onClose: () => void;
}

/** An approved tally changes only by an amendment: a new revision, with the reason for it. */
export function AmendTallyDialog({
  open,
  pending,
  problems,
  onAmend,
  onClose,
}: AmendTallyDialogProps) {
  const { control, handleSubmit, reset } = useForm<{ reason: string }>({
    defaultValues: { reason: '' },
  });
  const send = handleSubmit(({ reason }) => onAmend(reason.trim()));
  return (
    <Dialog
      open={open}
      onOpenChange={(_event, data) => {
        if (data.open) return;
        reset();
        onClose();
      }}
    >
      <DialogSurface>
        <DialogForm
          title="Amend an approved tally"
          intro="The approved figures stay in force, and in the history, until the amendment is approved. Say what needs changing and why."
          problems={problems}
          submitLabel="Start the amendment"
          pendingLabel="Starting…"
          pending={pending}
          onSubmit={() => void send()}
        >
          <TextAreaField
            control={control}
            name="reason"
            label="Reason"
            required
            rules={{
              validate: (reason) => reason.trim() !== '' || 'Write the reason for the amendment.',
            }}
          />
        </DialogForm>
      </DialogSurface>
    </Dialog>
  );
}
