import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { ChapterView, ImportUploadResponse } from '@tallyloom/core';
import { useEffect, useRef, useState } from 'react';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { useChapters } from '@/features/network/api/get-chapters';
import { useBlanketSizes } from '@/features/receipts/api/get-blanket-sizes';
import { useSessionUser } from '@/lib/session/use-session';
import { useCommitImport } from '../api/commit-import';
import type { ImportMapping } from '../api/preview-import';
import { CheckStep } from './check-step';
import { ImportStep } from './import-step';
import { IMPORT_STEPS, ImportStepper } from './import-stepper';
import { MappingStep } from './mapping-step';
import { uploadSummary, UploadStep } from './upload-step';

const useStyles = makeStyles({
  heading: { margin: 0, marginBottom: tokens.spacingVerticalXS, outline: 'none' },
  summary: {
    display: 'block',
    marginBottom: tokens.spacingVerticalM,
    color: tokens.colorNeutralForeground2,
  },
});

const UPLOAD = 0;
const MATCH = 1;
const CHECK = 2;
const IMPORT = 3;

/** The chapter to start with: a chapter lead's own, or the only one there is. */
function defaultChapterId(chapters: ChapterView[], ownChapterId: number | null): number | null {
  if (ownChapterId !== null && chapters.some((chapter) => chapter.id === ownChapterId))
    return ownChapterId;
  return chapters.length === 1 ? (chapters[0]?.id ?? null) : null;
}

/** Upload → match columns → check rows → import: every row in one batch, or none. */
export function ImportWizard() {
  const styles = useStyles();
  const user = useSessionUser();
  const chapters = useChapters();
  const sizes = useBlanketSizes();
  const commit = useCommitImport();
  const [step, setStep] = useState(UPLOAD);
  const [chapterChoice, setChapterChoice] = useState<number | null | undefined>(undefined);
  const [upload, setUpload] = useState<ImportUploadResponse | null>(null);
  const [mapping, setMapping] = useState<ImportMapping>({});

  // Each step's heading takes the focus when the step opens, so a screen reader hears where it is.
  const heading = useRef<HTMLHeadingElement>(null);
  const opened = useRef(false);
  useEffect(() => {
    if (opened.current) heading.current?.focus();
    opened.current = true;
  }, [step]);

  if (chapters.isPending) return <LoadingState label="Loading chapters…" />;
  if (chapters.isError) {
    return (
      <ErrorState
        title="Chapters could not be loaded"
        error={chapters.error}
        onRetry={() => void chapters.refetch()}
        retrying={chapters.isFetching}
      />
    );
  }

  // Parcels arrive at open chapters only.
  const openChapters = chapters.data.filter((chapter) => chapter.activeTo === null);
  const ownChapterId = user?.role === 'chapter_lead' ? (user.chapterId ?? null) : null;
  const chapterId =
    chapterChoice === undefined ? defaultChapterId(openChapters, ownChapterId) : chapterChoice;
  const chapterName =
    chapters.data.find((chapter) => chapter.id === (upload?.chapterId ?? chapterId))?.name ??
    'the chapter';
  const sizeList = sizes.data ?? [];

  const uploadCorrected = () => {
    // The chapter stays; the file, the mapping and any result go.
    setChapterChoice(upload?.chapterId ?? chapterId);
    setUpload(null);
    setMapping({});
    commit.reset();
    setStep(UPLOAD);
  };

  const startImport = () => {
    if (!upload) return;
    setStep(IMPORT);
    commit.mutate({ importId: upload.importId, mapping });
  };

  const done = !!commit.data;
  const stepName = IMPORT_STEPS[step] ?? '';

  let body;
  if (step === UPLOAD || !upload) {
    body = (
      <UploadStep
        chapters={openChapters}
        chapterId={chapterId}
        onChapterChange={setChapterChoice}
        onUploaded={(uploaded) => {
          setUpload(uploaded);
          setMapping({ ...uploaded.suggestedMapping });
          setStep(MATCH);
        }}
      />
    );
  } else if (step === MATCH) {
    body = (
      <MappingStep
        upload={upload}
        sizes={sizeList}
        mapping={mapping}
        onMappingChange={setMapping}
        onCheck={() => setStep(CHECK)}
        onBack={uploadCorrected}
      />
    );
  } else if (step === CHECK) {
    body = (
      <CheckStep
        upload={upload}
        mapping={mapping}
        sizes={sizeList}
        onUploadCorrected={uploadCorrected}
        onChangeMapping={() => setStep(MATCH)}
        onImport={startImport}
      />
    );
  } else {
    body = (
      <ImportStep
        chapterId={upload.chapterId}
        rowCount={upload.rowCount}
        pending={commit.isPending}
        result={commit.data}
        error={commit.error}
        onRetry={startImport}
        onUploadCorrected={uploadCorrected}
        onImportAnother={uploadCorrected}
      />
    );
  }

  return (
    <>
      <ImportStepper
        current={step}
        onOpen={
          done || commit.isPending
            ? undefined
            : (target) => (target === UPLOAD ? uploadCorrected() : setStep(target))
        }
      />
      <section aria-labelledby="import-step-heading">
        <Text
          as="h2"
          id="import-step-heading"
          size={500}
          weight="semibold"
          className={styles.heading}
          ref={heading}
          tabIndex={-1}
        >
          {`Step ${step + 1} of ${IMPORT_STEPS.length}: ${stepName}`}
        </Text>
        {upload && step > UPLOAD ? (
          <Text className={styles.summary}>{uploadSummary(upload, chapterName)}</Text>
        ) : null}
        {body}
      </section>
    </>
  );
}
