import { describe, expect, it } from 'vitest';
import { landingProjectId, readInvitation, readNewPassword, readResetEmail } from './teamForms';

describe(readNewPassword.name, () => {
  it('accepts a password of the minimum length typed twice alike', () => {
    expect(readNewPassword('0123456789', '0123456789')).toEqual({ ok: true, input: { password: '0123456789' } });
  });

  it('refuses a short password and a confirmation that differs, both at once', () => {
    expect(readNewPassword('short', 'shorT')).toEqual({
      ok: false,
      errors: { password: 'at least 10 characters', confirmation: 'the two passwords differ' },
    });
  });

  it('asks for a password when none is typed', () => {
    expect(readNewPassword('', '')).toEqual({ ok: false, errors: { password: 'required' } });
  });
});

describe(readInvitation.name, () => {
  it('trims and lower-cases the address and keeps the role', () => {
    expect(readInvitation('  Ilse.Marten@Example.TEST ', 'CORRELATOR')).toEqual({
      ok: true,
      input: { email: 'ilse.marten@example.test', role: 'CORRELATOR' },
    });
  });

  it('refuses something that is not an address', () => {
    expect(readInvitation('ilse@', 'VIEWER')).toEqual({ ok: false, errors: { email: 'not an e-mail address' } });
    expect(readInvitation('', 'VIEWER')).toEqual({ ok: false, errors: { email: 'required' } });
  });
});

describe(readResetEmail.name, () => {
  it('reads a trimmed address', () => {
    expect(readResetEmail(' a@b.test ')).toEqual({ ok: true, input: { email: 'a@b.test' } });
  });
});

describe(landingProjectId.name, () => {
  it('lands in the only project, else nowhere in particular', () => {
    expect(landingProjectId([{ project: { id: 'p1' } }])).toBe('p1');
    expect(landingProjectId([{ project: { id: 'p1' } }, { project: { id: 'p2' } }])).toBeNull();
    expect(landingProjectId([])).toBeNull();
  });
});
