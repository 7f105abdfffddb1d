import { createHash, randomBytes } from 'node:crypto';

/**
 * Single-use secrets sent by e-mail (invitations, password resets). Only the SHA-256 hash is
 * stored, so a leaked database does not hand out working links; 32 random bytes make guessing
 * hopeless, so a fast unsalted hash is enough (unlike passwords, which need bcrypt).
 */

export const TOKEN_BYTES = 32;
export const INVITATION_LIFETIME_MS = 7 * 24 * 3600 * 1000;
export const PASSWORD_RESET_LIFETIME_MS = 3600 * 1000;

export interface IssuedToken {
  /** What goes in the link; never stored. */
  token: string;
  /** What the database keeps (hex SHA-256 of the token). */
  tokenHash: string;
  expiresAt: Date;
}

/** The stored hash of a token: hex SHA-256 of its UTF-8 text. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A new random token (base64url of 32 random bytes), its hash and its expiry. */
export function issueToken(lifetimeMs: number, now: Date = new Date(), secret: Buffer = randomBytes(TOKEN_BYTES)): IssuedToken {
  const token = secret.toString('base64url');
  return { token, tokenHash: hashToken(token), expiresAt: new Date(now.getTime() + lifetimeMs) };
}

export type TokenRefusal = 'used' | 'expired';

/**
 * Why a stored token may no longer be redeemed, or undefined when it may. Used wins over expired
 * so a person who already accepted is told so. Expiry is exclusive: at `expiresAt` it is gone.
 */
export function tokenRefusal(stored: { expiresAt: Date; usedAt: Date | null }, now: Date = new Date()): TokenRefusal | undefined {
  if (stored.usedAt) return 'used';
  if (now.getTime() >= stored.expiresAt.getTime()) return 'expired';
  return undefined;
}
