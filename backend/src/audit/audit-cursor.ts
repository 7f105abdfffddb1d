/**
 * Audit trail cursors: opaque to clients, they carry the sequence number of the last record seen.
 * The prefix lets a cursor from another list be told apart from a malformed one.
 */
const PREFIX = 'audit:';

export function encodeAuditCursor(seq: number): string {
  return Buffer.from(`${PREFIX}${seq}`, 'utf8').toString('base64url');
}

/** The sequence number in a cursor, or undefined when it is not one of ours. */
export function decodeAuditCursor(cursor: string): number | undefined {
  const text = Buffer.from(cursor, 'base64url').toString('utf8');
  if (!text.startsWith(PREFIX)) return undefined;
  const digits = text.slice(PREFIX.length);
  if (!/^[1-9][0-9]{0,15}$/.test(digits)) return undefined;
  const seq = Number(digits);
  return Number.isSafeInteger(seq) ? seq : undefined;
}
