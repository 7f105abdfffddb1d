import { describe, expect, it } from 'vitest';
import { escapeHtml, invitationMail, passwordResetMail } from './mail-templates';

describe(escapeHtml.name, () => {
  it('escapes the five HTML-special characters', () => {
    expect(escapeHtml(`<a href="x">O'Neil & co</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;O&#39;Neil &amp; co&lt;/a&gt;');
  });
});

describe(invitationMail.name, () => {
  const facts = {
    projectName: 'Tern <Estuary>',
    role: 'RESEARCHER',
    inviterName: 'Mere',
    link: 'http://127.0.0.1:3000/accept-invitation?token=abc&x=1',
    expiresAt: new Date('2031-01-08T00:00:00Z'),
  };

  it('puts the link verbatim in the text body and escaped in the HTML body', () => {
    const mail = invitationMail(facts);
    expect(mail.subject).toBe('Invitation to Tern <Estuary> on Stratochron');
    expect(mail.text).toContain(`\n${facts.link}\n`);
    expect(mail.text).toContain('as RESEARCHER');
    expect(mail.html).toContain('href="http://127.0.0.1:3000/accept-invitation?token=abc&amp;x=1"');
    expect(mail.html).toContain('Tern &lt;Estuary&gt;');
    expect(mail.html).not.toContain('<Estuary>');
  });
});

describe(passwordResetMail.name, () => {
  it('names the person and the expiry', () => {
    const mail = passwordResetMail({ displayName: 'Ana', link: 'http://h/reset-password?token=t', expiresAt: new Date('2031-01-01T01:00:00Z') });
    expect(mail.text).toContain('Hello Ana,');
    expect(mail.text).toContain('2031-01-01T01:00:00.000Z');
    expect(mail.text).toContain('http://h/reset-password?token=t');
  });
});
