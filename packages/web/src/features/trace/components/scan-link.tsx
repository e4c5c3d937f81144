import { Link, Spinner, Text, tokens } from '@fluentui/react-components';
import type { TraceScan } from '@tallyloom/core';
import { useTraceScanUrl } from '../api/get-scan-file';

/**
 * A link that opens a receipt's scan in a new tab. The file needs the sign-in header, so it is
 * fetched first and offered as an object URL.
 */
export function ScanLink({ receiptId, scan }: { receiptId: number; scan: TraceScan }) {
  const file = useTraceScanUrl(receiptId, scan.id);
  if (file.isError) {
    return (
      <Text size={200} style={{ color: tokens.colorStatusDangerForeground1 }}>
        {scan.fileName}: could not be loaded
      </Text>
    );
  }
  if (!file.url) return <Spinner size="extra-tiny" label={`Loading ${scan.fileName}…`} />;
  return (
    <Link href={file.url} target="_blank" rel="noopener" aria-label={`Open scan ${scan.fileName}`}>
      {scan.fileName}
    </Link>
  );
}
