import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildSchema, GraphQLEnumType } from 'graphql';
import { describe, expect, it } from 'vitest';
import { repositoryRoot } from '../../common/repo-paths';
import { AGE_RELATIONS, DATING_METHODS, FACIES, JOB_STATUSES, ROLES, SAMPLE_MATERIALS, SITE_KINDS, TECTONIC_SETTINGS } from './enums';

const schema = buildSchema(readFileSync(join(repositoryRoot(), 'schema.graphql'), 'utf8'));

/** Each GraphQL enum that repeats a database vocabulary, with the vocabulary. */
const REPEATED: Record<string, readonly string[]> = {
  Role: ROLES,
  SiteKind: SITE_KINDS,
  Facies: FACIES,
  DatingMethod: DATING_METHODS,
  SampleMaterial: SAMPLE_MATERIALS,
  AgeRelation: AGE_RELATIONS,
  TectonicSetting: TECTONIC_SETTINGS,
  JobStatus: JOB_STATUSES,
};

describe('vocabularies', () => {
  it.each(Object.keys(REPEATED))('GraphQL enum %s lists exactly the database enum values', (name) => {
    const graphqlEnum = schema.getType(name) as GraphQLEnumType;
    expect(graphqlEnum.getValues().map((value) => value.name).sort()).toEqual([...REPEATED[name]].sort());
  });
});
