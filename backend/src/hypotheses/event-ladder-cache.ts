import type { ApolloServerPlugin, GraphQLRequestContext } from '@apollo/server';
import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { sql } from 'drizzle-orm';
import { FieldNode, FragmentDefinitionNode, Kind, OperationDefinitionNode, valueFromASTUntyped } from 'graphql';
import type { Request } from 'express';
import { gzipSync } from 'node:zlib';
import { QueryResult } from 'pg';
import { Role } from '../access/permissions';
import { APP_CONFIG, AppConfig } from '../config/config';
import { DatabaseService } from '../database/database.service';
import { coveredByLadderRevision } from './event-ladder-cache-scope';
import { epochCurrent, TokenClaims } from '../auth/token-claims';

/** Root fields a cached ladder operation may ask for, each of one project. */
const CACHEABLE_ROOT_FIELDS: Record<string, string> = { eventLadder: 'projectId', project: 'id' };

/** A GraphQL request over HTTP as the JSON body carries it. */
export interface GraphqlHttpBody {
  query: string;
  operationName?: string | null;
  variables?: Record<string, unknown> | null;
}

/** A finished answer, kept exactly as it was sent, with the state it was computed from. */
export interface LadderCacheEntry {
  projectId: string;
  role: Role;
  revision: string;
  json: Buffer;
  gzip: Buffer;
}

/**
 * A whole-answer cache for the event ladder: a read that many people repeat and that costs a
 * full GraphQL execution and serialisation of ~8,000 fields (0.5 MB) each time.
 *
 * An answer is stored only after ordinary execution has produced it without errors, for an
 * operation that asks for nothing but `eventLadder` and `project` of one project, and below them
 * only for fields the revision covers (`coveredByLadderRevision`). It is keyed by
 * the caller (from a verified bearer token), the query text, the operation name and the
 * variables, and remembers the caller's role and the project's data revision read *before*
 * execution. It is served again (by `EventLadderCacheMiddleware`, already serialised and
 * compressed, without entering GraphQL) only while one query shows the caller still has that role
 * and the revision is unchanged: the counts, versions, column revisions and update times of
 * everything the answer shows (sites, segments, age model runs, hypotheses, the project). A write
 * during execution therefore leaves an entry that is never served. Everything else, including
 * every error, goes through ordinary execution, which stays the authority on access and
 * validation. Answers are kept per API process up to `LADDER_CACHE_MIB` (least recently used
 * dropped first); 0 turns the cache off.
 */
@Injectable()
export class EventLadderCache {
  private readonly entries = new Map<string, LadderCacheEntry>();
  private bytes = 0;
  private readonly maxBytes: number;

  constructor(
    private readonly jwt: JwtService,
    private readonly database: DatabaseService,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.maxBytes = config.ladderCacheMiB * 1024 * 1024;
  }

  /** The claims of a verified `Bearer` token (HS256 only), or undefined; its epoch is checked with the state. */
  bearerUser(header: string | undefined): TokenClaims | undefined {
    if (!header?.startsWith('Bearer ')) return undefined;
    try {
      return this.jwt.verify<TokenClaims>(header.slice(7), { algorithms: ['HS256'] });
    } catch {
      return undefined;
    }
  }

  /** The cache key of one caller's request. */
  key(userId: string, body: GraphqlHttpBody): string {
    return `${userId}\u0000${body.operationName ?? ''}\u0000${body.query}\u0000${JSON.stringify(body.variables ?? {})}`;
  }

  has(key: string): boolean {
    return this.entries.has(key);
  }

  /**
   * The stored answer for this key if the token's epoch is still the caller's, and the caller's
   * role and the project revision still match the answer.
   */
  async current(key: string, claims: TokenClaims): Promise<LadderCacheEntry | undefined> {
    const entry = this.entries.get(key);
    if (!entry) return undefined;
    const state = await this.state(claims.sub, entry.projectId);
    if (!epochCurrent(claims, state.epoch ?? undefined) || state.role !== entry.role || state.revision !== entry.revision) return undefined;
    // Refresh recency so the map drops the least recently used entry first.
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry;
  }

  /**
   * The caller's token epoch (null when the user is gone), role (null when not a member) and the
   * project data revision, in one query.
   */
  async state(userId: string, projectId: string): Promise<{ epoch: number | null; role: Role | null; revision: string }> {
    const result = (await this.database.db.execute(sql`
      select
        (select token_epoch from users where id = ${userId}) as epoch,
        (select role from memberships where project_id = ${projectId} and user_id = ${userId}) as role,
        concat_ws('|',
          (select concat_ws(':', count(*), sum(column_revision), sum(version), max(updated_at)) from sites where project_id = ${projectId}),
          (select concat_ws(':', count(*), sum(version), max(updated_at)) from segments where project_id = ${projectId}),
          (select concat_ws(':', count(*), max(r.updated_at)) from age_model_runs r join sites s on s.id = r.site_id where s.project_id = ${projectId}),
          (select concat_ws(':', count(*), sum(version), max(updated_at)) from hypotheses where project_id = ${projectId}),
          (select concat_ws(':', version, updated_at) from projects where id = ${projectId})) as revision`)) as unknown as QueryResult<{
      epoch: number | null;
      role: Role | null;
      revision: string;
    }>;
    return result.rows[0];
  }

  /** The Apollo plugin that stores successful answers of cacheable operations. */
  plugin(): ApolloServerPlugin<{ req: Request }> {
    return {
      requestDidStart: async () => {
        let pending: { key: string; projectId: string; role: Role; revision: string } | undefined;
        return {
          // Runs after validation, before execution: the revision is read before the data are.
          responseForOperation: async (context) => {
            const target = this.maxBytes > 0 ? this.cacheTarget(context) : undefined;
            if (target) {
              const { role, revision } = await this.state(target.userId, target.projectId);
              if (role) pending = { key: target.key, projectId: target.projectId, role, revision };
            }
            return null;
          },
          willSendResponse: async ({ response }) => {
            if (!pending || response.body.kind !== 'single' || response.body.singleResult.errors?.length) return;
            // The bytes Apollo sends: JSON of the result and a newline.
            const json = Buffer.from(`${JSON.stringify(response.body.singleResult)}\n`);
            this.store(pending.key, { projectId: pending.projectId, role: pending.role, revision: pending.revision, json, gzip: gzipSync(json) });
          },
        };
      },
    };
  }

  private store(key: string, entry: LadderCacheEntry): void {
    if (entry.json.length + entry.gzip.length > this.maxBytes) return;
    const previous = this.entries.get(key);
    if (previous) {
      this.entries.delete(key);
      this.bytes -= previous.json.length + previous.gzip.length;
    }
    this.entries.set(key, entry);
    this.bytes += entry.json.length + entry.gzip.length;
    for (const [oldest, dropped] of this.entries) {
      if (this.bytes <= this.maxBytes) break;
      this.entries.delete(oldest);
      this.bytes -= dropped.json.length + dropped.gzip.length;
    }
  }

  /** The caller, key and project of an operation whose answer may be stored, or undefined. */
  private cacheTarget(context: GraphQLRequestContext<{ req: Request }>): { userId: string; key: string; projectId: string } | undefined {
    const operation = context.operation as OperationDefinitionNode | undefined;
    if (!operation || operation.operation !== 'query') return undefined;
    const variables = context.request.variables ?? {};
    let projectId: string | undefined;
    for (const selection of operation.selectionSet.selections) {
      if (selection.kind !== Kind.FIELD) return undefined;
      const field = selection as FieldNode;
      if (field.name.value === '__typename') continue;
      const argument = CACHEABLE_ROOT_FIELDS[field.name.value];
      const node = field.arguments?.find((a) => a.name.value === argument);
      if (!argument || !node) return undefined;
      const value = valueFromASTUntyped(node.value, variables);
      if (typeof value !== 'string' || (projectId !== undefined && projectId !== value)) return undefined;
      projectId = value;
    }
    const req = context.contextValue.req;
    const body = req?.body as Partial<GraphqlHttpBody> | undefined;
    // Only a plain POST body can be looked up again by the middleware.
    if (!projectId || req?.method !== 'POST' || typeof body?.query !== 'string' || body.query !== context.source) return undefined;
    const fragments = Object.fromEntries(
      (context.document?.definitions ?? [])
        .filter((d): d is FragmentDefinitionNode => d.kind === Kind.FRAGMENT_DEFINITION)
        .map((d) => [d.name.value, d]),
    );
    if (!coveredByLadderRevision(context.schema, operation, fragments)) return undefined;
    const claims = this.bearerUser(req.headers?.authorization);
    if (!claims) return undefined;
    return { userId: claims.sub, key: this.key(claims.sub, body as GraphqlHttpBody), projectId };
  }
}
