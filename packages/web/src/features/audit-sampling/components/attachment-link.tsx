import { Link, Spinner, Text } from '@fluentui/react-components';
import { useAttachmentUrl } from '../api/get-attachment';

/** Opens a worksheet attachment in a new tab; it is fetched with the sign-in first. */
export function AttachmentLink({
  sampleId,
  itemId,
  itemName,
}: {
  sampleId: number;
  itemId: number;
  itemName: string;
}) {
  const file = useAttachmentUrl(sampleId, itemId);
  if (file.isError) return <Text size={200}>Could not be loaded</Text>;
  if (!file.url) return <Spinner size="extra-tiny" label="Loading the attachment…" />;
  return (
    <Link
      href={file.url}
      target="_blank"
      rel="noopener"
      aria-label={`Open the attachment of ${itemName}`}
    >
      Open
    </Link>
  );
}
