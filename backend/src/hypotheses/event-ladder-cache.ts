import { HeaderMap, type ApolloServerPlugin, type GraphQLRequestContext } from '@apollo/server';
import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { sql } from 'drizzle-orm';
import { FieldNode, Kind, OperationDefinitionNode, valueFromASTUntyped } from 'graphql';
import type { Request } from 'express';
import { QueryResult } from 'pg';
import { AccessService } from '../access/access.service';
import { DatabaseService } from '../database/database.service';

/** Root fields a cached ladder operation may ask for, each of one project. */
const CACHEABLE_ROOT_FIELDS: Record<string, string> = { eventLadder: 'projectId', project: 'id' };
const MAX_ENTRIES = 200;

interface Entry {
  revision: string;
  result: unknown;
}

/**
 * A whole-response cache for the event ladder (a read that many people repeat and that costs a
 * full GraphQL execution of ~8,000 fields). A cached answer is used only when:
 * - the operation asks for nothing but `eventLadder` and `project` of one project;
 * - the caller's bearer token verifies and the caller is still a member (their role is part of
 *   the key, since the answer holds `myRole`);
 * - the project's data revision is unchanged: one query over the counts, versions, column
 *   revisions and update times of everything the answer shows (sites, segments, age model runs,
 *   hypotheses, the project).
 * Anything else, including every error, goes through ordinary execution, which stays the
 * authority on access and validation.
 */
@Injectable()
export class EventLadderCache {
  private readonly entries = new Map<string, Entry>();

  constructor(
    private readonly jwt: JwtService,
    private readonly access: AccessService,
    private readonly database: DatabaseService,
  ) {}

  /** The project data revision of everything a ladder answer shows. */
  async revision(projectId: string): Promise<string> {
    const result = (await this.database.db.execute(sql`
      select concat_ws('|',
        (select concat_ws(':', count(*), sum(column_revision), sum(version), max(updated_at)) from sites where project_id = ${projectId}),
        (select concat_ws(':', count(*), sum(version), max(updated_at)) from segments where project_id = ${projectId}),
        (select concat_ws(':', count(*), max(r.updated_at)) from age_model_runs r join sites s on s.id = r.site_id where s.project_id = ${projectId}),
        (select concat_ws(':', count(*), sum(version), max(updated_at)) from hypotheses where project_id = ${projectId}),
        (select concat_ws(':', version, updated_at) from projects where id = ${projectId})) as revision`)) as unknown as QueryResult<{ revision: string }>;
    return result.rows[0].revision;
  }

  plugin(): ApolloServerPlugin<{ req: Request }> {
    return {
      requestDidStart: async () => {
        let key: string | undefined;
        let revision: string | undefined;
        return {
          responseForOperation: async (context) => {
            const target = await this.cacheTarget(context);
            if (!target) return null;
            key = target.key;
            revision = await this.revision(target.projectId);
            const entry = this.entries.get(key);
            if (!entry || entry.revision !== revision) return null;
            // Refresh recency so the map evicts the least recently used entry first.
            this.entries.delete(key);
            this.entries.set(key, entry);
            return { http: { status: undefined, headers: new HeaderMap() }, body: { kind: 'single', singleResult: entry.result as never } };
          },
          willSendResponse: async ({ response }) => {
            if (!key || !revision || response.body.kind !== 'single' || response.body.singleResult.errors?.length) return;
            this.entries.set(key, { revision, result: response.body.singleResult });
            if (this.entries.size > MAX_ENTRIES) this.entries.delete(this.entries.keys().next().value as string);
          },
        };
      },
    };
  }

  /** The cache key and project of an operation that may be served from the cache, or undefined. */
  private async cacheTarget(context: GraphQLRequestContext<{ req: Request }>): Promise<{ key: string; projectId: string } | undefined> {
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
    if (!projectId) return undefined;
    const header = context.contextValue.req?.headers?.authorization;
    if (!header?.startsWith('Bearer ')) return undefined;
    let userId: string;
    try {
      userId = this.jwt.verify<{ sub: string }>(header.slice(7), { algorithms: ['HS256'] }).sub;
    } catch {
      return undefined;
    }
    const role = await this.access.roleOf({ id: userId, email: '' }, projectId);
    if (!role) return undefined;
    return { key: `${userId}:${role}:${context.source}:${JSON.stringify(variables)}`, projectId };
  }
}
