import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  Text,
} from '@fluentui/react-components';
import { PersonDelete20Regular } from '@fluentui/react-icons';
import type { ParcelReceiptDetail } from '@tallyloom/core';
import { useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { FormAlert } from '@/components/ui/form-alert';
import { useEraseSender } from '../api/erase-sender';

/** "the name, e-mail and postal address": only what the parcel holds. */
function erasedParts(receipt: ParcelReceiptDetail): string {
  const parts = [
    receipt.sender?.name ? 'name' : null,
    receipt.sender?.email ? 'e-mail address' : null,
    receipt.sender?.address ? 'postal address' : null,
  ].filter((part): part is string => part !== null);
  if (parts.length === 0) return 'details';
  if (parts.length === 1) return parts[0] ?? 'details';
  return `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}`;
}

function EraseBody({ receipt, onDone }: { receipt: ParcelReceiptDetail; onDone: () => void }) {
  const erase = useEraseSender();
  const notify = useNotify();
  const who = receipt.sender?.name ?? 'the sender';
  const confirm = () =>
    erase.mutate(receipt.id, {
      onSuccess: () => {
        notify("The sender's details are erased.");
        onDone();
      },
    });
  return (
    <DialogBody>
      <DialogTitle>Erase the sender&apos;s details?</DialogTitle>
      <DialogContent>
        <Text as="p">
          The {erasedParts(receipt)} of {who} will be erased from this parcel for good. This cannot
          be undone.
        </Text>
        <Text as="p">
          The counts stay as they are: panels accepted and set aside, finished items, the campaign,
          the dates and the scans.
        </Text>
        <FormAlert messages={erase.isError ? [erase.error.message] : []} />
      </DialogContent>
      <DialogActions>
        <DialogTrigger disableButtonEnhancement>
          <Button>Keep the details</Button>
        </DialogTrigger>
        <Button appearance="primary" disabledFocusable={erase.isPending} onClick={confirm}>
          {erase.isPending ? 'Erasing…' : "Erase sender's details"}
        </Button>
      </DialogActions>
    </DialogBody>
  );
}

/** The admin's "Erase sender's details", behind a confirmation that says what goes and what stays. */
export function EraseSenderButton({ receipt }: { receipt: ParcelReceiptDetail }) {
  const [open, setOpen] = useState(false);
  return (
    <Dialog modalType="alert" open={open} onOpenChange={(_event, data) => setOpen(data.open)}>
      <DialogTrigger disableButtonEnhancement>
        <Button icon={<PersonDelete20Regular />}>Erase sender&apos;s details</Button>
      </DialogTrigger>
      <DialogSurface>
        {open ? <EraseBody receipt={receipt} onDone={() => setOpen(false)} /> : null}
      </DialogSurface>
    </Dialog>
  );
}
