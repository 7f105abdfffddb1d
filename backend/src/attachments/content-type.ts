/**
 * Which files an attachment may be, decided from the bytes and never from the file name: a
 * `.png` that is really an executable is refused. Signatures: PNG (ISO/IEC 15948 / RFC 2083,
 * section 3.1: the 8-byte signature followed by the IHDR chunk), JPEG (ITU-T T.81 / JFIF: SOI
 * marker FF D8 followed by a marker FF), PDF (ISO 32000-1, section 7.5.2: the header `%PDF-`).
 * Text (CSV, plain) is accepted when it is valid UTF-8 (RFC 3629) holding no NUL byte.
 */
export type AttachmentContentType = 'image/png' | 'image/jpeg' | 'application/pdf' | 'text/csv' | 'text/plain';

export const ALLOWED_CONTENT_TYPES: readonly AttachmentContentType[] = ['image/png', 'image/jpeg', 'application/pdf', 'text/csv', 'text/plain'];

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const IHDR = [0x49, 0x48, 0x44, 0x52];
const PDF_HEADER = [0x25, 0x50, 0x44, 0x46, 0x2d];

function startsWith(bytes: Uint8Array, signature: readonly number[], offset = 0): boolean {
  if (bytes.length < offset + signature.length) return false;
  for (let i = 0; i < signature.length; i++) if (bytes[offset + i] !== signature[i]) return false;
  return true;
}

/** True when the bytes decode as UTF-8 without error and contain no NUL. */
export function isUtf8Text(bytes: Uint8Array): boolean {
  if (bytes.includes(0)) return false;
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return true;
  } catch {
    return false;
  }
}

/**
 * The content type of an upload from its leading bytes, or null when it is none of the allowed
 * kinds. The file name only chooses between the two text types (`.csv` or plain), both served as
 * text, so a misleading name cannot make text into anything else.
 */
export function sniffContentType(bytes: Uint8Array, fileName: string): AttachmentContentType | null {
  if (startsWith(bytes, PNG_SIGNATURE)) return startsWith(bytes, IHDR, 12) ? 'image/png' : null;
  if (bytes.length >= 4 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  if (startsWith(bytes, PDF_HEADER)) return 'application/pdf';
  if (bytes.length > 0 && isUtf8Text(bytes)) return /\.csv$/i.test(fileName.trim()) ? 'text/csv' : 'text/plain';
  return null;
}

/** Images are shown inline and get thumbnails (`ThumbnailJob`). */
export function isImage(contentType: string): boolean {
  return contentType === 'image/png' || contentType === 'image/jpeg';
}

/**
 * Characters a stored file name may not keep: control characters (C0, DEL, C1) and the Unicode
 * bidirectional formatting characters (Unicode Standard Annex #9: LRM, RLM, ALM, LRE..RLO,
 * LRI..PDI), which can make `report\u202Efdp.exe` read as `reportexe.pdf`.
 */
const UNSAFE_NAME_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/** Longest stored file name, characters. */
export const MAX_FILE_NAME_LENGTH = 255;

/** A file name as stored and sent back: no path separators, controls or bidi overrides; never empty. */
export function safeFileName(fileName: string): string {
  const cleaned = fileName.replace(UNSAFE_NAME_CHARACTERS, '').replace(/[\\/]+/g, '_').trim().slice(0, MAX_FILE_NAME_LENGTH);
  return cleaned === '' ? 'file' : cleaned;
}
