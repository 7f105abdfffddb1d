import { randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { JwtService } from '@nestjs/jwt';
import { buildSchema, Kind, OperationDefinitionNode, parse } from 'graphql';
import { describe, expect, it } from 'vitest';
import { repositoryRoot } from '../../common/repo-paths';
import { loadConfig } from '../../config/config';
import { EventLadderCache } from './event-ladder-cache';
import type { LadderRevisionRepository } from './ladder-revision.repository';

const schema = buildSchema(readFileSync(join(repositoryRoot(), 'schema.graphql'), 'utf8'));
const QUERY = `query($p: ID!) { project(id: $p) { id name } }`;
const claims = { sub: 'user-1', email: 'a@b.test', epoch: 0 };

/** A cache over a fake token check and a fake state query (role VIEWER, one fixed revision). */
function cacheOf(megabytes: number) {
  const jwt = { verify: () => claims } as unknown as JwtService;
  const revisions = { state: async () => ({ epoch: 0, role: 'VIEWER', revision: 'r1' }) } as unknown as LadderRevisionRepository;
  return new EventLadderCache(jwt, revisions, loadConfig({ DATABASE_URL: 'postgres://x@127.0.0.1/x', LADDER_CACHE_MIB: String(megabytes) }));
}

/** Run one request through the plugin as Apollo would, answering `bytes` bytes of data. */
async function answer(cache: EventLadderCache, projectId: string, bytes: number): Promise<string> {
  const body = { query: QUERY, variables: { p: projectId } };
  const document = parse(QUERY);
  const hooks = await (cache.plugin().requestDidStart as (c: unknown) => Promise<Record<string, (c: unknown) => Promise<unknown>>>)({});
  await hooks.responseForOperation({
    schema,
    document,
    operation: document.definitions.find((d): d is OperationDefinitionNode => d.kind === Kind.OPERATION_DEFINITION),
    source: QUERY,
    request: { variables: body.variables },
    contextValue: { req: { method: 'POST', body, headers: { authorization: 'Bearer t' } } },
  });
  // Random hex compresses to about half, so an answer of n characters costs about 1.5 n (JSON and gzip).
  const data = { project: { id: projectId, name: randomBytes(bytes / 2).toString('hex') } };
  await hooks.willSendResponse({ response: { body: { kind: 'single', singleResult: { data } } } });
  return cache.requestKey(body);
}

describe(EventLadderCache.name, () => {
  it('serves a stored answer for the caller role and revision it was computed from', async () => {
    const cache = cacheOf(1);
    const key = await answer(cache, 'p1', 1000);
    expect(cache.projectOf(key)).toBe('p1');
    const entry = await cache.current(key, claims);
    expect(JSON.parse(entry!.json.toString()).data.project.id).toBe('p1');
    expect(await cache.current(key, { ...claims, epoch: 1 })).toBeUndefined();
  });

  it('drops the least recently used answers past its budget, and with them their requests', async () => {
    const cache = cacheOf(1); // 1 MiB: room for two answers of ~0.45 MB (JSON + gzip), not three
    const first = await answer(cache, 'p1', 300_000);
    const second = await answer(cache, 'p2', 300_000);
    expect(await cache.current(first, claims)).toBeDefined(); // first is now the most recently used
    const third = await answer(cache, 'p3', 300_000);
    expect(cache.projectOf(second)).toBeUndefined();
    expect(await cache.current(second, claims)).toBeUndefined();
    expect(cache.projectOf(first)).toBe('p1');
    expect(cache.projectOf(third)).toBe('p3');
  });

  it('keeps nothing when turned off or when one answer exceeds the budget', async () => {
    const off = cacheOf(0);
    expect(off.projectOf(await answer(off, 'p1', 1000))).toBeUndefined();
    const small = cacheOf(1);
    expect(small.projectOf(await answer(small, 'p1', 800_000))).toBeUndefined();
  });
});
