import { describe, expect, it } from 'vitest';
import { ApiError, fieldErrorsOf, formErrorOf, isApiError, readGraphqlErrors } from './apiError';

// The response shape is that of the GraphQL specification ("errors" entries with message and
// extensions) and the backend's formatGraphqlError (code, and field for BAD_USER_INPUT).

describe(readGraphqlErrors.name, () => {
  it('keeps message, code and field, dropping an input. prefix', () => {
    expect(
      readGraphqlErrors([
        { message: 'c14Error must be greater than 0', extensions: { code: 'BAD_USER_INPUT', field: 'input.c14Error' } },
        { message: 'sample not found', extensions: { code: 'NOT_FOUND' } },
      ]),
    ).toEqual([
      { message: 'c14Error must be greater than 0', code: 'BAD_USER_INPUT', field: 'c14Error' },
      { message: 'sample not found', code: 'NOT_FOUND' },
    ]);
  });

  it('counts unknown or missing codes as internal errors', () => {
    expect(readGraphqlErrors([{ message: 'boom', extensions: { code: 'WHATEVER' } }, {}])).toEqual([
      { message: 'boom', code: 'INTERNAL_SERVER_ERROR' },
      { message: 'the request failed', code: 'INTERNAL_SERVER_ERROR' },
    ]);
  });

  it('reads a missing errors member as no problems', () => {
    expect(readGraphqlErrors(undefined)).toEqual([]);
  });
});

describe(ApiError.name, () => {
  it('takes code, field and message from its first problem', () => {
    const error = new ApiError([{ message: 'taken', code: 'BAD_USER_INPUT', field: 'labCode' }]);
    expect(error.message).toBe('taken');
    expect(error.code).toBe('BAD_USER_INPUT');
    expect(error.field).toBe('labCode');
    expect(isApiError(error, 'BAD_USER_INPUT')).toBe(true);
    expect(isApiError(error, 'CONFLICT')).toBe(false);
  });
});

describe(fieldErrorsOf.name, () => {
  it('maps field problems by field, first message first', () => {
    const error = new ApiError([
      { message: 'first', code: 'BAD_USER_INPUT', field: 'depthM' },
      { message: 'second', code: 'BAD_USER_INPUT', field: 'depthM' },
      { message: 'no field', code: 'FORBIDDEN' },
    ]);
    expect(fieldErrorsOf(error)).toEqual({ depthM: 'first' });
    expect(fieldErrorsOf(new Error('plain'))).toEqual({});
  });
});

describe(formErrorOf.name, () => {
  it('leaves field problems of the form to the fields', () => {
    const error = new ApiError([{ message: 'taken', code: 'BAD_USER_INPUT', field: 'labCode' }]);
    expect(formErrorOf(error, ['labCode'])).toBeNull();
    expect(formErrorOf(error, ['name'])).toBe('Taken.');
  });

  it('writes the other problems as sentences', () => {
    const error = new ApiError([
      { message: 'a unit that holds samples cannot be deleted', code: 'CONFLICT' },
      { message: 'Try again!', code: 'TOO_MANY_REQUESTS' },
    ]);
    expect(formErrorOf(error, [])).toBe('A unit that holds samples cannot be deleted. Try again!');
    expect(formErrorOf(null, [])).toBeNull();
  });
});
