import { ASTVisitor, FieldNode, FragmentDefinitionNode, GraphQLError, Kind, SelectionSetNode, ValidationContext } from 'graphql';

/** Deepest selection nesting a query may have; the deepest screen query (the ladder) needs 7. */
export const MAX_QUERY_DEPTH = 12;

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
