import type { FormattedExecutionResult } from 'graphql';
import { randomBytes } from 'node:crypto';

interface Serialised {
  errors: unknown;
  extensions: unknown;
  json: string;
}

/** Answers already serialised, by their `data` object (dropped with it). */
const serialised = new WeakMap<object, Serialised>();

/**
 * Stands in a string for a number list's JSON text while `answerJson` runs. The process's random
 * part means no text a client stored can be taken for one; `"\u0000"` is written escaped by
 * `JSON.stringify`, hence the pattern's `\\u0000`.
 */
const PLACEHOLDER_TAG = `\u0000nl-${randomBytes(8).toString('hex')}#`;
const PLACEHOLDER_PATTERN = new RegExp(`"\\\\u0000nl-${PLACEHOLDER_TAG.slice(4)}(\\d+)"`, 'g');

/** The texts of the number lists met by the `JSON.stringify` now running in `answerJson`, if any. */
let collecting: string[] | undefined;

/**
 * A `NumberList` as the API answers it: the numbers, and their JSON text made once for the array
 * (`numberListJson`). Inside `answerJson` the text is spliced in as it is; anywhere else
 * `JSON.stringify` writes the numbers as usual. Formatting tens of thousands of doubles was most
 * of the cost of serialising the event ladder (36,000 density values, about 5 ms a request).
 */
export class NumberListJson {
  private text: string | undefined;

  constructor(readonly values: readonly number[]) {}

  /**
   * The list as a JSON array, each number in the shorter of its plain (`0.00000151`) and exponent
   * (`1.51e-6`) forms; both are the shortest digits that read back as the same double.
   */
  json(): string {
    // Joined, not appended: a string built by `+=` stays a rope of pieces that every later copy
    // into an answer walks again.
    this.text ??= `[${this.values.map(compactNumber).join(',')}]`;
    return this.text;
  }

  toJSON(): readonly number[] | string {
    if (!collecting) return this.values;
    collecting.push(this.json());
    return `${PLACEHOLDER_TAG}${collecting.length - 1}`;
  }
}

/** A number as JSON in the shorter of its plain and exponent forms (`null` if not finite, as `JSON.stringify`). */
function compactNumber(value: number): string {
  if (!Number.isFinite(value)) return 'null';
  const plain = String(value);
  const exponent = value.toExponential().replace('e+', 'e');
  return exponent.length < plain.length ? exponent : plain;
}

/** Number lists by their array, so that an array kept between requests is formatted once. */
const numberLists = new WeakMap<readonly number[], NumberListJson>();

/** The serialisable form of a number list (the same object for the same array). */
export function numberListJson(values: readonly number[]): NumberListJson {
  let list = numberLists.get(values);
  if (!list) {
    list = new NumberListJson(values);
    numberLists.set(values, list);
  }
  return list;
}

/**
 * The JSON text Apollo sends for a single result (errors, data, extensions in that order, and a
 * newline, as Apollo's own `prettyJSONStringify`), made once per answer: the answer-size cap
 * (`costLimitPlugin`), the ladder answer cache and Apollo's `stringifyResult` all call this, and a
 * large answer such as the event ladder (0.5 MB) is not stringified three times. Number lists
 * (`NumberListJson`) go in as their already-made text.
 */
export function answerJson(result: FormattedExecutionResult): string {
  const data = result.data;
  const memo = data && typeof data === 'object' ? serialised.get(data) : undefined;
  if (memo && memo.errors === result.errors && memo.extensions === result.extensions) return memo.json;
  const lists: string[] = [];
  collecting = lists;
  let json: string;
  try {
    json = `${JSON.stringify({ errors: result.errors, data: result.data, extensions: result.extensions })}\n`;
  } finally {
    collecting = undefined;
  }
  if (lists.length > 0) json = json.replace(PLACEHOLDER_PATTERN, (whole: string, index: string) => lists[Number(index)] ?? whole);
  if (data && typeof data === 'object') serialised.set(data, { errors: result.errors, extensions: result.extensions, json });
  return json;
}
