import { describe, expect, it } from 'vitest';
import { FieldReader, numberText, optionalText, readNumber } from './formFields';

describe(readNumber.name, () => {
  it('reads blank as null unless required', () => {
    expect(readNumber('  ')).toEqual({ value: null });
    expect(readNumber('', { required: true })).toEqual({ error: 'required' });
  });

  it('reads decimals with a point or a lone comma, signs and exponents', () => {
    expect(readNumber('1.25').value).toBe(1.25);
    expect(readNumber('1,25').value).toBe(1.25);
    expect(readNumber('-27.1').value).toBe(-27.1);
    expect(readNumber('1e3').value).toBe(1000);
  });

  it('refuses text, thousands separators and hex', () => {
    expect(readNumber('abc').error).toBe('not a number');
    expect(readNumber('1,250,000').error).toBe('not a number');
    expect(readNumber('0x10').error).toBe('not a number');
  });

  it('applies whole-number and range rules', () => {
    expect(readNumber('2.5', { integer: true }).error).toBe('must be a whole number');
    expect(readNumber('-1', { min: 0 }).error).toBe('must be at least 0');
    expect(readNumber('5', { max: 4 }).error).toBe('must be at most 4');
    expect(readNumber('0', { above: 0 }).error).toBe('must be greater than 0');
    expect(readNumber('0.1', { above: 0 }).value).toBe(0.1);
  });
});

describe(numberText.name, () => {
  it('writes null as blank', () => {
    expect(numberText(null)).toBe('');
    expect(numberText(0)).toBe('0');
  });
});

describe(optionalText.name, () => {
  it('turns blank into null and trims the rest', () => {
    expect(optionalText('   ')).toBeNull();
    expect(optionalText(' peat ')).toBe('peat');
  });
});

describe(FieldReader.name, () => {
  it('collects every problem, not just the first', () => {
    const reader = new FieldReader<'a' | 'b' | 'c'>();
    reader.number('a', 'x');
    reader.text('b', '', { required: true });
    reader.text('c', 'ok');
    expect(reader.result({})).toEqual({ ok: false, errors: { a: 'not a number', b: 'required' } });
  });

  it('keeps the first message when a field fails twice', () => {
    const reader = new FieldReader<'a'>();
    reader.fail('a', 'first');
    reader.fail('a', 'second');
    expect(reader.errors).toEqual({ a: 'first' });
  });
});
