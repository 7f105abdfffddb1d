import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { hashToken, INVITATION_LIFETIME_MS, issueToken, PASSWORD_RESET_LIFETIME_MS, tokenRefusal } from './one-time-token';

describe(hashToken.name, () => {
  it('is hex SHA-256: the FIPS 180-2 "abc" test vector', () => {
    // FIPS 180-2, Appendix B.1: SHA-256("abc").
    expect(hashToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});

describe(issueToken.name, () => {
  const now = new Date('2031-03-04T05:06:07.000Z');

  it('encodes 32 bytes as unpadded base64url and stores only the hash of that text', () => {
    const secret = Buffer.alloc(32, 0xff);
    const issued = issueToken(PASSWORD_RESET_LIFETIME_MS, now, secret);
    // 32 bytes = 256 bits -> ceil(256 / 6) = 43 base64url characters, no padding (RFC 4648 §5).
    expect(issued.token).toBe('_'.repeat(42) + '8');
    expect(issued.tokenHash).toBe(createHash('sha256').update(issued.token).digest('hex'));
    expect(issued.tokenHash).not.toContain(issued.token);
  });

  it('expires 7 days after issue for invitations and 1 hour for password resets', () => {
    expect(issueToken(INVITATION_LIFETIME_MS, now).expiresAt.toISOString()).toBe('2031-03-11T05:06:07.000Z');
    expect(issueToken(PASSWORD_RESET_LIFETIME_MS, now).expiresAt.toISOString()).toBe('2031-03-04T06:06:07.000Z');
  });

  it('gives a different token each time', () => {
    const tokens = new Set(Array.from({ length: 50 }, () => issueToken(1000).token));
    expect(tokens.size).toBe(50);
  });
});

describe(tokenRefusal.name, () => {
  const expiresAt = new Date('2031-03-04T06:00:00.000Z');

  it('accepts an unused token before its expiry', () => {
    expect(tokenRefusal({ expiresAt, usedAt: null }, new Date('2031-03-04T05:59:59.999Z'))).toBeUndefined();
  });

  it('refuses at and after the expiry instant', () => {
    expect(tokenRefusal({ expiresAt, usedAt: null }, expiresAt)).toBe('expired');
    expect(tokenRefusal({ expiresAt, usedAt: null }, new Date('2031-03-05T00:00:00.000Z'))).toBe('expired');
  });

  it('refuses a used token, saying used even when it has also expired', () => {
    const usedAt = new Date('2031-03-04T05:00:00.000Z');
    expect(tokenRefusal({ expiresAt, usedAt }, new Date('2031-03-04T05:30:00.000Z'))).toBe('used');
    expect(tokenRefusal({ expiresAt, usedAt }, new Date('2031-03-09T00:00:00.000Z'))).toBe('used');
  });
});
