import {
  Badge,
  Button,
  Field,
  makeStyles,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  ProgressBar,
  Switch,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ArrowUpload20Regular } from '@fluentui/react-icons';
import type {
  BlanketSizeView,
  ImportPreviewRow,
  ImportRowProblem,
  ImportUploadResponse,
} from '@tallyloom/core';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { DataTable } from '@/components/ui/data-table';
import { ErrorState } from '@/components/ui/error-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { ApiError } from '@/lib/api-client';
import { formatCount } from '@/lib/format';
import { usePreviewImport, type FullPreview, type ImportMapping } from '../api/preview-import';
import { fieldLabel } from './field-labels';

export const CHECK_PAGE_SIZE = 50;

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  progress: { maxWidth: '480px' },
  summary: { margin: 0, fontSize: tokens.fontSizeBase400 },
  problems: {
    margin: 0,
    paddingLeft: 0,
    listStyle: 'none',
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
  },
  problem: { display: 'flex', gap: tokens.spacingHorizontalS, alignItems: 'baseline' },
  calm: { color: tokens.colorNeutralForeground2 },
  clean: { color: tokens.colorNeutralForeground3 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
});

function plural(count: number, one: string, many: string): string {
  return `${formatCount(count)} ${count === 1 ? one : many}`;
}

/** "3 rows, 2 with errors, 1 with warnings". */
export function previewSummary({ counts }: FullPreview): string {
  return `${plural(counts.rowCount, 'row', 'rows')}, ${formatCount(counts.errorCount)} with errors, ${formatCount(counts.warningCount)} with warnings`;
}

/** One problem in words: where in the row, then what the server said. */
export function problemText(problem: ImportRowProblem, sizes: BlanketSizeView[]): string {
  if (problem.field === 'row') return problem.message;
  const field = fieldLabel(problem.field, sizes);
  const where =
    problem.column && problem.column !== field ? `${field} (column “${problem.column}”)` : field;
  return `${where}: ${problem.message}`;
}

/** Rows with errors first, then those with warnings, then the rest; each in sheet order. */
function rank(row: ImportPreviewRow): number {
  if (row.errors.length > 0) return 0;
  if (row.warnings.length > 0) return 1;
  return 2;
}

export function orderedRows(rows: ImportPreviewRow[], onlyProblems: boolean): ImportPreviewRow[] {
  return rows
    .filter((row) => !onlyProblems || rank(row) < 2)
    .sort((a, b) => rank(a) - rank(b) || a.rowNumber - b.rowNumber);
}

const column = createColumnHelper<ImportPreviewRow>();

export interface CheckStepProps {
  upload: ImportUploadResponse;
  mapping: ImportMapping;
  sizes: BlanketSizeView[];
  /** Back to step 1, keeping the chapter. */
  onUploadCorrected: () => void;
  onChangeMapping: () => void;
  onImport: (preview: FullPreview) => void;
}

/** Step 3: every row checked as it would be imported; nothing is stored yet. */
export function CheckStep({
  upload,
  mapping,
  sizes,
  onUploadCorrected,
  onChangeMapping,
  onImport,
}: CheckStepProps) {
  const styles = useStyles();
  const preview = usePreviewImport(upload, mapping);
  const [onlyProblemsChoice, setOnlyProblems] = useState<boolean | null>(null);
  const [pageIndex, setPageIndex] = useState(0);

  const hasProblems =
    !!preview.data && preview.data.counts.errorCount + preview.data.counts.warningCount > 0;
  // Until the person chooses, rows with problems are all that is shown, when there are any.
  const onlyProblems = onlyProblemsChoice ?? hasProblems;
  const rows = useMemo(
    () => (preview.data ? orderedRows(preview.data.rows, onlyProblems) : []),
    [preview.data, onlyProblems],
  );

  const columns = useMemo(
    () => [
      column.accessor('rowNumber', { header: 'Row', meta: { numeric: true } }),
      column.display({
        id: 'status',
        header: 'Status',
        cell: ({ row }) =>
          row.original.errors.length > 0 ? (
            <Badge appearance="filled" color="danger">
              Error
            </Badge>
          ) : row.original.warnings.length > 0 ? (
            <Badge appearance="tint" color="warning">
              Worth a look
            </Badge>
          ) : (
            <Badge appearance="outline" color="success">
              Ready
            </Badge>
          ),
      }),
      column.display({
        id: 'problems',
        header: 'What to check',
        cell: ({ row }) => {
          const { errors, warnings } = row.original;
          if (errors.length === 0 && warnings.length === 0)
            return <span className={styles.clean}>Nothing to fix</span>;
          return (
            <ul className={styles.problems}>
              {errors.map((problem, index) => (
                <li key={`e${index}`}>{problemText(problem, sizes)}</li>
              ))}
              {warnings.map((problem, index) => (
                <li key={`w${index}`} className={styles.calm}>
                  {problemText(problem, sizes)} The row is still imported.
                </li>
              ))}
            </ul>
          );
        },
      }),
    ],
    [sizes, styles.calm, styles.clean, styles.problems],
  );

  if (preview.isPending) {
    const total = Math.max(upload.rowCount, 1);
    const checked = Math.min(preview.checked, total);
    return (
      <div className={styles.root} aria-busy="true">
        <Field
          className={styles.progress}
          label="Checking rows"
          validationState="none"
          validationMessage={`${formatCount(checked)} of ${plural(upload.rowCount, 'row', 'rows')} checked`}
        >
          <ProgressBar value={checked / total} max={1} thickness="large" />
        </Field>
      </div>
    );
  }

  if (preview.isError) {
    const expired = preview.error instanceof ApiError && preview.error.statusCode === 404;
    return (
      <div className={styles.root}>
        <ErrorState
          title={expired ? 'The upload has expired' : 'The rows could not be checked'}
          error={preview.error}
          onRetry={expired ? undefined : () => void preview.refetch()}
          retrying={preview.isFetching}
          headingLevel={3}
        />
        <div className={styles.actions}>
          <Button icon={<ArrowUpload20Regular />} onClick={onUploadCorrected}>
            Upload a corrected file
          </Button>
          {!expired ? <Button onClick={onChangeMapping}>Change the column matches</Button> : null}
        </div>
      </div>
    );
  }

  const { counts } = preview.data;
  const hasErrors = counts.errorCount > 0;
  const pageRows = rows.slice(pageIndex * CHECK_PAGE_SIZE, (pageIndex + 1) * CHECK_PAGE_SIZE);

  return (
    <div className={styles.root}>
      <Text as="p" weight="semibold" className={styles.summary} role="status">
        {previewSummary(preview.data)}
      </Text>
      {hasErrors ? (
        <MessageBar intent="error" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>
              {plural(counts.errorCount, 'row has errors', 'rows have errors')}
            </MessageBarTitle>
            Fix them in your sheet and upload it again. Nothing is imported while any row has an
            error.
          </MessageBarBody>
          <MessageBarActions>
            <Button icon={<ArrowUpload20Regular />} onClick={onUploadCorrected}>
              Upload a corrected file
            </Button>
          </MessageBarActions>
        </MessageBar>
      ) : (
        <MessageBar intent={counts.warningCount > 0 ? 'info' : 'success'} layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>Every row can be imported</MessageBarTitle>
            {counts.warningCount > 0
              ? 'Rows marked “Worth a look” are imported as they are; read them over first.'
              : 'Nothing to fix.'}
          </MessageBarBody>
        </MessageBar>
      )}

      <section aria-labelledby="import-rows-heading">
        <SectionHeading id="import-rows-heading">Rows</SectionHeading>
        <Switch
          label="Only rows with problems"
          checked={onlyProblems}
          onChange={(_event, data) => {
            setOnlyProblems(data.checked);
            setPageIndex(0);
          }}
        />
        {rows.length === 0 ? (
          <Text as="p" className={styles.clean}>
            {onlyProblems ? 'No row has a problem.' : 'The sheet has no rows.'}
          </Text>
        ) : (
          <DataTable
            data={pageRows}
            columns={columns}
            labelledBy="import-rows-heading"
            getRowId={(row) => String(row.rowNumber)}
            enableSorting={false}
            pagination={{
              pageIndex,
              pageSize: CHECK_PAGE_SIZE,
              rowCount: rows.length,
              onPageChange: setPageIndex,
              label: 'rows',
            }}
          />
        )}
      </section>

      <div className={styles.actions}>
        <Button appearance="primary" disabled={hasErrors} onClick={() => onImport(preview.data)}>
          Import
        </Button>
        <Button onClick={onChangeMapping}>Change the column matches</Button>
      </div>
    </div>
  );
}
