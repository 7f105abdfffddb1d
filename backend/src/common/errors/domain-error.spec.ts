import { describe, expect, it } from 'vitest';
import { asNotFoundOf, DomainError, notFound } from './domain-error';

describe('asNotFoundOf', () => {
  it("reports a parent's NOT_FOUND as the object's own, so another project's object looks missing", async () => {
    await expect(asNotFoundOf('age model run', () => Promise.reject(notFound('site')))).rejects.toMatchObject({ code: 'NOT_FOUND', message: 'age model run not found' });
  });

  it('passes other errors and results through', async () => {
    await expect(asNotFoundOf('tie', () => Promise.reject(new DomainError('FORBIDDEN', 'no')))).rejects.toMatchObject({ code: 'FORBIDDEN' });
    await expect(asNotFoundOf('tie', async () => 7)).resolves.toBe(7);
  });
});
