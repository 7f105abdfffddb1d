import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildSchema, FragmentDefinitionNode, Kind, OperationDefinitionNode, parse } from 'graphql';
import { describe, expect, it } from 'vitest';
import { repositoryRoot } from '../../common/repo-paths';
import { coveredByLadderRevision } from './event-ladder-cache-scope';

const schema = buildSchema(readFileSync(join(repositoryRoot(), 'schema.graphql'), 'utf8'));

function covered(source: string): boolean {
  const document = parse(source);
  const operation = document.definitions.find((d): d is OperationDefinitionNode => d.kind === Kind.OPERATION_DEFINITION)!;
  const fragments = Object.fromEntries(
    document.definitions.filter((d): d is FragmentDefinitionNode => d.kind === Kind.FRAGMENT_DEFINITION).map((d) => [d.name.value, d]),
  );
  return coveredByLadderRevision(schema, operation, fragments);
}

/** The GraphQL text of a frontend document, `export const <name> = graphql(\`...\`)`. */
function frontendDocument(file: string, name: string): string {
  const text = readFileSync(join(repositoryRoot(), 'frontend', 'src', 'modules', file), 'utf8');
  const match = new RegExp(`export const ${name} = graphql\\(\`([^\`]*)\``).exec(text);
  if (!match) throw new Error(`${name} not found in ${file}`);
  return match[1];
}

describe(coveredByLadderRevision.name, () => {
  it('keeps the ladder page query, which reads only what the revision covers', () => {
    expect(covered(frontendDocument('correlation/graphql/ladder.ts', 'EventLadderDocument'))).toBe(true);
  });

  it('never keeps a project query about members, releases or analyses (the revision does not move with them)', () => {
    expect(covered(frontendDocument('releases/graphql/releases.ts', 'ProjectReleasesDocument'))).toBe(false);
    expect(covered(`query($p: ID!) { project(id: $p) { id members { id role } } }`)).toBe(false);
    expect(covered(`query($p: ID!) { project(id: $p) { id recurrenceAnalyses { id status } } }`)).toBe(false);
  });

  it('refuses a ladder that reaches samples, attachments or ties anywhere below', () => {
    const ladder = (site: string) => `query($p: ID!) { eventLadder(projectId: $p) { columns { site { id ${site} } } } }`;
    expect(covered(ladder('name units { id name } segment { name }'))).toBe(true);
    expect(covered(ladder('samples { id labCode calibration { medianCalBp } }'))).toBe(false);
    expect(covered(ladder('attachments { id }'))).toBe(false);
    expect(covered(`query($p: ID!) { project(id: $p) { hypotheses { id ties { id } } } }`)).toBe(false);
    expect(covered(`query($p: ID!) { eventLadder(projectId: $p) { columns { latestAgeModelRun { samples { outlierProbability } } } } }`)).toBe(false);
  });

  it('follows fragments and inline fragments, and refuses mutations', () => {
    expect(covered(`query($p: ID!) { eventLadder(projectId: $p) { columns { site { ...S } } } } fragment S on Site { id name }`)).toBe(true);
    expect(covered(`query($p: ID!) { eventLadder(projectId: $p) { columns { site { ...S } } } } fragment S on Site { id samples { id } }`)).toBe(false);
    expect(covered(`query($p: ID!) { project(id: $p) { ... on Project { id name } } }`)).toBe(true);
    expect(covered(`query($p: ID!) { project(id: $p) { ... on Project { releases { id } } } }`)).toBe(false);
    expect(covered(`mutation($p: ID!) { deleteProject(id: $p) }`)).toBe(false);
  });
});
