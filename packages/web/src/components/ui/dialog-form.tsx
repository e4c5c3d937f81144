import {
  Button,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogTitle,
  DialogTrigger,
  makeStyles,
  Text,
  tokens,
} from '@fluentui/react-components';
import type { FormEvent, ReactNode } from 'react';
import { FormAlert } from './form-alert';

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  intro: { margin: 0, color: tokens.colorNeutralForeground2 },
});

export interface DialogFormProps {
  title: string;
  intro?: ReactNode;
  /** What went wrong that belongs to no field. */
  problems: string[];
  submitLabel: string;
  pendingLabel: string;
  pending: boolean;
  onSubmit: () => void;
  children: ReactNode;
}

/** The body of an add or edit dialog: title, fields, Cancel and the main action (Enter submits). */
export function DialogForm({
  title,
  intro,
  problems,
  submitLabel,
  pendingLabel,
  pending,
  onSubmit,
  children,
}: DialogFormProps) {
  const styles = useStyles();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSubmit();
  };
  return (
    <form onSubmit={submit} noValidate>
      <DialogBody>
        <DialogTitle>{title}</DialogTitle>
        <DialogContent className={styles.content}>
          {intro ? (
            <Text as="p" className={styles.intro}>
              {intro}
            </Text>
          ) : null}
          <FormAlert messages={problems} />
          {children}
        </DialogContent>
        <DialogActions>
          <DialogTrigger disableButtonEnhancement>
            <Button>Cancel</Button>
          </DialogTrigger>
          <Button type="submit" appearance="primary" disabledFocusable={pending}>
            {pending ? pendingLabel : submitLabel}
          </Button>
        </DialogActions>
      </DialogBody>
    </form>
  );
}
