import type { ApolloServerPlugin, GraphQLRequestContext, GraphQLResponse } from '@apollo/server';
import { HeaderMap } from '@apollo/server';
import type { DocumentNode, GraphQLSchema } from 'graphql';
import { compileQuery, isCompiledQuery, type CompiledQuery } from 'graphql-jit';

/** Distinct query texts whose sightings (and compiled forms) one API process keeps. */
const MAX_QUERIES = 500;

interface Entry {
  sightings: number;
  /** The compiled query, `null` when graphql-jit refused it (then it is always interpreted). */
  compiled?: CompiledQuery | null;
}

/**
 * Executes queries that clients send again and again (the event ladder, a site's page) with a
 * query compiled to JavaScript by graphql-jit instead of graphql-js's interpreter, which walks the
 * document for every field of every object: the ladder's 600 events cost ~40 % of the API's CPU
 * in the interpreter. The rules that keep the compiled path a pure speed-up:
 *
 * - Only queries (never mutations), and only after `compileAfter` sightings of the same text and
 *   operation: a one-off query is interpreted and costs no compilation, and a client cannot make
 *   the server compile without limit (`MAX_QUERIES` texts kept, least recently used dropped).
 * - Only answers without errors are sent from it. An answer with any error (a refusal, NOT_FOUND,
 *   bad variables) is dropped and the operation runs through Apollo's normal execution, so every
 *   error keeps its code, message and formatting; queries are reads, so the second run changes
 *   nothing.
 * - It runs after the plugins that price, screen and cache the operation (it must be the last
 *   `responseForOperation` of the list), and Apollo's `willSendResponse` hooks see its answer.
 *
 * `compileAfter` 0 turns it off.
 */
export function compiledExecutionPlugin<TContext extends object>(compileAfter: number): ApolloServerPlugin<TContext> {
  const queries = new Map<string, Entry>();
  let schemaOfCache: GraphQLSchema | undefined;

  const compiledFor = (context: GraphQLRequestContext<TContext>, document: DocumentNode): CompiledQuery | undefined => {
    if (context.schema !== schemaOfCache) {
      queries.clear();
      schemaOfCache = context.schema;
    }
    const key = `${context.operationName ?? ''}\u0000${context.source ?? ''}`;
    let entry = queries.get(key);
    if (entry) queries.delete(key); // re-inserted below: the map's order is recency
    entry ??= { sightings: 0 };
    entry.sightings += 1;
    queries.set(key, entry);
    for (const oldest of queries.keys()) {
      if (queries.size <= MAX_QUERIES) break;
      queries.delete(oldest);
    }
    if (entry.compiled === undefined && entry.sightings >= compileAfter) {
      const compiled = compileQuery(context.schema, document, context.operationName ?? undefined);
      entry.compiled = isCompiledQuery(compiled) ? compiled : null;
    }
    return entry.compiled ?? undefined;
  };

  return {
    async requestDidStart() {
      if (compileAfter <= 0) return;
      return {
        async responseForOperation(context): Promise<GraphQLResponse | null> {
          if (context.operation?.operation !== 'query' || !context.document) return null;
          const compiled = compiledFor(context, context.document);
          if (!compiled) return null;
          const result = await compiled.query(undefined, context.contextValue, context.request.variables ?? {});
          if (result.errors?.length || !result.data) return null;
          return { http: { headers: new HeaderMap(), status: undefined }, body: { kind: 'single', singleResult: { data: result.data } } };
        },
      };
    },
  };
}
