import { describe, expect, it } from 'vitest';
import { answerJson, numberListJson } from './answer-json';

describe(answerJson.name, () => {
  it('writes what Apollo writes: errors, data, extensions in that order, then a newline', () => {
    const data = { a: 1 };
    expect(answerJson({ data })).toBe('{"data":{"a":1}}\n');
    expect(answerJson({ data: null, errors: [{ message: 'x' }] })).toBe('{"errors":[{"message":"x"}],"data":null}\n');
  });

  it('serialises one answer once, but again when its errors or extensions are replaced', () => {
    const data = { a: 1 };
    expect(answerJson({ data })).toBe('{"data":{"a":1}}\n');
    data.a = 2; // a changed object is never sent; this shows the first text is reused
    expect(answerJson({ data })).toBe('{"data":{"a":1}}\n');
    expect(answerJson({ data, errors: [{ message: 'late' }] })).toBe('{"errors":[{"message":"late"}],"data":{"a":2}}\n');
  });
});

describe(numberListJson.name, () => {
  // Values of the shapes a thinned density has (4 significant digits, down to 1e-7), and awkward ones.
  const values = [0.00000151, 2.225e-7, 0.0111, 6000, 5439.5, 0.9562794404032314, -0.0002, 1e21, 1.5e-300, 0, 123456789012];

  it('answers the same doubles as the plain array, in no more characters', () => {
    const plain = `${JSON.stringify({ data: { grid: { values } } })}\n`;
    const answered = answerJson({ data: { grid: { values: numberListJson(values) } } });
    expect(JSON.parse(answered)).toEqual(JSON.parse(plain));
    expect(answered.length).toBeLessThan(plain.length);
    expect(answered).toContain('1.51e-6');
  });

  it('reads back every double exactly, over many random magnitudes', () => {
    const random = Array.from({ length: 2000 }, (_, i) => Math.sin(i * 12.9898) * 10 ** ((i % 24) - 12));
    const answered = JSON.parse(answerJson({ data: { values: numberListJson(random) } })) as { data: { values: number[] } };
    expect(answered.data.values).toEqual(random);
  });

  it('is the same object for the same array, and plain numbers outside answerJson', () => {
    expect(numberListJson(values)).toBe(numberListJson(values));
    expect(JSON.stringify({ values: numberListJson(values) })).toBe(JSON.stringify({ values }));
  });

  it('leaves alone a client string shaped like a placeholder, and lists in errors and extensions', () => {
    const lookalike = '\u0000nl-0000000000000000#0';
    const answered = answerJson({ data: { note: lookalike, values: numberListJson([1, 2]) }, extensions: { more: numberListJson([3]) } });
    expect(JSON.parse(answered)).toEqual({ data: { note: lookalike, values: [1, 2] }, extensions: { more: [3] } });
  });
});
