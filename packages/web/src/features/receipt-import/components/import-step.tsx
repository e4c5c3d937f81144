import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ArrowUpload20Regular } from '@fluentui/react-icons';
import type { ImportCommitResponse } from '@tallyloom/core';
import { LinkButton } from '@/components/ui/link-button';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { formatCount } from '@/lib/format';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  rows: {
    margin: 0,
    paddingLeft: tokens.spacingHorizontalXL,
    maxHeight: '320px',
    overflowY: 'auto',
  },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
});

/** The row problems a refused commit names (`rows.<n>.<field>`), each already in words. */
export function commitRowProblems(error: unknown): string[] {
  if (!(error instanceof ApiError)) return [];
  return (error.fields ?? [])
    .filter((problem) => problem.field.startsWith('rows.'))
    .flatMap((problem) => problem.messages);
}

/** "Imported 120 parcels as batch 9". */
export function importedText({ created, batchId }: ImportCommitResponse): string {
  return `Imported ${formatCount(created)} ${created === 1 ? 'parcel' : 'parcels'} as batch ${batchId}`;
}

export interface ImportStepProps {
  chapterId: number;
  rowCount: number;
  pending: boolean;
  result: ImportCommitResponse | undefined;
  error: unknown;
  onRetry: () => void;
  onUploadCorrected: () => void;
  onImportAnother: () => void;
}

/** Step 4: every row stored as one batch, or, when the server refuses, none. */
export function ImportStep({
  chapterId,
  rowCount,
  pending,
  result,
  error,
  onRetry,
  onUploadCorrected,
  onImportAnother,
}: ImportStepProps) {
  const styles = useStyles();
  const parcelsOfChapter = paths.receipts.getHref(`?chapter=${chapterId}`);

  if (pending) {
    return (
      <LoadingState
        label={`Importing ${formatCount(rowCount)} ${rowCount === 1 ? 'row' : 'rows'}…`}
      />
    );
  }

  if (result) {
    return (
      <div className={styles.root}>
        <div role="status">
          <MessageBar intent="success" layout="multiline">
            <MessageBarBody>
              <MessageBarTitle>{importedText(result)}</MessageBarTitle>
              They are in the parcel list now, with the rest of the chapter&apos;s parcels.
            </MessageBarBody>
          </MessageBar>
        </div>
        <div className={styles.actions}>
          <LinkButton to={parcelsOfChapter} appearance="primary">
            See the chapter&apos;s parcels
          </LinkButton>
          <Button onClick={onImportAnother}>Import another sheet</Button>
        </div>
      </div>
    );
  }

  if (error) {
    const rows = commitRowProblems(error);
    const conflict = error instanceof ApiError && error.statusCode === 409;
    const message = error instanceof Error ? error.message : 'Something unexpected happened.';
    return (
      <div className={styles.root}>
        <div role="alert">
          <MessageBar intent="error" layout="multiline">
            <MessageBarBody>
              <MessageBarTitle>
                {conflict ? 'Already imported' : 'Nothing was imported'}
              </MessageBarTitle>
              {message}
            </MessageBarBody>
          </MessageBar>
        </div>
        {rows.length > 0 ? (
          <ul className={styles.rows} aria-label="Rows to correct">
            {rows.map((line) => (
              <li key={line}>
                <Text>{line}</Text>
              </li>
            ))}
          </ul>
        ) : null}
        <div className={styles.actions}>
          <Button appearance="primary" icon={<ArrowUpload20Regular />} onClick={onUploadCorrected}>
            Upload a corrected file
          </Button>
          {rows.length === 0 && !conflict ? <Button onClick={onRetry}>Try again</Button> : null}
        </div>
      </div>
    );
  }

  return null;
}
