import { GraphQLScalarType, Kind, ValueNode } from 'graphql';
import { numberListJson } from '../answer-json';

/** ISO-8601 date-time strings in and out; Date objects from the database are serialised. */
export const DateTimeScalar = new GraphQLScalarType({
  name: 'DateTime',
  serialize: (value) => (value instanceof Date ? value.toISOString() : String(value)),
  parseValue: (value) => parseDate(String(value)),
  parseLiteral: (ast) => (ast.kind === Kind.STRING ? parseDate(ast.value) : null),
});

function parseDate(text: string): Date {
  const date = new Date(text);
  if (Number.isNaN(date.getTime())) throw new TypeError(`"${text}" is not an ISO-8601 date-time`);
  return date;
}

/** Any JSON value (settings, audit images). */
export const JsonScalar = new GraphQLScalarType({
  name: 'JSON',
  serialize: (value) => value,
  parseValue: (value) => value,
  parseLiteral: function literal(ast: ValueNode): unknown {
    switch (ast.kind) {
      case Kind.STRING:
      case Kind.BOOLEAN:
        return ast.value;
      case Kind.INT:
      case Kind.FLOAT:
        return Number(ast.value);
      case Kind.OBJECT:
        return Object.fromEntries(ast.fields.map((f) => [f.name.value, literal(f.value)]));
      case Kind.LIST:
        return ast.values.map(literal);
      default:
        return null;
    }
  },
});

/**
 * A list of finite numbers passed through as one JSON array (no per-item scalar work); answered as
 * a `NumberListJson`, whose text is made once per array (see `answerJson`).
 */
export const NumberListScalar = new GraphQLScalarType({
  name: 'NumberList',
  serialize: (value) => (Array.isArray(value) ? numberListJson(value as number[]) : value),
  parseValue: (value) => {
    if (!Array.isArray(value) || !value.every((v) => typeof v === 'number' && Number.isFinite(v))) {
      throw new TypeError('NumberList must be an array of finite numbers');
    }
    return value;
  },
  parseLiteral: (ast) => (ast.kind === Kind.LIST ? ast.values.map((v) => (v.kind === Kind.INT || v.kind === Kind.FLOAT ? Number(v.value) : NaN)) : null),
});
