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
import type { ReactNode } from 'react';
import { FormAlert } from './form-alert';

export interface ConfirmDialogProps {
  open: boolean;
  title: string;
  /** What will happen, and how to undo it. */
  children: ReactNode;
  confirmLabel: string;
  pendingLabel: string;
  cancelLabel?: string;
  pending: boolean;
  /** The last attempt's error message, shown above the buttons. */
  error?: string;
  onConfirm: () => void;
  onClose: () => void;
}

/** Asks before a step such as deactivating, so a slip of the menu costs nothing. */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  pendingLabel,
  cancelLabel = 'Cancel',
  pending,
  error,
  onConfirm,
  onClose,
}: ConfirmDialogProps) {
  return (
    <Dialog modalType="alert" open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{title}</DialogTitle>
          <DialogContent>
            <Text as="p">{children}</Text>
            <FormAlert messages={error ? [error] : []} />
          </DialogContent>
          <DialogActions>
            <DialogTrigger disableButtonEnhancement>
              <Button>{cancelLabel}</Button>
            </DialogTrigger>
            <Button appearance="primary" disabledFocusable={pending} onClick={onConfirm}>
              {pending ? pendingLabel : confirmLabel}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
