import { Button, Field, Link, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import { ArrowDownload16Regular, ArrowUpload20Regular } from '@fluentui/react-icons';
import type { ChapterView, ImportUploadResponse } from '@tallyloom/core';
import { useState, type FormEvent } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { ApiError } from '@/lib/api-client';
import { useDownloadTemplate, type TemplateKind } from '../api/download-template';
import { IMPORT_ACCEPT, useUploadImport } from '../api/upload-import';

const useStyles = makeStyles({
  form: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalL,
    maxWidth: '560px',
  },
  fileInput: {
    padding: `${tokens.spacingVerticalXS} 0`,
    fontFamily: tokens.fontFamilyBase,
    fontSize: tokens.fontSizeBase300,
  },
  templates: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalL,
    alignItems: 'center',
  },
  templateLink: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

/** The title over the server's word on a refused upload. */
function uploadProblemTitle(error: unknown): string {
  if (!(error instanceof ApiError)) return 'The file could not be uploaded';
  if (error.statusCode === 409) return 'Already imported';
  if (error.statusCode === 413) return 'The file is too large';
  if (error.statusCode === 400) return 'The file could not be read';
  return 'The file could not be uploaded';
}

export interface UploadStepProps {
  /** Open chapters the person may import for. */
  chapters: ChapterView[];
  chapterId: number | null;
  onChapterChange: (chapterId: number | null) => void;
  onUploaded: (upload: ImportUploadResponse) => void;
}

/** Step 1: the chapter every row is for, and the sheet. */
export function UploadStep({ chapters, chapterId, onChapterChange, onUploaded }: UploadStepProps) {
  const styles = useStyles();
  const upload = useUploadImport();
  const template = useDownloadTemplate();
  const [file, setFile] = useState<File | null>(null);
  const [submitted, setSubmitted] = useState(false);

  const chapterProblem =
    submitted && chapterId === null ? 'Choose the chapter the parcels came to.' : undefined;
  const fileProblem = submitted && !file ? 'Choose a CSV or Excel (.xlsx) file.' : undefined;
  // The server's word on the file itself (409, 400, 413) goes above the form, whole.
  const uploadProblem = upload.error
    ? upload.error instanceof ApiError
      ? upload.error.message
      : 'Something unexpected happened. Try again.'
    : null;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(true);
    if (chapterId === null || !file || upload.isPending) return;
    upload.mutate({ chapterId, file }, { onSuccess: onUploaded });
  };

  const downloadLink = (kind: TemplateKind, text: string) => (
    <Link
      as="button"
      type="button"
      className={styles.templateLink}
      disabled={template.isPending && template.variables === kind}
      onClick={() => template.mutate(kind)}
    >
      <ArrowDownload16Regular aria-hidden="true" />
      {template.isPending && template.variables === kind ? 'Preparing the template…' : text}
    </Link>
  );

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label="Upload a sheet">
      {uploadProblem ? (
        <FormAlert title={uploadProblemTitle(upload.error)} messages={[uploadProblem]} />
      ) : null}
      <Field label="Chapter" required validationMessage={chapterProblem}>
        <Select
          value={chapterId === null ? '' : String(chapterId)}
          disabled={chapters.length === 0}
          onChange={(_event, data) => onChapterChange(data.value ? Number(data.value) : null)}
        >
          {chapters.length === 0 ? <option value="">No open chapter to import for</option> : null}
          {chapters.length > 1 ? <option value="">Choose a chapter</option> : null}
          {chapters.map((chapter) => (
            <option key={chapter.id} value={chapter.id}>
              {chapter.name}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Sheet file"
        required
        validationMessage={fileProblem}
        hint="A CSV (UTF-8) or Excel (.xlsx) file, headers in the first row, one parcel a row."
      >
        {(fieldProps) => (
          <input
            {...fieldProps}
            type="file"
            accept={IMPORT_ACCEPT}
            className={styles.fileInput}
            onChange={(event) => {
              setFile(event.target.files?.[0] ?? null);
              upload.reset();
            }}
          />
        )}
      </Field>
      <div className={styles.templates}>
        <Text>Start from a template:</Text>
        {downloadLink('csv', 'Download the CSV template')}
        {downloadLink('xlsx', 'Download the Excel template')}
      </div>
      {template.error ? (
        <FormAlert
          title="The template could not be downloaded"
          messages={[template.error.message]}
        />
      ) : null}
      <div className={styles.actions}>
        <Button
          type="submit"
          appearance="primary"
          icon={<ArrowUpload20Regular />}
          disabledFocusable={upload.isPending}
        >
          {upload.isPending ? 'Uploading…' : 'Upload'}
        </Button>
      </div>
    </form>
  );
}

/** The upload in a line: "parcels.csv for Alder Falls: 120 rows". */
export function uploadSummary(upload: ImportUploadResponse, chapterName: string): string {
  return `${upload.fileName} for ${chapterName}: ${upload.rowCount} ${upload.rowCount === 1 ? 'row' : 'rows'}`;
}
