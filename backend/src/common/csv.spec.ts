import { describe, expect, it } from 'vitest';
import { csvCell, csvRow, neutraliseFormula, toCsv } from './csv';

describe(neutraliseFormula.name, () => {
  it('prefixes an apostrophe to text a spreadsheet would evaluate (OWASP CSV injection list [common practice])', () => {
    for (const text of ['=SUM(A1:A2)', '+1', '-2+3', '@cmd', '\tx', '\rx']) {
      expect(neutraliseFormula(text)).toBe(`'${text}`);
    }
  });

  it('leaves ordinary text alone', () => {
    expect(neutraliseFormula('BPT')).toBe('BPT');
    expect(neutraliseFormula('a=b')).toBe('a=b');
    expect(neutraliseFormula('')).toBe('');
  });
});

describe(csvCell.name, () => {
  it('quotes commas, quotes and line breaks, doubling quotes (RFC 4180)', () => {
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell('two\nlines')).toBe('"two\nlines"');
  });

  it('neutralises before quoting, so a quoted formula is still text', () => {
    expect(csvCell('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvCell('\r\n=1')).toBe(`"'\r\n=1"`);
  });

  it('writes numbers as numbers, negative ones included, and empties for null and non-finite', () => {
    expect(csvCell(-12.5)).toBe('-12.5');
    expect(csvCell(0.0951626)).toBe('0.0951626');
    expect(csvCell(Number.NaN)).toBe('');
    expect(csvCell(Number.POSITIVE_INFINITY)).toBe('');
    expect(csvCell(null)).toBe('');
    expect(csvCell(undefined)).toBe('');
    expect(csvCell(true)).toBe('true');
  });
});

describe(csvRow.name, () => {
  it('joins cells with commas', () => {
    expect(csvRow(['model', 30, null, '-x'])).toBe("model,30,,'-x");
  });
});

describe(toCsv.name, () => {
  it('ends every row with CRLF', () => {
    expect(toCsv([['a', 1], ['b', 2]])).toBe('a,1\r\nb,2\r\n');
    expect(toCsv([])).toBe('');
  });
});
