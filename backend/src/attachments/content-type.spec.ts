import { describe, expect, it } from 'vitest';
import { isUtf8Text, safeFileName, sniffContentType } from './content-type';

// A 1x1 PNG laid out per the PNG specification (RFC 2083 section 3): signature, IHDR (13 bytes),
// IDAT, IEND [published layout]. Only the layout matters for sniffing; its IDAT's zlib check
// value is wrong, so decoders (see thumbnail.spec.ts) refuse it.
const PNG_1X1 = Buffer.from(
  '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a1f3d4e40000000049454e44ae426082',
  'hex',
);
// JFIF header: SOI FF D8, APP0 FF E0 [published, ITU-T T.81 annex B / JFIF 1.02].
const JPEG_HEAD = Buffer.from('ffd8ffe000104a46494600010100000100010000ffd9', 'hex');
// ELF header (0x7f 'E' 'L' 'F', then class/endianness bytes and NUL padding) [published, System V ABI].
const ELF_HEAD = Buffer.from('7f454c4602010100000000000000000002003e00', 'hex');
// A Windows executable starts with "MZ" and holds NULs soon after [published, PE format].
const PE_HEAD = Buffer.from('4d5a90000300000004000000ffff0000', 'hex');

describe(sniffContentType.name, () => {
  it('recognises PNG, JPEG and PDF by their signatures, whatever the name says', () => {
    expect(sniffContentType(PNG_1X1, 'log.jpg')).toBe('image/png');
    expect(sniffContentType(JPEG_HEAD, 'photo.png')).toBe('image/jpeg');
    expect(sniffContentType(Buffer.from('%PDF-1.7\n%âãÏÓ\n1 0 obj\n'), 'report.txt')).toBe('application/pdf');
  });

  it('refuses executables named like images', () => {
    expect(sniffContentType(ELF_HEAD, 'trench.png')).toBeNull();
    expect(sniffContentType(PE_HEAD, 'core.jpeg')).toBeNull();
  });

  it('refuses a PNG signature not followed by an IHDR chunk', () => {
    const fake = Buffer.concat([PNG_1X1.subarray(0, 8), Buffer.from('garbage-after-signature')]);
    expect(sniffContentType(fake, 'x.png')).toBeNull();
  });

  it('takes UTF-8 text as CSV or plain text, the name choosing only between those two', () => {
    const csv = Buffer.from('lab_code,age\nVX-101,1234\n', 'utf8');
    expect(sniffContentType(csv, 'sheet.CSV')).toBe('text/csv');
    expect(sniffContentType(csv, 'sheet.png')).toBe('text/plain');
    expect(sniffContentType(Buffer.from('Probe à 2 m — tourbe\n', 'utf8'), 'notes.txt')).toBe('text/plain');
  });

  it('refuses empty files and random bytes', () => {
    expect(sniffContentType(new Uint8Array(0), 'a.csv')).toBeNull();
    expect(sniffContentType(Buffer.from([0xc3, 0x28, 0x41, 0x42]), 'a.csv')).toBeNull();
  });
});

describe(isUtf8Text.name, () => {
  // RFC 3629 section 3/10: overlong encodings (C0 80) and lone continuation bytes are invalid [published].
  it('rejects overlong and truncated sequences and NUL bytes', () => {
    expect(isUtf8Text(Buffer.from([0xc0, 0x80]))).toBe(false);
    expect(isUtf8Text(Buffer.from([0x80]))).toBe(false);
    expect(isUtf8Text(Buffer.from([0xe2, 0x82]))).toBe(false);
    expect(isUtf8Text(Buffer.from('a\u0000b'))).toBe(false);
  });

  it('accepts multi-byte text', () => {
    expect(isUtf8Text(Buffer.from('€ 14C ±30 — ü', 'utf8'))).toBe(true);
  });
});

describe('safeFileName', () => {
  it('strips bidi overrides and control characters (issue 17)', () => {
    expect(safeFileName('report\u202Efdp.exe')).toBe('reportfdp.exe');
    expect(safeFileName('a\u2066b\u2069c\u200F\u061C.pdf')).toBe('abc.pdf');
    expect(safeFileName('line\nbreak\u0000\u0085.txt')).toBe('linebreak.txt');
  });

  it('replaces path separators, keeps other letters, and never answers empty', () => {
    expect(safeFileName('../../etc\\passwd')).toBe('.._.._etc_passwd');
    expect(safeFileName('Tarn core é 2.png')).toBe('Tarn core é 2.png');
    expect(safeFileName('\u202E ')).toBe('file');
    expect(safeFileName('x'.repeat(300))).toHaveLength(255);
  });
});
