import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildSchema, GraphQLEnumType } from 'graphql';
import { describe, expect, it } from 'vitest';
import { repositoryRoot } from '../common/repo-paths';
import { Permission, permissionName, permissionNamesOf } from './permissions';

const schema = buildSchema(readFileSync(join(repositoryRoot(), 'schema.graphql'), 'utf8'));

describe('GraphQL enum Permission', () => {
  it('lists exactly the backend permissions, so a permission added on one side only fails here', () => {
    const graphqlEnum = schema.getType('Permission') as GraphQLEnumType;
    const inSchema = graphqlEnum.getValues().map((value) => value.name).sort();
    const inBackend = Object.values(Permission).map(permissionName).sort();
    expect(inSchema).toEqual(inBackend);
  });

  it('names a permission in GraphQL style', () => {
    expect(permissionName(Permission.AgeModelRun)).toBe('AGE_MODEL_RUN');
    expect(permissionName(Permission.ProjectSettings)).toBe('PROJECT_SETTINGS');
  });

  it('gives a viewer reading only and an admin everything', () => {
    expect(permissionNamesOf('VIEWER')).toEqual(['PROJECT_READ', 'AUDIT_READ']);
    expect(permissionNamesOf('ADMIN')).toHaveLength(Object.values(Permission).length);
  });
});
