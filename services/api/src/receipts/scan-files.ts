import { fromBuffer } from 'file-type';

/** The media types a scan may have, recognised by their content (magic bytes), never the name. */
export const SCAN_MEDIA_TYPES: Record<string, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'application/pdf': 'pdf',
};

/** A file's real type, told by its content (never the name or the type the browser claims). */
export type ScanType =
  | { accepted: true; mime: string; extension: string }
  | { accepted: false; /** What the content is, in words, for the refusal. */ found: string };

export async function scanTypeOf(content: Buffer): Promise<ScanType> {
  const detected = await fromBuffer(content);
  const extension = detected ? SCAN_MEDIA_TYPES[detected.mime] : undefined;
  if (!detected || !extension) return { accepted: false, found: detected?.mime ?? 'none of these' };
  return { accepted: true, mime: detected.mime, extension };
}

// Control characters, zero-width and bidirectional marks: they can disguise a name's extension.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const UNSAFE_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2066-\u2069]/g;

const EXTENSIONS_OF: Record<string, string[]> = { jpg: ['jpg', 'jpeg'] };

/**
 * The uploaded name, fit to show and to offer on download: no folders (`../`), no control or
 * direction characters, no leading dots, ending in the extension of what the file really is,
 * at most 255 characters. It is never used to store the file.
 */
export function cleanDisplayName(raw: string | undefined, extension: string): string {
  const base = (raw ?? '').split(/[\\/]/).pop() ?? '';
  let name = base
    .normalize('NFC')
    .replace(UNSAFE_CHARACTERS, '')
    .trim()
    .replace(/^[.\s]+/, '');
  if (!name) name = 'scan';
  const given = /\.([^.]+)$/.exec(name)?.[1]?.toLowerCase();
  const suffix = (EXTENSIONS_OF[extension] ?? [extension]).includes(given ?? '')
    ? ''
    : `.${extension}`;
  return [...name].slice(0, 255 - suffix.length).join('') + suffix;
}

/** `inline` with an ASCII fallback name and the exact name in RFC 5987 form. */
export function inlineDisposition(name: string): string {
  const fallback = name.replace(/[^\x20-\x7e]|["\\%;]/g, '_');
  const encoded = encodeURIComponent(name).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
  return `inline; filename="${fallback}"; filename*=UTF-8''${encoded}`;
}
