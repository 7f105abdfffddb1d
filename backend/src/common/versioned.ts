import { conflict, notFound } from './errors/domain-error';

/**
 * Optimistic locking: `update` writes only when the stored version is the one the client read
 * (and bumps it). No row back means the object is gone (NOT_FOUND) or was changed by someone
 * else since it was read (CONFLICT).
 */
export async function requireVersionedUpdate<Row>(
  what: string,
  update: () => Promise<Row | undefined>,
  currentVersion: () => Promise<number | undefined>,
  expectedVersion: number,
): Promise<Row> {
  const row = await update();
  if (row) return row;
  const version = await currentVersion();
  if (version === undefined) throw notFound(what);
  throw conflict(`this ${what} was changed by someone else (version ${version}, you edited version ${expectedVersion}); reload and try again`);
}
