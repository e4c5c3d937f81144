import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { format, parseISO } from 'date-fns';
import { describeProblem } from '@/components/ui/error-state';
import type { AutosaveStatus } from '../hooks/use-tally-autosave';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    minHeight: '32px',
  },
  ok: { color: tokens.colorNeutralForeground2 },
  bad: { color: tokens.colorStatusDangerForeground1 },
});

/** "Saved 14:02", "Saving…" or "Not saved: …", read out politely as it changes. */
export function SaveStatus({
  status,
  lastSavedAt,
  onRetry,
}: {
  status: AutosaveStatus;
  /** When the tally was last saved by anyone, for a form opened and not changed yet. */
  lastSavedAt: string;
  onRetry: () => void;
}) {
  const styles = useStyles();
  let words: string;
  let bad = false;
  switch (status.kind) {
    case 'unchanged':
      words = `Saved ${format(parseISO(lastSavedAt), 'd MMM HH:mm')}`;
      break;
    case 'waiting':
      words = 'Changes not saved yet…';
      break;
    case 'saving':
      words = 'Saving…';
      break;
    case 'saved':
      words = `Saved ${format(status.at, 'HH:mm')}`;
      break;
    case 'invalid':
      words = `Not saved: ${status.message}`;
      bad = true;
      break;
    case 'failed':
      words = `Not saved: ${describeProblem(status.error).message}`;
      bad = true;
      break;
    case 'conflict':
      words = 'Not saved: someone else saved this tally first (see above)';
      bad = true;
      break;
  }
  return (
    <div className={styles.root}>
      <Text role="status" aria-live="polite" className={bad ? styles.bad : styles.ok}>
        {words}
      </Text>
      {status.kind === 'failed' ? (
        <Button size="small" onClick={onRetry}>
          Try saving again
        </Button>
      ) : null}
    </div>
  );
}
