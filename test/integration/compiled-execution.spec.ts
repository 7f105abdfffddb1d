import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { storeDensity, type StoredAgeModelResults } from '../../backend/src/age-models/age-model-results';
import { normalDensity, summarise } from '../../backend/src/chronology/common/density';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

/**
 * Queries that clients repeat run compiled by graphql-jit (`compiledExecutionPlugin`); the
 * answers must be the interpreter's, byte for byte. Two servers on one database: the suite's own,
 * which compiles every query from its first sighting, and one that never compiles. (Both stay open
 * to the end: Passport's strategies are process-wide, so the second server's sign-in check serves
 * both while it runs.)
 */
const LADDER = `query($p: ID!) { eventLadder(projectId: $p) {
  columns { site { id name kind alongStrikeKm segment { id name } } latestAgeModelRun { id stale status }
    events { medianCalBp eventHorizon { id name quality } hpd95 { olderCalBp youngerCalBp probability }
      densityGrid { startCalBp stepYears values } density { calBp probability } } } }
  project(id: $p) { id name myRole myPermissions hypotheses { id name preferred version } } }`;
const HYPOTHESIS = `query($id: ID!) { hypothesis(id: $id) { id name version ties { id confidence evidence }
  regionalEvents { id members { id name site { id name } } combinedMedianCalBp combinedHpd95 { olderCalBp youngerCalBp probability }
    concordance warnings chiSquare { t df critical5 passes } ruptureLengthKm magnitude { mw sigma relation } }
  orderConflicts { message } } }`;

let compiling: TestServer;
let interpreting: TestServer;
let fixture: ProjectFixture;
let viewer: GraphqlClient;
let hypothesisId: string;

async function column(client: GraphqlClient, name: string, alongStrikeKm: number, ages: [number, number]): Promise<string[]> {
  const { createSite } = await client.ok(`mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`, {
    i: { projectId: fixture.projectId, name, kind: 'MARSH', latitude: -40, longitude: 175, alongStrikeKm },
  });
  const units: string[] = [];
  for (const [position, top, base] of [[1, 2, 3], [2, 1, 2], [3, 0, 1]]) {
    const { createUnit } = await client.ok(`mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`, {
      i: { siteId: createSite.id, position, name: `U${position}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' },
    });
    units.push(createUnit.id);
  }
  const horizons: string[] = [];
  for (const index of [1, 2]) {
    const { createEventHorizon } = await client.ok(`mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`, {
      i: { siteId: createSite.id, name: `E${index}`, unitBelowId: units[index - 1], unitAboveId: units[index], quality: 1 },
    });
    horizons.push(createEventHorizon.id);
  }
  const results: StoredAgeModelResults = {
    events: horizons.map((eventHorizonId, i) => {
      const density = normalDensity(ages[i], 30 + 10 * i);
      return { eventHorizonId, summary: summarise(density), rhat: 1.001, ess: 2000, density: storeDensity(density) };
    }),
    samples: [],
    eventDraws: { eventHorizonIds: [...horizons].reverse(), drawCount: 0, draws: [] },
  };
  await sql(
    `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, results, finished_at)
     values ($1, 'SUCCEEDED', 1, 7, '{}'::jsonb, '{}'::jsonb, 'fixture', $2::jsonb, now())`,
    [createSite.id, JSON.stringify(results)],
  );
  return horizons;
}

beforeAll(async () => {
  compiling = await startTestServer({ LADDER_CACHE_MIB: '0' });
  interpreting = await startTestServer({ GRAPHQL_COMPILE_AFTER: '0', LADDER_CACHE_MIB: '0' });
  fixture = await createProjectFixture('Compiled execution');
  const anonymous = new GraphqlClient(compiling.url);
  const researcher = await anonymous.signIn(fixture.emails.RESEARCHER, PASSWORD);
  const correlator = await anonymous.signIn(fixture.emails.CORRELATOR, PASSWORD);
  viewer = await anonymous.signIn(fixture.emails.VIEWER, PASSWORD);
  const a = await column(researcher, 'Sedge Marsh', 30, [1610, 1005]);
  const b = await column(researcher, 'Tern Marsh', 90, [1580, 990]);
  await column(researcher, 'Undated Marsh', 150, [2400, 700]);
  const { createHypothesis } = await correlator.ok(`mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id } }`, {
    i: { projectId: fixture.projectId, name: 'Compiled' },
  });
  hypothesisId = createHypothesis.id;
  for (const [x, y] of [[a[0], b[0]], [a[1], b[1]]]) {
    await correlator.ok(`mutation($i: AddTieInput!) { addTie(input: $i) { id } }`, {
      i: { hypothesisId, eventAId: x, eventBId: y, confidence: 2, evidence: ['age overlap'] },
    });
  }
});

afterAll(async () => {
  await compiling?.close();
  await interpreting?.close();
});

async function raw(server: TestServer, query: string, variables: Record<string, unknown>): Promise<string> {
  const response = await fetch(`${server.url}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${viewer.token}` },
    body: JSON.stringify({ query, variables }),
  });
  return response.text();
}

describe('compiled execution', () => {
  it.each([
    ['the event ladder', LADDER, () => ({ p: fixture.projectId })],
    ['a hypothesis with its regional events', HYPOTHESIS, () => ({ id: hypothesisId })],
  ])('answers %s byte for byte as the interpreter does', async (_name, query, variables) => {
    const interpreted = await raw(interpreting, query, variables());
    expect(interpreted).not.toContain('"errors"');
    // Densities, ranges, nulls and nested lists are all in these answers.
    expect(interpreted.length).toBeGreaterThan(2000);
    for (let i = 0; i < 2; i += 1) expect(await raw(compiling, query, variables())).toBe(interpreted);
  });

  it('answers an error the interpreter gives with the same code and message', async () => {
    const missing = { id: '00000000-0000-4000-8000-000000000000' };
    const compiled = JSON.parse(await raw(compiling, HYPOTHESIS, missing));
    expect(compiled.errors?.[0]?.extensions?.code).toBe('NOT_FOUND');
    expect(compiled).toEqual(JSON.parse(await raw(interpreting, HYPOTHESIS, missing)));
  });
});
