import { describe, expect, it } from 'vitest';
import { decodeEncodedWords, decodeQuotedPrintable, parseMessage } from './mime';

describe(decodeQuotedPrintable.name, () => {
  it('turns =XX into octets and drops soft line breaks (RFC 2045 §6.7 rules 1 and 5)', () => {
    expect(decodeQuotedPrintable('token=3Dabc').toString()).toBe('token=abc');
    expect(decodeQuotedPrintable('a long li=\r\nne').toString()).toBe('a long line');
  });

  it('rebuilds multi-byte UTF-8 characters from their octets', () => {
    // é is U+00E9, UTF-8 C3 A9 (Unicode Standard, UTF-8 table).
    expect(decodeQuotedPrintable('caf=C3=A9').toString('utf8')).toBe('café');
  });
});

describe(decodeEncodedWords.name, () => {
  it('decodes Q and B words and joins adjacent words (RFC 2047 §8 examples [memory])', () => {
    expect(decodeEncodedWords('=?ISO-8859-1?Q?Andr=E9?= Pirard')).toBe('André Pirard');
    expect(decodeEncodedWords('(=?ISO-8859-1?Q?a?= =?ISO-8859-1?Q?b?=)')).toBe('(ab)');
    expect(decodeEncodedWords('=?US-ASCII?Q?Keith_Moore?=')).toBe('Keith Moore');
    expect(decodeEncodedWords(`=?utf-8?B?${Buffer.from('Kōwhai').toString('base64')}?=`)).toBe('Kōwhai');
  });
});

describe(parseMessage.name, () => {
  it('reads both alternatives of a multipart message and skips attachments', () => {
    const raw = [
      'Subject: Hello',
      'Content-Type: multipart/mixed; boundary="outer"',
      '',
      '--outer',
      'Content-Type: multipart/alternative; boundary="inner"',
      '',
      '--inner',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'link?token=3Dxyz',
      '--inner',
      'Content-Type: text/html; charset=utf-8',
      'Content-Transfer-Encoding: base64',
      '',
      Buffer.from('<p>hi</p>').toString('base64'),
      '--inner--',
      '--outer',
      'Content-Type: text/plain',
      'Content-Disposition: attachment; filename="x.txt"',
      '',
      'not the body',
      '--outer--',
      '',
    ].join('\r\n');
    const parsed = parseMessage(raw);
    expect(parsed.subject).toBe('Hello');
    expect(parsed.text).toBe('link?token=xyz');
    expect(parsed.html).toBe('<p>hi</p>');
  });
});
