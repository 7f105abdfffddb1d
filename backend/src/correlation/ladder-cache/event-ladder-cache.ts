import type { ApolloServerPlugin, GraphQLRequestContext } from '@apollo/server';
import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { FieldNode, Kind, OperationDefinitionNode, valueFromASTUntyped } from 'graphql';
import type { Request } from 'express';
import { gzipSync } from 'node:zlib';
import { Role, ROLES } from '../../access/permissions';
import { answerJson } from '../../common/answer-json';
import { APP_CONFIG, AppConfig } from '../../config/config';
import { LadderCacheState, LadderRevisionRepository } from './ladder-revision.repository';
import { epochCurrent, TokenClaims } from '../../auth/token-claims';

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
  role: Role;
  revision: string;
  json: Buffer;
  gzip: Buffer;
}

/**
 * A whole-answer cache for the event ladder: a read that many people repeat and that costs a
 * full GraphQL execution and serialisation of ~8,000 fields (0.5 MB) each time.
 *
 * An answer is stored only after ordinary execution has produced it without errors, for a query
 * that asks for nothing but `eventLadder` and `project` of one project. Everything such a query
 * can show is a row of that project, a user who is its member or an installed calibration curve,
 * and every change to those bumps the project's revision (`project_revisions`, kept by triggers
 * in the database: migration 0010_project_revisions.sql; `test/integration/ladder-cache.spec.ts`
 * fails when a table of project rows has none). Nothing in it depends on who asks beyond their
 * role (`myRole`, `myPermissions`, fields only some roles may read), so an answer is keyed by the
 * caller's role, the query text, the operation name and the variables, and is shared by every
 * member with that role. It remembers the revision read *before* execution, and is served again
 * (by `EventLadderCacheMiddleware`, already serialised and compressed, without entering GraphQL)
 * only after one query per request shows that the caller's token epoch is current, that the
 * caller is a member with that role, and that the revision is unchanged. A write during execution
 * therefore leaves an entry that is never served. Everything else, including every error, goes
 * through ordinary execution, which stays the authority on access and validation. Answers are
 * kept per API process up to `LADDER_CACHE_MIB` (least recently used dropped first); 0 turns
 * the cache off.
 */
@Injectable()
export class EventLadderCache {
  /** Answers by role and request. */
  private readonly entries = new Map<string, LadderCacheEntry>();
  /** The project each cached request reads, by request key. */
  private readonly projects = new Map<string, string>();
  private bytes = 0;
  private readonly maxBytes: number;

  constructor(
    private readonly jwt: JwtService,
    private readonly revisions: LadderRevisionRepository,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.maxBytes = config.ladderCacheMiB * 1024 * 1024;
  }

  /** The claims of a verified `Bearer` token (HS256 only), or undefined; its epoch is checked with the state. */
  bearerClaims(header: string | undefined): TokenClaims | undefined {
    if (!header?.startsWith('Bearer ')) return undefined;
    try {
      return this.jwt.verify<TokenClaims>(header.slice(7), { algorithms: ['HS256'] });
    } catch {
      return undefined;
    }
  }

  /** The key of a request, whoever sends it. */
  requestKey(body: GraphqlHttpBody): string {
    return `${body.operationName ?? ''}\u0000${body.query}\u0000${JSON.stringify(body.variables ?? {})}`;
  }

  /** The project of a request whose answer may be stored, if one is. */
  projectOf(requestKey: string): string | undefined {
    return this.projects.get(requestKey);
  }

  /**
   * The stored answer for this request if the token's epoch is still the caller's and an answer
   * for the caller's current role was computed from the project's current revision.
   */
  async current(requestKey: string, claims: TokenClaims): Promise<LadderCacheEntry | undefined> {
    const projectId = this.projects.get(requestKey);
    if (!projectId) return undefined;
    const state = await this.state(claims.sub, projectId);
    if (!epochCurrent(claims, state.epoch ?? undefined) || !state.role) return undefined;
    const key = entryKey(state.role, requestKey);
    const entry = this.entries.get(key);
    if (!entry || entry.revision !== state.revision) return undefined;
    // Refresh recency so the map drops the least recently used entry first.
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry;
  }

  /** The caller's token epoch, role and the project's data revision (one query). */
  state(userId: string, projectId: string): Promise<LadderCacheState> {
    return this.revisions.state(userId, projectId);
  }

  /** The Apollo plugin that stores successful answers of cacheable operations. */
  plugin(): ApolloServerPlugin<{ req: Request }> {
    return {
      requestDidStart: async () => {
        let pending: { requestKey: string; projectId: string; role: Role; revision: string } | undefined;
        return {
          // Runs after validation, before execution: the revision is read before the data are.
          responseForOperation: async (context) => {
            const target = this.maxBytes > 0 ? this.cacheTarget(context) : undefined;
            if (target) {
              const { role, revision } = await this.state(target.userId, target.projectId);
              if (role) pending = { requestKey: target.requestKey, projectId: target.projectId, role, revision };
            }
            return null;
          },
          willSendResponse: async ({ response }) => {
            if (!pending || response.body.kind !== 'single' || response.body.singleResult.errors?.length) return;
            // The bytes Apollo sends (made once for the answer-size cap, this and Apollo itself).
            const json = Buffer.from(answerJson(response.body.singleResult));
            this.store(pending.requestKey, pending.projectId, { role: pending.role, revision: pending.revision, json, gzip: gzipSync(json) });
          },
        };
      },
    };
  }

  private store(requestKey: string, projectId: string, entry: LadderCacheEntry): void {
    if (entry.json.length + entry.gzip.length > this.maxBytes) return;
    const key = entryKey(entry.role, requestKey);
    this.projects.set(requestKey, projectId);
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
      // A request with no answer left for any role needs no project either.
      const droppedRequest = oldest.slice(dropped.role.length + 1);
      if (!ROLES.some((role) => this.entries.has(entryKey(role, droppedRequest)))) this.projects.delete(droppedRequest);
    }
  }

  /** The caller, key and project of an operation whose answer may be stored, or undefined. */
  private cacheTarget(context: GraphQLRequestContext<{ req: Request }>): { userId: string; requestKey: string; projectId: string } | undefined {
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
    const claims = this.bearerClaims(req.headers?.authorization);
    if (!claims) return undefined;
    return { userId: claims.sub, requestKey: this.requestKey(body as GraphqlHttpBody), projectId };
  }
}

/** The key of a stored answer: the role it was computed for and the request. */
function entryKey(role: Role, requestKey: string): string {
  return `${role}\u0000${requestKey}`;
}
