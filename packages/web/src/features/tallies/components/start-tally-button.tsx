import { Button } from '@fluentui/react-components';
import { Add20Regular } from '@fluentui/react-icons';
import { monthLabel } from '@tallyloom/core';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCreateTally } from '../api/create-tally';

export interface StartTallyButtonProps {
  chapterId: number;
  month: string;
  /** Tells the list what went wrong, to show above it. */
  onError: (error: unknown) => void;
}

/** Starts the month's tally (prefilled by the server) and opens it. */
export function StartTallyButton({ chapterId, month, onError }: StartTallyButtonProps) {
  const create = useCreateTally();
  const navigate = useNavigate();
  return (
    <Button
      appearance="primary"
      size="small"
      icon={<Add20Regular />}
      disabledFocusable={create.isPending}
      aria-label={`Start the ${monthLabel(month)} tally`}
      onClick={() =>
        create.mutate(
          { chapterId, month },
          {
            onSuccess: (tally) => void navigate(paths.tally.getHref(tally.id)),
            onError,
          },
        )
      }
    >
      {create.isPending ? 'Starting…' : 'Start tally'}
    </Button>
  );
}
