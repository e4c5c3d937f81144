import { Field, Link, makeStyles, ProgressBar, Text, tokens } from '@fluentui/react-components';
import { ArrowDownload20Regular } from '@fluentui/react-icons';
import type { ExportView } from '@tallyloom/core';
import { FormAlert } from '@/components/ui/form-alert';
import { formatCount, formatDateTime } from '@/lib/format';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  description: { margin: 0, color: tokens.colorNeutralForeground2 },
  download: {
    display: 'inline-flex',
    alignSelf: 'flex-start',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    fontWeight: tokens.fontWeightSemibold,
  },
  line: { margin: 0 },
});

/** "1,204 rows on 1 sheet": what the finished file holds. */
export function exportContents(view: ExportView): string {
  const rows = view.rows ?? 0;
  const sheets = view.sheets ?? 1;
  const rowWord = rows === 1 ? 'row' : 'rows';
  if (view.format === 'csv') return `${formatCount(rows)} ${rowWord}`;
  return `${formatCount(rows)} ${rowWord} on ${formatCount(sheets)} ${sheets === 1 ? 'sheet' : 'sheets'}`;
}

/** Where one export stands: the bar while it is written, then the link, or why it failed. */
export function ExportStatus({ view }: { view: ExportView }) {
  const styles = useStyles();
  let body;
  switch (view.state) {
    case 'queued':
    case 'running':
      body = (
        <Field
          label={view.state === 'queued' ? 'Waiting for its turn…' : `Writing ${view.fileName}…`}
          hint={`${Math.round(view.progress)}% done`}
        >
          <ProgressBar value={view.progress} max={100} thickness="large" />
        </Field>
      );
      break;
    case 'done':
      body = (
        <>
          <Text as="p" className={styles.line}>
            Ready: {exportContents(view)}.
          </Text>
          {view.downloadUrl ? (
            // A plain link: the signed address works without the sign-in header.
            <Link href={view.downloadUrl} download={view.fileName} className={styles.download}>
              <ArrowDownload20Regular aria-hidden="true" />
              Download {view.fileName}
            </Link>
          ) : null}
          <Text as="p" size={200} className={styles.description}>
            The link works until {formatDateTime(view.expiresAt)}; then the file is removed.
          </Text>
        </>
      );
      break;
    case 'failed':
      body = (
        <FormAlert
          title="The export failed"
          messages={[view.error ?? 'The server did not say why.']}
        />
      );
      break;
    case 'expired':
      body = (
        <Text as="p" className={styles.line}>
          The link has expired and the file was removed. Export again for a fresh copy.
        </Text>
      );
      break;
  }
  return (
    <div className={styles.root}>
      <Text as="p" className={styles.description}>
        {view.description}
      </Text>
      <div aria-live="polite" className={styles.root}>
        {body}
      </div>
    </div>
  );
}
