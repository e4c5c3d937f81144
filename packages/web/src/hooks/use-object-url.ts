import { useEffect, useState } from 'react';

/**
 * A Blob as an object URL for <img> or a link, revoked when the Blob changes or the component
 * goes. Files that need the sign-in header (scans, attachments) are fetched as Blobs first.
 */
export function useObjectUrl(blob: Blob | undefined): string | undefined {
  const [url, setUrl] = useState<string>();
  useEffect(() => {
    if (!blob) return undefined;
    const objectUrl = URL.createObjectURL(blob);
    setUrl(objectUrl);
    return () => {
      URL.revokeObjectURL(objectUrl);
      setUrl(undefined);
    };
  }, [blob]);
  return url;
}
