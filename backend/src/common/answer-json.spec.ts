import { describe, expect, it } from 'vitest';
import { answerJson } from './answer-json';

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
