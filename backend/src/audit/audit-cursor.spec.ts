import { describe, expect, it } from 'vitest';
import { decodeAuditCursor, encodeAuditCursor } from './audit-cursor';

describe(encodeAuditCursor.name, () => {
  it('is base64url of "audit:<seq>" (RFC 4648 §5, checked by hand)', () => {
    // "audit:42" -> 61 75 64 69 74 3a 34 32 -> YXVk aXQ6 NDI (no padding).
    expect(encodeAuditCursor(42)).toBe('YXVkaXQ6NDI');
  });
});

describe(decodeAuditCursor.name, () => {
  it('round-trips sequence numbers up to the largest safe integer', () => {
    for (const seq of [1, 42, 1_000_000, Number.MAX_SAFE_INTEGER]) expect(decodeAuditCursor(encodeAuditCursor(seq))).toBe(seq);
  });

  it('refuses cursors that are not ours', () => {
    expect(decodeAuditCursor('nonsense')).toBeUndefined();
    expect(decodeAuditCursor(Buffer.from('audit:-3').toString('base64url'))).toBeUndefined();
    expect(decodeAuditCursor(Buffer.from('audit:0').toString('base64url'))).toBeUndefined();
    expect(decodeAuditCursor(Buffer.from('release:5').toString('base64url'))).toBeUndefined();
    expect(decodeAuditCursor(Buffer.from('audit:99999999999999999').toString('base64url'))).toBeUndefined();
  });
});
