/**
 * Just enough of a MIME reader for the local SMTP fake to show what the API sent: headers, the
 * plain-text and HTML bodies of single-part and multipart messages, quoted-printable and base64
 * transfer encodings (RFC 2045 §6.7, §6.8) and encoded-word headers (RFC 2047). Not a general
 * mail parser: attachments are skipped.
 */

export interface ParsedMessage {
  headers: Record<string, string>;
  subject: string;
  text?: string;
  html?: string;
}

/** Decode a quoted-printable body (RFC 2045 §6.7): `=XX` octets and `=` soft line breaks. */
export function decodeQuotedPrintable(encoded: string): Buffer {
  const unwrapped = encoded.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < unwrapped.length; i += 1) {
    const char = unwrapped[i];
    const hex = unwrapped.slice(i + 1, i + 3);
    if (char === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(char, 'utf8'));
    }
  }
  return Buffer.from(bytes);
}

/** Decode RFC 2047 encoded words (`=?utf-8?Q?...?=`, `=?utf-8?B?...?=`) in a header value. */
export function decodeEncodedWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_match, charset: string, encoding: string, payload: string) => {
      const bytes =
        encoding.toUpperCase() === 'B'
          ? Buffer.from(payload, 'base64')
          : decodeQuotedPrintable(payload.replace(/_/g, ' '));
      return bytes.toString(/^utf-?8$/i.test(charset) ? 'utf8' : 'latin1');
    });
}

function splitHeaders(raw: string): { headers: Record<string, string>; body: string } {
  const match = /\r?\n\r?\n/.exec(raw);
  const head = match ? raw.slice(0, match.index) : raw;
  const body = match ? raw.slice(match.index + match[0].length) : '';
  const headers: Record<string, string> = {};
  // Folded header lines continue with leading whitespace (RFC 5322 §2.2.3).
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0) headers[line.slice(0, colon).trim().toLowerCase()] = line.slice(colon + 1).trim();
  }
  return { headers, body };
}

function parameter(headerValue: string, name: string): string | undefined {
  const match = new RegExp(`;\\s*${name}="?([^";]+)"?`, 'i').exec(headerValue);
  return match?.[1];
}

function decodeBody(body: string, transferEncoding: string | undefined, contentType: string): string {
  const charset = parameter(contentType, 'charset') ?? 'utf-8';
  const encoding = (transferEncoding ?? '7bit').toLowerCase();
  const bytes =
    encoding === 'quoted-printable'
      ? decodeQuotedPrintable(body)
      : encoding === 'base64'
        ? Buffer.from(body.replace(/\s+/g, ''), 'base64')
        : Buffer.from(body, 'utf8');
  return bytes.toString(/^utf-?8$/i.test(charset) ? 'utf8' : 'latin1');
}

function collectParts(raw: string, into: { text?: string; html?: string }): Record<string, string> {
  const { headers, body } = splitHeaders(raw);
  const contentType = headers['content-type'] ?? 'text/plain';
  const mediaType = contentType.split(';')[0].trim().toLowerCase();
  if (mediaType.startsWith('multipart/')) {
    const boundary = parameter(contentType, 'boundary');
    if (boundary) {
      const delimiter = `--${boundary}`;
      const sections = body.split(delimiter).slice(1);
      for (const section of sections) {
        if (section.startsWith('--')) break;
        collectParts(section.replace(/^\r?\n/, ''), into);
      }
    }
  } else if (!/attachment/i.test(headers['content-disposition'] ?? '')) {
    const decoded = decodeBody(body, headers['content-transfer-encoding'], contentType).replace(/\r?\n$/, '');
    if (mediaType === 'text/plain' && into.text === undefined) into.text = decoded;
    if (mediaType === 'text/html' && into.html === undefined) into.html = decoded;
  }
  return headers;
}

/** Read a raw RFC 5322 message into its headers, subject and text/HTML bodies. */
export function parseMessage(raw: string): ParsedMessage {
  const bodies: { text?: string; html?: string } = {};
  const headers = collectParts(raw, bodies);
  return { headers, subject: decodeEncodedWords(headers.subject ?? ''), ...bodies };
}
