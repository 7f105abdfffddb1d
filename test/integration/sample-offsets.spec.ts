import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AgeModelJob } from '../../backend/src/age-models/age-model.job';
import { RunExecutor } from '../../backend/src/jobs/run-executor';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const SAMPLE_FIELDS = 'id version labCode material ageRelation deltaRSource inheritanceScaleYears inheritanceScaleDefaultYears';
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const CREATE_SAMPLE = `mutation($i: CreateSampleInput!) { createSample(input: $i) { ${SAMPLE_FIELDS} } }`;
const UPDATE_SAMPLE = `mutation($id: ID!, $v: Int!, $i: UpdateSampleInput!) { updateSample(id: $id, version: $v, input: $i) { ${SAMPLE_FIELDS} } }`;
const SAMPLE = `query($id: ID!) { sample(id: $id) { ${SAMPLE_FIELDS} } }`;
const START = `mutation($i: StartAgeModelRunInput!) { startAgeModelRun(input: $i) { id } }`;
const RUN = `query($id: ID!) { ageModelRun(id: $id) { status
  samples { sample { labCode } outlierProbability offset { scaleYears medianYears low95Years high95Years } } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole, GraphqlClient>;
let siteId: string;
let units: { below: string; above: string };

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Sample offsets');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  const researcher = clients.RESEARCHER;
  siteId = (await researcher.ok(CREATE_SITE, {
    i: { projectId: fixture.projectId, name: 'Invented trench', kind: 'TRENCH', latitude: 40, longitude: -123, alongStrikeKm: 14 },
  })).createSite.id;
  const below = (await researcher.ok(CREATE_UNIT, { i: { siteId, position: 1, name: 'Soil', topDepthM: 1, baseDepthM: 2, facies: 'SOIL' } })).createUnit;
  const above = (await researcher.ok(CREATE_UNIT, { i: { siteId, position: 2, name: 'Wedge', topDepthM: 0, baseDepthM: 1, facies: 'COLLUVIUM' } })).createUnit;
  units = { below: below.id, above: above.id };
  await researcher.ok(CREATE_HORIZON, { i: { siteId, name: 'E1', unitBelowId: below.id, unitAboveId: above.id, quality: 1 } });
  // Luminescence pins both units; two charcoal samples in the wedge date about 250 years older than it.
  const luminescence = (labCode: string, unitId: string, years: number) => ({
    siteId, unitId, labCode, method: 'LUMINESCENCE', material: 'OTHER', ageRelation: 'DATES_DEPOSIT', calendarAgeBp: years, calendarErrorYears: 15, measurementYear: 2000,
  });
  await researcher.ok(CREATE_SAMPLE, { i: luminescence('OSL-1', below.id, 1150) });
  await researcher.ok(CREATE_SAMPLE, { i: luminescence('OSL-2', above.id, 1050) });
});

afterAll(async () => {
  await server?.close();
});

describe('Sample.inheritanceScaleYears', () => {
  it('is null by default with the material default beside it, set on create, changed and cleared on update', async () => {
    const { createSample } = await clients.RESEARCHER.ok(CREATE_SAMPLE, {
      i: { siteId, unitId: units.above, labCode: 'CH-1', method: 'RADIOCARBON', material: 'DETRITAL_CHARCOAL', ageRelation: 'OLDER_THAN_DEPOSIT', c14Age: 1350, c14Error: 25, curve: 'INTCAL20' },
    });
    expect(createSample).toMatchObject({ inheritanceScaleYears: null, inheritanceScaleDefaultYears: 200 });
    const seeds = (await clients.RESEARCHER.ok(CREATE_SAMPLE, {
      i: {
        siteId, unitId: units.above, labCode: 'CH-2', method: 'RADIOCARBON', material: 'PLANT_MACROFOSSIL', ageRelation: 'OLDER_THAN_DEPOSIT',
        c14Age: 1350, c14Error: 25, curve: 'INTCAL20', inheritanceScaleYears: 400,
      },
    })).createSample;
    expect(seeds).toMatchObject({ inheritanceScaleYears: 400, inheritanceScaleDefaultYears: 25 });
    const changed = (await clients.RESEARCHER.ok(UPDATE_SAMPLE, { id: seeds.id, v: seeds.version, i: { inheritanceScaleYears: 300 } })).updateSample;
    expect(changed.inheritanceScaleYears).toBe(300);
    const cleared = (await clients.RESEARCHER.ok(UPDATE_SAMPLE, { id: seeds.id, v: changed.version, i: { inheritanceScaleYears: null } })).updateSample;
    expect(cleared.inheritanceScaleYears).toBeNull();
    const back = (await clients.RESEARCHER.ok(UPDATE_SAMPLE, { id: seeds.id, v: cleared.version, i: { inheritanceScaleYears: 400 } })).updateSample;
    expect(back.inheritanceScaleYears).toBe(400);
  });

  it('refuses a scale outside 1-10,000 years as BAD_USER_INPUT naming the field, changing nothing', async () => {
    for (const value of [0.5, 20_000, -3]) {
      const error = await clients.RESEARCHER.errorOf(CREATE_SAMPLE, {
        i: { siteId, unitId: units.above, labCode: `BAD-${value}`, method: 'RADIOCARBON', material: 'SHELL', ageRelation: 'OLDER_THAN_DEPOSIT', c14Age: 1000, c14Error: 20, curve: 'INTCAL20', inheritanceScaleYears: value },
      });
      expect(error.code).toBe('BAD_USER_INPUT');
      expect(error.field).toBe('inheritanceScaleYears');
    }
    const { createSample } = await clients.RESEARCHER.ok(CREATE_SAMPLE, {
      i: { siteId, unitId: units.below, labCode: 'SH-1', method: 'RADIOCARBON', material: 'SHELL', ageRelation: 'DATES_DEPOSIT', c14Age: 1250, c14Error: 20, curve: 'INTCAL20', excluded: true, exclusionReason: 'test' },
    });
    const error = await clients.RESEARCHER.errorOf(UPDATE_SAMPLE, { id: createSample.id, v: createSample.version, i: { inheritanceScaleYears: 1e6 } });
    expect(error.field).toBe('inheritanceScaleYears');
    const after = (await clients.VIEWER.ok(SAMPLE, { id: createSample.id })).sample;
    expect(after).toMatchObject({ version: createSample.version, inheritanceScaleYears: null });
  });
});

describe('Sample.deltaRSource', () => {
  it('is stored trimmed, and empty clears it', async () => {
    const { createSample } = await clients.RESEARCHER.ok(CREATE_SAMPLE, {
      i: {
        siteId, unitId: units.below, labCode: 'FOR-1', method: 'RADIOCARBON', material: 'PLANKTIC_FORAMS', ageRelation: 'DATES_DEPOSIT',
        c14Age: 1700, c14Error: 30, curve: 'MARINE20', deltaR: 100, deltaRError: 40, deltaRSource: '  Invented shelf  ', excluded: true, exclusionReason: 'test',
      },
    });
    expect(createSample.deltaRSource).toBe('Invented shelf');
    const cleared = (await clients.RESEARCHER.ok(UPDATE_SAMPLE, { id: createSample.id, v: createSample.version, i: { deltaRSource: '' } })).updateSample;
    expect(cleared.deltaRSource).toBeNull();
  });
});

describe('SamplePosterior.offset', () => {
  it('reports each inherited sample\'s offset with the scale the run used (its own, else its material\'s)', async () => {
    const { startAgeModelRun } = await clients.RESEARCHER.ok(START, { i: { siteId, seed: 3, iterations: 4000 } });
    await server.app.get(RunExecutor).execute(server.app.get(AgeModelJob), startAgeModelRun.id);
    const run = (await clients.VIEWER.ok(RUN, { id: startAgeModelRun.id })).ageModelRun;
    expect(run.status).toBe('SUCCEEDED');
    const byCode = Object.fromEntries(run.samples.map((s: { sample: { labCode: string } }) => [s.sample.labCode, s]));
    expect(byCode['OSL-1'].offset).toBeNull();
    expect(byCode['CH-1'].offset.scaleYears).toBe(200);
    expect(byCode['CH-2'].offset.scaleYears).toBe(400);
    // 1350 14C yr BP is about 1280 cal BP, some 200 years older than the wedge (about 1050).
    for (const code of ['CH-1', 'CH-2']) {
      const { medianYears, low95Years, high95Years } = byCode[code].offset;
      expect(medianYears).toBeGreaterThan(100);
      expect(medianYears).toBeLessThan(400);
      expect(low95Years).toBeLessThan(medianYears);
      expect(high95Years).toBeGreaterThan(medianYears);
    }
  });
});

describe('AgeModelRun.reservoirOffsets', () => {
  const RESERVOIRS = `query($id: ID!) { ageModelRun(id: $id) { status
    reservoirOffsets { source named priorMeanYears priorSdYears medianYears low95Years high95Years samples { labCode } } } }`;

  it('shares one offset among the marine samples naming one source and reports its posterior', async () => {
    const researcher = clients.RESEARCHER;
    const marineSite = (await researcher.ok(CREATE_SITE, {
      i: { projectId: fixture.projectId, name: 'Invented lagoon', kind: 'MARSH', latitude: 40, longitude: -124, alongStrikeKm: 20 },
    })).createSite.id;
    const lower = (await researcher.ok(CREATE_UNIT, { i: { siteId: marineSite, position: 1, name: 'Shell bed', topDepthM: 1, baseDepthM: 2, facies: 'TIDAL_MUD' } })).createUnit;
    const upper = (await researcher.ok(CREATE_UNIT, { i: { siteId: marineSite, position: 2, name: 'Sand', topDepthM: 0, baseDepthM: 1, facies: 'SAND_SHEET' } })).createUnit;
    await researcher.ok(CREATE_HORIZON, { i: { siteId: marineSite, name: 'L1', unitBelowId: lower.id, unitAboveId: upper.id, quality: 1 } });
    const shell = (labCode: string, unitId: string, c14Age: number, extra: Record<string, unknown> = {}) => ({
      siteId: marineSite, unitId, labCode, method: 'RADIOCARBON', material: 'SHELL', ageRelation: 'DATES_DEPOSIT', c14Age, c14Error: 25,
      curve: 'MARINE20', deltaR: 120, deltaRError: 50, deltaRSource: 'Invented bay', ...extra,
    });
    await researcher.ok(CREATE_SAMPLE, { i: shell('SH-A', lower.id, 2400) });
    await researcher.ok(CREATE_SAMPLE, { i: shell('SH-B', lower.id, 2420) });
    const odd = (await researcher.ok(CREATE_SAMPLE, { i: shell('SH-C', upper.id, 2100, { deltaR: 90 }) })).createSample;
    // One source, two Delta-R values: refused on deltaRSource, naming both samples.
    const refused = await researcher.errorOf(START, { i: { siteId: marineSite, seed: 1, iterations: 2000 } });
    expect(refused.code).toBe('BAD_USER_INPUT');
    expect(refused.field).toBe('deltaRSource');
    expect(refused.message).toMatch(/SH-C/);
    await researcher.ok(UPDATE_SAMPLE, { id: odd.id, v: odd.version, i: { deltaR: 120 } });

    const { startAgeModelRun } = await researcher.ok(START, { i: { siteId: marineSite, seed: 4, iterations: 4000 } });
    await server.app.get(RunExecutor).execute(server.app.get(AgeModelJob), startAgeModelRun.id);
    const run = (await clients.VIEWER.ok(RESERVOIRS, { id: startAgeModelRun.id })).ageModelRun;
    expect(run.status).toBe('SUCCEEDED');
    expect(run.reservoirOffsets).toHaveLength(1);
    const [offset] = run.reservoirOffsets;
    expect(offset).toMatchObject({ source: 'Invented bay', named: true, priorMeanYears: 120, priorSdYears: 50 });
    expect(offset.samples.map((s: { labCode: string }) => s.labCode).sort()).toEqual(['SH-A', 'SH-B', 'SH-C']);
    // Three dates cannot learn a local offset against nothing else: the posterior stays near the prior.
    expect(offset.low95Years).toBeLessThan(offset.medianYears);
    expect(offset.high95Years).toBeGreaterThan(offset.medianYears);
    expect(Math.abs(offset.medianYears - 120)).toBeLessThan(60);
  });
});
