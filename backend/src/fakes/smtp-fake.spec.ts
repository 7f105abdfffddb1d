import { createTransport } from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CapturedMessage, SmtpFake, startSmtpFake } from './smtp-fake';

describe(startSmtpFake.name, () => {
  let fake: SmtpFake;

  beforeAll(async () => {
    fake = await startSmtpFake();
  });

  afterAll(async () => {
    await fake.close();
  });

  it('captures what nodemailer sends and lists it over HTTP, decoded', async () => {
    // nodemailer is the independent encoder here: it quoted-printables the body, wraps long
    // lines and encodes the non-ASCII subject; the fake must give back exactly what went in.
    const link = `http://127.0.0.1:3000/accept-invitation?token=${'Ab-_9'.repeat(12)}`;
    const transport = createTransport({ host: '127.0.0.1', port: fake.smtpPort, secure: false, auth: { user: 'u', pass: 'p' } });
    await transport.sendMail({
      from: 'Stratochron <no-reply@stratochron.test>',
      to: 'hana@example.test',
      subject: 'Invitation to Kōwhai Bay trenches',
      text: `Follow ${link} to join.`,
      html: `<a href="${link}">join</a>`,
    });
    transport.close();

    const response = await fetch(`${fake.listingUrl}/messages`);
    const listed = (await response.json()) as CapturedMessage[];
    expect(listed).toHaveLength(1);
    expect(listed[0]).toMatchObject({
      from: 'no-reply@stratochron.test',
      to: ['hana@example.test'],
      subject: 'Invitation to Kōwhai Bay trenches',
      text: `Follow ${link} to join.`,
      html: `<a href="${link}">join</a>`,
    });
    expect(fake.messages()[0].id).toBe(listed[0].id);

    await fetch(`${fake.listingUrl}/messages`, { method: 'DELETE' });
    expect(fake.messages()).toEqual([]);
  });
});
