import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Field,
  ProgressBar,
} from '@fluentui/react-components';
import { ArrowClockwise20Regular } from '@fluentui/react-icons';
import { ErrorState } from '@/components/ui/error-state';
import { useExport } from '../api/get-export';
import { ExportStatus } from './export-status';

export interface ExportProgressDialogProps {
  open: boolean;
  title: string;
  /** The export the server made; absent while it is still being asked for. */
  exportId?: string;
  /** The request for a new export is on its way. */
  requesting: boolean;
  /** Why the request for a new export was refused. */
  requestError?: unknown;
  /** Asks for the same export again: after a refusal, a failure or an expired link. */
  onRetry: () => void;
  onClose: () => void;
}

/**
 * Follows one export from the request to the download: a bar while the job writes the file
 * (asked once a second), then the link with its expiry, or the reason it failed and a retry.
 * Closing it does not stop the export: it stays on "My exports".
 */
export function ExportProgressDialog({
  open,
  title,
  exportId,
  requesting,
  requestError,
  onRetry,
  onClose,
}: ExportProgressDialogProps) {
  const exported = useExport(requesting ? undefined : exportId);
  const view = exported.data;

  let body;
  let mayRetry = false;
  if (requesting) {
    body = (
      <Field label="Asking for the export…">
        <ProgressBar thickness="large" />
      </Field>
    );
  } else if (requestError) {
    mayRetry = true;
    body = <ErrorState title="The export was not started" error={requestError} headingLevel={3} />;
  } else if (!view && exported.isError) {
    body = (
      <ErrorState
        title="The export's progress could not be read"
        error={exported.error}
        onRetry={() => void exported.refetch()}
        retrying={exported.isFetching}
        headingLevel={3}
      />
    );
  } else if (!view) {
    body = (
      <Field label="Reading the export's progress…">
        <ProgressBar thickness="large" />
      </Field>
    );
  } else {
    mayRetry = view.state === 'failed' || view.state === 'expired';
    body = <ExportStatus view={view} />;
  }

  return (
    <Dialog open={open} onOpenChange={(_event, data) => !data.open && onClose()}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{title}</DialogTitle>
          <DialogContent>{body}</DialogContent>
          <DialogActions>
            {mayRetry ? (
              <Button appearance="primary" icon={<ArrowClockwise20Regular />} onClick={onRetry}>
                Export again
              </Button>
            ) : null}
            <Button onClick={onClose}>Close</Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
