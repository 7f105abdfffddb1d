import type { Role } from '@/gql/graphql';
import { valuesOf } from '@/modules/api/utils/vocabulary';
import { ROLE_LABELS } from '@/modules/auth/utils/permissions';
import { FieldReader, type FormResult } from '@/modules/ui/utils/formFields';

/** The server's minimum (backend auth/passwords.ts), checked here so the form answers at once. */
export const MIN_PASSWORD_LENGTH = 10;

const EMAIL_PATTERN: [RegExp, string] = [/^[^\s@]+@[^\s@]+\.[^\s@]+$/, 'not an e-mail address'];

export type NewPasswordField = 'password' | 'confirmation';

/** A new password typed twice: long enough, and the same both times. */
export function readNewPassword(password: string, confirmation: string): FormResult<{ password: string }, NewPasswordField> {
  const reader = new FieldReader<NewPasswordField>();
  if (password === '') reader.fail('password', 'required');
  else if (password.length < MIN_PASSWORD_LENGTH) reader.fail('password', `at least ${MIN_PASSWORD_LENGTH} characters`);
  if (confirmation !== password) reader.fail('confirmation', 'the two passwords differ');
  return reader.result({ password });
}

export type InvitationField = 'email' | 'role';

/** An invitation: an e-mail address (trimmed, lower-cased as the server stores it) and a role. */
export function readInvitation(email: string, role: Role): FormResult<{ email: string; role: Role }, InvitationField> {
  const reader = new FieldReader<InvitationField>();
  const address = reader.text('email', email, { required: true, pattern: EMAIL_PATTERN });
  return reader.result({ email: address.toLowerCase(), role });
}

/** An e-mail address for the reset request. */
export function readResetEmail(email: string): FormResult<{ email: string }, 'email'> {
  const reader = new FieldReader<'email'>();
  const address = reader.text('email', email, { required: true, pattern: EMAIL_PATTERN });
  return reader.result({ email: address });
}

/**
 * Where to land after accepting an invitation: the one project the person belongs to, else
 * the list (an existing account joining a further project, whose id the answer does not name).
 */
export function landingProjectId(memberships: readonly { project: { id: string } }[]): string | null {
  return memberships.length === 1 ? (memberships[0]?.project.id ?? null) : null;
}

/** Every role, most rights first, in the order the role menus list them (that of ROLE_LABELS). */
export const ROLES = valuesOf(ROLE_LABELS);
