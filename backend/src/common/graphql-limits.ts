import { ASTVisitor, FieldNode, FragmentDefinitionNode, GraphQLError, Kind, SelectionSetNode, ValidationContext } from 'graphql';
import type { ApolloServerPlugin } from '@apollo/server';
import { getComplexity, simpleEstimator } from 'graphql-query-complexity';

/** Deepest selection nesting a query may have; the deepest screen query (the ladder) needs 7. */
export const MAX_QUERY_DEPTH = 12;
/** Most fields one operation may select (each field costs 1, lists are not multiplied). */
export const MAX_QUERY_COMPLEXITY = 2000;

function depthOf(selectionSet: SelectionSetNode | undefined, fragments: Record<string, FragmentDefinitionNode>, seen: Set<string>): number {
  if (!selectionSet) return 0;
  let deepest = 0;
  for (const selection of selectionSet.selections) {
    if (selection.kind === Kind.FIELD) {
      const field = selection as FieldNode;
      if (field.name.value.startsWith('__')) continue; // introspection is bounded by the schema itself
      deepest = Math.max(deepest, 1 + depthOf(field.selectionSet, fragments, seen));
    } else if (selection.kind === Kind.INLINE_FRAGMENT) {
      deepest = Math.max(deepest, depthOf(selection.selectionSet, fragments, seen));
    } else if (selection.kind === Kind.FRAGMENT_SPREAD) {
      const name = selection.name.value;
      if (seen.has(name) || !fragments[name]) continue; // cycles are a validation error of their own
      deepest = Math.max(deepest, depthOf(fragments[name].selectionSet, fragments, new Set([...seen, name])));
    }
  }
  return deepest;
}

/** Refuse operations nested deeper than `maxDepth` (cheap to parse, costly to resolve). */
export function depthLimitRule(maxDepth = MAX_QUERY_DEPTH) {
  return (context: ValidationContext): ASTVisitor => {
    const fragments: Record<string, FragmentDefinitionNode> = {};
    for (const definition of context.getDocument().definitions) {
      if (definition.kind === Kind.FRAGMENT_DEFINITION) fragments[definition.name.value] = definition;
    }
    return {
      OperationDefinition(operation) {
        const depth = depthOf(operation.selectionSet, fragments, new Set());
        if (depth > maxDepth) {
          context.reportError(new GraphQLError(`query is nested ${depth} levels deep; the limit is ${maxDepth}`, { extensions: { code: 'BAD_USER_INPUT' } }));
        }
      },
    };
  };
}

/**
 * Refuse operations selecting more than `maximum` fields in all (graphql-query-complexity), as an
 * Apollo plugin: it runs after variables are known, which a plain validation rule cannot.
 */
export function complexityLimitPlugin(maximum = MAX_QUERY_COMPLEXITY): ApolloServerPlugin {
  return {
    async requestDidStart() {
      return {
        async didResolveOperation({ request, document, schema }) {
          const complexity = getComplexity({
            schema,
            query: document,
            operationName: request.operationName ?? undefined,
            variables: request.variables ?? {},
            estimators: [simpleEstimator({ defaultComplexity: 1 })],
          });
          if (complexity > maximum) {
            throw new GraphQLError(`query selects ${complexity} fields; the limit is ${maximum}`, { extensions: { code: 'BAD_USER_INPUT' } });
          }
        },
      };
    },
  };
}
