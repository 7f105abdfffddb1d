/**
 * The e-mails the API sends, as plain functions from their facts to subject, text and HTML, so
 * wording is tested without a mail server. Links go in both bodies; the text body alone must work.
 */

export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export interface InvitationMailFacts {
  projectName: string;
  role: string;
  inviterName: string;
  link: string;
  expiresAt: Date;
}

export interface PasswordResetMailFacts {
  displayName: string;
  link: string;
  expiresAt: Date;
}

/** Escape text for HTML element content and double-quoted attributes. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}

function paragraphs(lines: string[], link: string): string {
  const body = lines.map((line) => (line === link ? `<p><a href="${escapeHtml(link)}">${escapeHtml(link)}</a></p>` : `<p>${escapeHtml(line)}</p>`));
  return `<!doctype html><html><body>${body.join('')}</body></html>`;
}

export function invitationMail(facts: InvitationMailFacts): MailContent {
  const lines = [
    `${facts.inviterName} invites you to the Stratochron project "${facts.projectName}" as ${facts.role}.`,
    'Open this link to set your password and join:',
    facts.link,
    `The link works once and expires at ${facts.expiresAt.toISOString()}.`,
    'If you did not expect this invitation, ignore this message.',
  ];
  return { subject: `Invitation to ${facts.projectName} on Stratochron`, text: lines.join('\n\n'), html: paragraphs(lines, facts.link) };
}

export function passwordResetMail(facts: PasswordResetMailFacts): MailContent {
  const lines = [
    `Hello ${facts.displayName},`,
    'someone asked to reset the password of your Stratochron account. Open this link to choose a new one:',
    facts.link,
    `The link works once and expires at ${facts.expiresAt.toISOString()}.`,
    'If it was not you, ignore this message: your password stays as it is.',
  ];
  return { subject: 'Reset your Stratochron password', text: lines.join('\n\n'), html: paragraphs(lines, facts.link) };
}
