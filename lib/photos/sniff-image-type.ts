// Tell a photo's format from its first bytes (magic numbers), never from a file name or a
// Content-Type header. Pure: runs in the browser and on the server.
import type { PhotoType } from './photo-limits';

const startsWith = (b: Uint8Array, sig: readonly number[], at = 0) => b.length >= at + sig.length && sig.every((v, i) => b[at + i] === v);
const ascii = (s: string) => [...s].map((c) => c.charCodeAt(0));

/** The photo type of these bytes (JPEG, PNG or WebP), or null for anything else. */
export function sniffImageType(head: Uint8Array): PhotoType | null {
  if (startsWith(head, [0xff, 0xd8, 0xff])) return 'image/jpeg';
  if (startsWith(head, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'image/png';
  // RIFF <size> WEBP
  if (startsWith(head, ascii('RIFF')) && startsWith(head, ascii('WEBP'), 8)) return 'image/webp';
  return null;
}

/** A plain name for what the bytes look like, for error messages. */
export function describeBytes(head: Uint8Array): string {
  if (head.length === 0) return 'an empty file';
  if (startsWith(head, ascii('GIF8'))) return 'a GIF image';
  if (startsWith(head, ascii('%PDF'))) return 'a PDF document';
  if (startsWith(head, [0x42, 0x4d])) return 'a BMP image';
  if (startsWith(head, ascii('ftyp'), 4)) return 'a HEIC/HEIF or video file';
  if (startsWith(head, [0x49, 0x49, 0x2a, 0x00]) || startsWith(head, [0x4d, 0x4d, 0x00, 0x2a])) return 'a TIFF image';
  if (startsWith(head, ascii('<'))) return 'text or markup';
  return 'a file of an unknown type';
}
