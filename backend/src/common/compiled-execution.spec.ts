import { ApolloServer, type ApolloServerPlugin } from '@apollo/server';
import { GraphQLError, GraphQLFloat, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLObjectType, GraphQLScalarType, GraphQLSchema, GraphQLString } from 'graphql';
import { describe, expect, it } from 'vitest';
import { compiledExecutionPlugin } from './compiled-execution';

interface Probe {
  /** Fields Apollo's own (interpreted) execution resolved; the compiled path calls no such hook. */
  interpretedFields: number;
  failNext: boolean;
  touches: number;
}

function server(compileAfter: number): { apollo: ApolloServer; probe: Probe } {
  const probe: Probe = { interpretedFields: 0, failNext: false, touches: 0 };
  const Doubled = new GraphQLScalarType({ name: 'Doubled', serialize: (value) => (value as number) * 2 });
  const Event = new GraphQLObjectType({
    name: 'Event',
    fields: { name: { type: new GraphQLNonNull(GraphQLString) }, ageCalBp: { type: GraphQLFloat }, doubled: { type: new GraphQLNonNull(Doubled) } },
  });
  const schema = new GraphQLSchema({
    query: new GraphQLObjectType({
      name: 'Query',
      fields: {
        events: {
          type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(Event))),
          args: { minimum: { type: new GraphQLNonNull(GraphQLInt) } },
          resolve: (_root: unknown, args: { minimum: number }) =>
            [
              { name: 'E1', ageCalBp: 1200, doubled: 1 },
              { name: 'E2', ageCalBp: null, doubled: 2 },
              { name: 'E3', ageCalBp: 480.5, doubled: 3 },
            ].slice(0, Math.max(args.minimum, 0)),
        },
        failing: {
          type: GraphQLString,
          resolve: () => {
            if (probe.failNext) throw new GraphQLError('nothing here', { extensions: { code: 'NOT_FOUND' } });
            return 'fine';
          },
        },
      },
    }),
    mutation: new GraphQLObjectType({ name: 'Mutation', fields: { touch: { type: new GraphQLNonNull(GraphQLInt), resolve: () => ++probe.touches } } }),
  });
  const counter: ApolloServerPlugin = {
    async requestDidStart() {
      return {
        async executionDidStart() {
          return {
            willResolveField() {
              probe.interpretedFields += 1;
            },
          };
        },
      };
    },
  };
  const apollo = new ApolloServer({
    schema,
    plugins: [counter, compiledExecutionPlugin(compileAfter)],
    formatError: (formatted) => ({ ...formatted, message: `formatted: ${formatted.message}` }),
  });
  return { apollo, probe };
}

async function run(apollo: ApolloServer, query: string, variables: Record<string, unknown> = {}) {
  const response = await apollo.executeOperation({ query, variables });
  if (response.body.kind !== 'single') throw new Error('expected a single result');
  return response.body.singleResult;
}

const EVENTS = 'query($m: Int!) { events(minimum: $m) { name ageCalBp doubled } }';

describe('compiledExecutionPlugin', () => {
  it('interprets a query at first sight and answers it compiled from the second, with the same answer', async () => {
    const { apollo, probe } = server(2);
    const first = await run(apollo, EVENTS, { m: 3 });
    const interpreted = probe.interpretedFields;
    expect(interpreted).toBeGreaterThan(0);
    const second = await run(apollo, EVENTS, { m: 3 });
    const third = await run(apollo, EVENTS, { m: 2 });
    expect(probe.interpretedFields).toBe(interpreted);
    expect(second).toEqual(first);
    // Leaves keep their scalar's serialisation (Doubled doubles) and nulls stay null.
    expect(second.data).toEqual({
      events: [
        { name: 'E1', ageCalBp: 1200, doubled: 2 },
        { name: 'E2', ageCalBp: null, doubled: 4 },
        { name: 'E3', ageCalBp: 480.5, doubled: 6 },
      ],
    });
    // Variables are read on every request, not fixed at compilation.
    expect((third.data as { events: unknown[] }).events).toHaveLength(2);
  });

  it('answers an error through the normal execution, with its code and formatting', async () => {
    const { apollo, probe } = server(1);
    expect((await run(apollo, '{ failing }')).data).toEqual({ failing: 'fine' });
    expect(probe.interpretedFields).toBe(0);
    probe.failNext = true;
    const failed = await run(apollo, '{ failing }');
    expect(probe.interpretedFields).toBeGreaterThan(0);
    expect(failed.errors).toHaveLength(1);
    expect(failed.errors?.[0]).toMatchObject({ message: 'formatted: nothing here', extensions: { code: 'NOT_FOUND' }, path: ['failing'] });
  });

  it('refuses variables that do not fit their types as Apollo does', async () => {
    const { apollo } = server(1);
    await run(apollo, EVENTS, { m: 1 });
    const bad = await run(apollo, EVENTS, { m: 'many' });
    expect(bad.data).toBeUndefined();
    expect(bad.errors?.[0]).toMatchObject({ extensions: { code: 'BAD_USER_INPUT' } });
    expect(bad.errors?.[0].message).toMatch(/^formatted: Variable "\$m"/);
  });

  it('never compiles a mutation (it runs exactly once a request)', async () => {
    const { apollo, probe } = server(1);
    for (let i = 1; i <= 3; i += 1) {
      const before = probe.interpretedFields;
      expect((await run(apollo, 'mutation { touch }')).data).toEqual({ touch: i });
      expect(probe.interpretedFields).toBeGreaterThan(before);
    }
    expect(probe.touches).toBe(3);
  });

  it('is off at 0', async () => {
    const { apollo, probe } = server(0);
    await run(apollo, EVENTS, { m: 1 });
    const once = probe.interpretedFields;
    await run(apollo, EVENTS, { m: 1 });
    expect(probe.interpretedFields).toBe(2 * once);
  });
});
