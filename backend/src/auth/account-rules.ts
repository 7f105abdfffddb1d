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
