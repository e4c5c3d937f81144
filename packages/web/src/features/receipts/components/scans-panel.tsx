import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  Field,
  Link,
  makeStyles,
  ProgressBar,
  Spinner,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ArrowUpload20Regular, Delete20Regular, DocumentPdf24Regular } from '@fluentui/react-icons';
import type { ScanView } from '@tallyloom/core';
import { useRef, useState } from 'react';
import { useNotify } from '@/components/ui/app-toaster';
import { FormAlert } from '@/components/ui/form-alert';
import { formatDateTime, formatFileSize } from '@/lib/format';
import { useDeleteScan } from '../api/delete-scan';
import { useScanFileUrl } from '../api/get-scan-file';
import { SCAN_ACCEPT, useUploadScan } from '../api/upload-scan';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  upload: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    maxWidth: '480px',
  },
  hiddenInput: { display: 'none' },
  list: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalM,
  },
  card: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
    padding: tokens.spacingHorizontalS,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
  },
  preview: {
    height: '120px',
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: tokens.colorNeutralBackground2,
    borderRadius: tokens.borderRadiusSmall,
    overflow: 'hidden',
  },
  thumbnail: { maxWidth: '100%', maxHeight: '120px', objectFit: 'contain' },
  pdfIcon: { color: tokens.colorBrandForeground1 },
  name: { overflowWrap: 'anywhere', fontWeight: tokens.fontWeightSemibold },
  meta: { color: tokens.colorNeutralForeground2 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, alignItems: 'center' },
});

function ScanPreview({ receiptId, scan }: { receiptId: number; scan: ScanView }) {
  const styles = useStyles();
  const file = useScanFileUrl({ receiptId, scanId: scan.id });
  const isPdf = scan.mediaType === 'application/pdf';
  let preview;
  if (file.isError) preview = <Text className={styles.meta}>Could not load the file</Text>;
  else if (!file.url) preview = <Spinner size="tiny" aria-label={`Loading ${scan.fileName}`} />;
  else if (isPdf) preview = <DocumentPdf24Regular className={styles.pdfIcon} aria-hidden="true" />;
  else preview = <img src={file.url} alt={`Scan: ${scan.fileName}`} className={styles.thumbnail} />;
  return (
    <>
      <div className={styles.preview}>{preview}</div>
      {file.url ? (
        <Link href={file.url} target="_blank" rel="noopener" aria-label={`Open ${scan.fileName}`}>
          Open
        </Link>
      ) : null}
    </>
  );
}

function DeleteScanButton({ receiptId, scan }: { receiptId: number; scan: ScanView }) {
  const [open, setOpen] = useState(false);
  const remove = useDeleteScan();
  const notify = useNotify();
  return (
    <Dialog modalType="alert" open={open} onOpenChange={(_event, data) => setOpen(data.open)}>
      <DialogTrigger disableButtonEnhancement>
        <Button
          size="small"
          appearance="subtle"
          icon={<Delete20Regular />}
          aria-label={`Delete ${scan.fileName}`}
        />
      </DialogTrigger>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>Delete {scan.fileName}?</DialogTitle>
          <DialogContent>
            <Text as="p">
              The scan is removed from this parcel and its file deleted. The parcel&apos;s counts
              stay as they are.
            </Text>
            <FormAlert messages={remove.isError ? [remove.error.message] : []} />
          </DialogContent>
          <DialogActions>
            <DialogTrigger disableButtonEnhancement>
              <Button>Keep it</Button>
            </DialogTrigger>
            <Button
              appearance="primary"
              disabledFocusable={remove.isPending}
              onClick={() =>
                remove.mutate(
                  { receiptId, scanId: scan.id },
                  {
                    onSuccess: () => {
                      notify(`${scan.fileName} deleted.`);
                      setOpen(false);
                    },
                  },
                )
              }
            >
              {remove.isPending ? 'Deleting…' : 'Delete scan'}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}

export interface ScansPanelProps {
  receiptId: number;
  scans: ScanView[];
  /** May attach and delete scans ('receipts.write'). */
  mayChange: boolean;
}

/** Scans and photos of the label or packing slip: previews, upload and removal. */
export function ScansPanel({ receiptId, scans, mayChange }: ScansPanelProps) {
  const styles = useStyles();
  const upload = useUploadScan();
  const notify = useNotify();
  const input = useRef<HTMLInputElement>(null);

  const send = (file: File) =>
    upload.mutate(
      { receiptId, file },
      { onSuccess: (scan) => notify(`${scan.fileName} attached.`) },
    );

  return (
    <div className={styles.root}>
      {mayChange ? (
        <div className={styles.upload}>
          <input
            ref={input}
            type="file"
            accept={SCAN_ACCEPT}
            aria-label="Attach a scan or photo"
            className={styles.hiddenInput}
            onChange={(event) => {
              const file = event.target.files?.[0];
              event.target.value = '';
              if (file) send(file);
            }}
          />
          <div className={styles.actions}>
            <Button
              icon={<ArrowUpload20Regular />}
              disabledFocusable={upload.isPending}
              onClick={() => input.current?.click()}
            >
              Attach a scan or photo…
            </Button>
            <Text size={200} className={styles.meta}>
              JPEG, PNG, WebP or PDF of the label or packing slip.
            </Text>
          </div>
          {upload.isPending ? (
            <Field label={`Uploading ${upload.variables.file.name}…`}>
              <ProgressBar />
            </Field>
          ) : null}
          {upload.isError ? (
            <FormAlert title="The file was not attached" messages={[upload.error.message]} />
          ) : null}
        </div>
      ) : null}
      {scans.length === 0 ? (
        <Text as="p" className={styles.meta}>
          No scans attached.
        </Text>
      ) : (
        <ul className={styles.list} aria-label="Scans">
          {scans.map((scan) => (
            <li key={scan.id} className={styles.card}>
              <ScanPreview receiptId={receiptId} scan={scan} />
              <Text className={styles.name}>{scan.fileName}</Text>
              <Text size={200} className={styles.meta}>
                {formatFileSize(scan.sizeBytes)} · {formatDateTime(scan.uploadedAt)}
              </Text>
              {mayChange ? (
                <div className={styles.actions}>
                  <DeleteScanButton receiptId={receiptId} scan={scan} />
                </div>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
