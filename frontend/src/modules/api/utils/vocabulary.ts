/**
 * The server's vocabularies reach the screens through the generated GraphQL types (`@/gql/graphql`,
 * from schema.graphql, whose enums a backend spec checks against the database's). A screen keeps
 * one record per vocabulary, value -> label (or style), typed `Record<Enum, ...>` so a value added
 * on the server fails the type check until it has a label; the ordered list of values is read
 * from that record here, never written out a second time.
 */
export function valuesOf<Value extends string>(byValue: Readonly<Record<Value, unknown>>): readonly Value[] {
  return Object.keys(byValue) as Value[];
}
