import type { ApolloServerPlugin } from '@apollo/server';
import {
  ASTNode,
  DocumentNode,
  getNamedType,
  GraphQLError,
  GraphQLInputType,
  GraphQLSchema,
  isInputObjectType,
  isListType,
  isNonNullType,
  Kind,
  typeFromAST,
  TypeInfo,
  visit,
  visitWithTypeInfo,
} from 'graphql';

/** Every object id of the API is a UUID (the `id` column of each table, `gen_random_uuid()`). */
export const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A problem with one input value: the argument or variable path at fault and why. */
export interface InputProblem {
  field: string;
  message: string;
}

/** A refusal before execution: HTTP 400 with `BAD_USER_INPUT` and the field at fault. */
export function badRequestError(problem: InputProblem): GraphQLError {
  return new GraphQLError(problem.message, {
    extensions: { code: 'BAD_USER_INPUT', field: problem.field, http: { status: 400 } },
  });
}

/** Why a string may not be passed on, or undefined when it is fine. */
function stringProblem(value: string, isId: boolean): string | undefined {
  // PostgreSQL text cannot hold NUL, and no field of ours has a use for it.
  if (value.includes('\u0000')) return 'contains a NUL character';
  if (isId && !UUID_PATTERN.test(value)) return 'is not a valid id (ids are UUIDs)';
  return undefined;
}

/**
 * Check a variable's raw JSON value against its declared input type: ids must be UUIDs and no
 * string may hold NUL. Values of the wrong shape are left to GraphQL's own coercion, which
 * reports them as BAD_USER_INPUT.
 */
function screenValue(value: unknown, type: GraphQLInputType, path: string): InputProblem | undefined {
  if (value === null || value === undefined) return undefined;
  if (isNonNullType(type)) return screenValue(value, type.ofType, path);
  if (isListType(type)) {
    if (!Array.isArray(value)) return screenValue(value, type.ofType, path);
    for (let i = 0; i < value.length; i++) {
      const problem = screenValue(value[i], type.ofType, `${path}.${i}`);
      if (problem) return problem;
    }
    return undefined;
  }
  if (isInputObjectType(type)) {
    if (typeof value !== 'object' || Array.isArray(value)) return undefined;
    const fields = type.getFields();
    for (const name of Object.keys(value as Record<string, unknown>)) {
      if (!Object.hasOwn(fields, name)) continue; // coercion refuses unknown fields
      const problem = screenValue((value as Record<string, unknown>)[name], fields[name].type, `${path}.${name}`);
      if (problem) return problem;
    }
    return undefined;
  }
  if (typeof value === 'string') {
    const problem = stringProblem(value, getNamedType(type).name === 'ID');
    if (problem) return { field: path, message: `${path} ${problem}` };
    return undefined;
  }
  // Scalars such as JSON may carry strings anywhere inside.
  return screenAnyJson(value, path);
}

function screenAnyJson(value: unknown, path: string): InputProblem | undefined {
  if (typeof value === 'string') {
    return value.includes('\u0000') ? { field: path, message: `${path} contains a NUL character` } : undefined;
  }
  if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value as Record<string, unknown>)) {
      const problem = screenAnyJson(key, path) ?? screenAnyJson(item, `${path}.${key}`);
      if (problem) return problem;
    }
  }
  return undefined;
}

/** The argument and input-object fields above a literal: `input.eventAId`. */
function literalPath(ancestors: ReadonlyArray<ASTNode | ReadonlyArray<ASTNode> | undefined>): string {
  const names: string[] = [];
  for (const ancestor of ancestors) {
    if (!ancestor || Array.isArray(ancestor)) continue;
    const node = ancestor as ASTNode;
    if (node.kind === Kind.FIELD) names.length = 0; // arguments of an inner field start afresh
    if (node.kind === Kind.ARGUMENT || node.kind === Kind.OBJECT_FIELD) names.push(node.name.value);
  }
  return names.join('.') || 'argument';
}

/**
 * Screen an operation's inputs before any resolver runs: every `ID` (literal or variable) must be
 * a UUID and no string may contain NUL. Returns the first problem, or undefined.
 */
export function screenOperationInputs(
  schema: GraphQLSchema,
  document: DocumentNode,
  variables: Record<string, unknown>,
): InputProblem | undefined {
  let problem: InputProblem | undefined;
  const typeInfo = new TypeInfo(schema);
  visit(
    document,
    visitWithTypeInfo(typeInfo, {
      VariableDefinition(node) {
        if (problem) return;
        const type = typeFromAST(schema, node.type);
        const name = node.variable.name.value;
        if (type && Object.hasOwn(variables, name)) problem = screenValue(variables[name], type as GraphQLInputType, name);
      },
      StringValue(node, _key, parent, _path, ancestors) {
        if (problem) return;
        const inputType = typeInfo.getInputType();
        const isId = inputType ? getNamedType(inputType).name === 'ID' : false;
        const fault = stringProblem(node.value, isId);
        if (fault) {
          const field = literalPath([...ancestors, parent as ASTNode]);
          problem = { field, message: `${field} ${fault}` };
        }
      },
      IntValue(node, _key, parent, _path, ancestors) {
        if (problem) return;
        const inputType = typeInfo.getInputType();
        // An Int literal coerces to an ID; it can never be a UUID.
        if (inputType && getNamedType(inputType).name === 'ID') {
          const field = literalPath([...ancestors, parent as ASTNode]);
          problem = { field, message: `${field} ${stringProblem(node.value, true)}` };
        }
      },
    }),
  );
  return problem;
}

/**
 * The Apollo plugin for `screenOperationInputs`: one place where malformed ids and NUL bytes are
 * refused with HTTP 400 `BAD_USER_INPUT`, so no query with them ever reaches PostgreSQL (whose
 * error would otherwise carry the statement).
 */
export function inputScreeningPlugin(): ApolloServerPlugin {
  return {
    async requestDidStart() {
      return {
        async didResolveOperation({ request, document, schema }) {
          const problem = screenOperationInputs(schema, document, (request.variables ?? {}) as Record<string, unknown>);
          if (problem) throw badRequestError(problem);
        },
      };
    },
  };
}
