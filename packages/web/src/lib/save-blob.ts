/**
 * Hands a fetched file to the browser as a download. Files behind the sign-in header are fetched
 * as Blobs first, since a plain link cannot send the bearer token.
 */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  try {
    const link = document.createElement('a');
    link.href = url;
    link.download = fileName;
    document.body.append(link);
    link.click();
    link.remove();
  } finally {
    // Give the browser a moment to start the download before the URL goes.
    setTimeout(() => URL.revokeObjectURL(url), 1_000);
  }
}
