import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildSchema, parse } from 'graphql';
import { describe, expect, it } from 'vitest';
import { screenOperationInputs } from './graphql-input-screen';
import { repositoryRoot } from './repo-paths';

const schema = buildSchema(readFileSync(join(repositoryRoot(), 'schema.graphql'), 'utf8'));
const ID = '6f1c2a4e-9b3d-4c7a-8e21-0d5f3b9a7c64';
const screen = (query: string, variables: Record<string, unknown> = {}) => screenOperationInputs(schema, parse(query), variables);

describe('screenOperationInputs', () => {
  it('passes UUIDs and ordinary strings', () => {
    expect(screen(`{ site(id: "${ID}") { id } }`)).toBeUndefined();
    expect(screen('query($id: ID!) { site(id: $id) { id } }', { id: ID.toUpperCase() })).toBeUndefined();
    expect(screen('mutation($i: CreateProjectInput!) { createProject(input: $i) { id } }', { i: { name: 'Tidal marsh, é' } })).toBeUndefined();
  });

  it('refuses a malformed id in a literal, an Int literal, a variable and a nested input field', () => {
    expect(screen('{ site(id: "42") { id } }')).toEqual({ field: 'id', message: 'id is not a valid id (ids are UUIDs)' });
    expect(screen('{ site(id: 42) { id } }')?.field).toBe('id');
    expect(screen('query($id: ID!) { site(id: $id) { id } }', { id: `${ID}x` })?.field).toBe('id');
    expect(screen('mutation($i: AddTieInput!) { addTie(input: $i) { id } }', { i: { hypothesisId: ID, eventAId: ID, eventBId: 'x' } })?.field).toBe('i.eventBId');
    expect(screen(`mutation { addTie(input: { hypothesisId: "${ID}", eventAId: "nope", eventBId: "${ID}" }) { id } }`)?.message).toMatch(/eventAId is not a valid id/);
  });

  it('refuses NUL in any string: variables, literals, JSON scalars, keys', () => {
    expect(screen('mutation($i: CreateProjectInput!) { createProject(input: $i) { id } }', { i: { name: 'a\u0000' } })?.field).toBe('i.name');
    expect(screen('mutation { createProject(input: { name: "a\\u0000" }) { id } }')?.message).toMatch(/NUL/);
  });

  it('leaves values of the wrong shape to GraphQL coercion', () => {
    expect(screen('query($id: ID!) { site(id: $id) { id } }', { id: { not: 'a string' } })).toBeUndefined();
  });
});
