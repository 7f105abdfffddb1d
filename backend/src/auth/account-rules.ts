import { badInput } from '../common/errors/domain-error';
import { MIN_PASSWORD_LENGTH } from './passwords';

/** E-mail addresses are kept and compared trimmed and lower-cased. */
export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

/** BAD_USER_INPUT on `password` when a new password is shorter than the minimum. */
export function requirePasswordLength(password: string): void {
  if (password.length < MIN_PASSWORD_LENGTH) {
    throw badInput('password', `a password needs at least ${MIN_PASSWORD_LENGTH} characters`);
  }
}

/** Longest e-mail address accepted anywhere (RFC 5321 allows 64 + 1 + 255). */
export const MAX_EMAIL_LENGTH = 320;
/** Longest password accepted (bcrypt reads the first 72 bytes; the bound keeps hashing's input small). */
export const MAX_PASSWORD_LENGTH = 200;

/** BAD_USER_INPUT before any lookup or hashing when an e-mail or a password is longer than accepted. */
export function requireBoundedCredentials(email: string, password?: string): void {
  if (email.length > MAX_EMAIL_LENGTH) throw badInput('email', `an e-mail address has at most ${MAX_EMAIL_LENGTH} characters`);
  if (password !== undefined && password.length > MAX_PASSWORD_LENGTH) {
    throw badInput('password', `a password has at most ${MAX_PASSWORD_LENGTH} characters`);
  }
}
