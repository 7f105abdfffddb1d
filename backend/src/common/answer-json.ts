import type { FormattedExecutionResult } from 'graphql';

interface Serialised {
  errors: unknown;
  extensions: unknown;
  json: string;
}

/** Answers already serialised, by their `data` object (dropped with it). */
const serialised = new WeakMap<object, Serialised>();

/**
 * The JSON text Apollo sends for a single result (errors, data, extensions in that order, and a
 * newline, as Apollo's own `prettyJSONStringify`), made once per answer: the answer-size cap
 * (`costLimitPlugin`), the ladder answer cache and Apollo's `stringifyResult` all call this, and a
 * large answer such as the event ladder (0.5 MB) is not stringified three times.
 */
export function answerJson(result: FormattedExecutionResult): string {
  const data = result.data;
  const memo = data && typeof data === 'object' ? serialised.get(data) : undefined;
  if (memo && memo.errors === result.errors && memo.extensions === result.extensions) return memo.json;
  const json = `${JSON.stringify({ errors: result.errors, data: result.data, extensions: result.extensions })}\n`;
  if (data && typeof data === 'object') serialised.set(data, { errors: result.errors, extensions: result.extensions, json });
  return json;
}
