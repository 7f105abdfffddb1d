import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AgeModelJob } from '../../backend/src/age-models/age-model.job';
import { RunExecutor } from '../../backend/src/jobs/run-executor';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id version basalErosionM } }`;
const UPDATE_UNIT = `mutation($id: ID!, $v: Int!, $i: UpdateUnitInput!) { updateUnit(id: $id, version: $v, input: $i) { id version basalErosionM } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const CREATE_SAMPLE = `mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }`;
const START = `mutation($i: StartAgeModelRunInput!) { startAgeModelRun(input: $i) { id status depthModel settings } }`;
const RUN = `query($id: ID!) { ageModelRun(id: $id) { id status message depthModel
  diagnostics { converged maxRhat minEss }
  events { eventHorizon { id name } medianCalBp hpd95 { olderCalBp youngerCalBp probability } }
  samples { sample { id labCode } outlierProbability medianCalBp }
  ageDepth { depthM eventFreeDepthM medianCalBp low95CalBp high95CalBp } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;
let coreId: string;
let trenchId: string;
const coreUnits: Record<string, { id: string; version: number }> = {};

/**
 * An invented core, top down: mud 0-0.10, turbidite T1 0.10-0.25 (eroded 0.02 m), mud 0.25-0.40,
 * turbidite T2 0.40-0.48, mud 0.48-0.70; foram levels at 0.05, 0.32 and 0.60 m.
 */
async function buildCore(researcher: GraphqlClient): Promise<string> {
  const { createSite } = await researcher.ok(CREATE_SITE, {
    i: { projectId: fixture.projectId, name: 'Invented fan core', kind: 'CORE', latitude: 40, longitude: -126, alongStrikeKm: 12 },
  });
  const layers = [
    ['M3', 1, 0.48, 0.7, 'HEMIPELAGIC_MUD', null],
    ['T2', 2, 0.4, 0.48, 'TURBIDITE', null],
    ['M2', 3, 0.25, 0.4, 'HEMIPELAGIC_MUD', null],
    ['T1', 4, 0.1, 0.25, 'TURBIDITE', 0.02],
    ['M1', 5, 0, 0.1, 'HEMIPELAGIC_MUD', null],
  ] as const;
  for (const [name, position, topDepthM, baseDepthM, facies, basalErosionM] of layers) {
    const { createUnit } = await researcher.ok(CREATE_UNIT, {
      i: { siteId: createSite.id, position, name, topDepthM, baseDepthM, facies, ...(basalErosionM === null ? {} : { basalErosionM }) },
    });
    coreUnits[name] = createUnit;
  }
  await researcher.ok(CREATE_HORIZON, { i: { siteId: createSite.id, name: 'T2', unitBelowId: coreUnits.M3.id, unitAboveId: coreUnits.T2.id, quality: 1 } });
  await researcher.ok(CREATE_HORIZON, { i: { siteId: createSite.id, name: 'T1', unitBelowId: coreUnits.M2.id, unitAboveId: coreUnits.T1.id, quality: 1 } });
  const levels = [
    ['M1', 0.05, 1150],
    ['M2', 0.32, 2300],
    ['M3', 0.6, 3350],
  ] as const;
  for (const [k, [unit, depthM, c14Age]] of levels.entries()) {
    await researcher.ok(CREATE_SAMPLE, {
      i: {
        siteId: createSite.id, unitId: coreUnits[unit].id, depthM, labCode: `FAN-${k}`, method: 'RADIOCARBON', material: 'PLANKTIC_FORAMS',
        ageRelation: 'DATES_DEPOSIT', c14Age, c14Error: 30, curve: 'MARINE20', deltaR: 40, deltaRError: 50,
      },
    });
  }
  return createSite.id;
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Turbidite cores');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  coreId = await buildCore(clients.RESEARCHER);
  const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
    i: { projectId: fixture.projectId, name: 'Invented trench', kind: 'TRENCH', latitude: 40, longitude: -123, alongStrikeKm: 14 },
  });
  trenchId = createSite.id;
  const below = (await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: trenchId, position: 1, name: 'Soil', topDepthM: 1, baseDepthM: 2, facies: 'SOIL' } })).createUnit;
  const above = (await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: trenchId, position: 2, name: 'Wedge', topDepthM: 0, baseDepthM: 1, facies: 'COLLUVIUM' } })).createUnit;
  await clients.RESEARCHER.ok(CREATE_HORIZON, { i: { siteId: trenchId, name: 'E1', unitBelowId: below.id, unitAboveId: above.id, quality: 1 } });
  await clients.RESEARCHER.ok(CREATE_SAMPLE, {
    i: { siteId: trenchId, unitId: below.id, depthM: 1.5, labCode: 'TR-1', method: 'RADIOCARBON', material: 'DETRITAL_CHARCOAL', ageRelation: 'DATES_DEPOSIT', c14Age: 2000, c14Error: 25, curve: 'INTCAL20' },
  });
});

afterAll(async () => {
  await server?.close();
});

describe('Unit.basalErosionM', () => {
  it('is set on create, changed and cleared on update', async () => {
    expect(coreUnits.T1.basalErosionM).toBe(0.02);
    const t2 = coreUnits.T2;
    const set = (await clients.RESEARCHER.ok(UPDATE_UNIT, { id: t2.id, v: t2.version, i: { basalErosionM: 0.01 } })).updateUnit;
    expect(set.basalErosionM).toBe(0.01);
    const cleared = (await clients.RESEARCHER.ok(UPDATE_UNIT, { id: t2.id, v: set.version, i: { basalErosionM: null } })).updateUnit;
    expect(cleared.basalErosionM).toBeNull();
    coreUnits.T2 = cleared;
  });

  it('refuses a negative thickness as BAD_USER_INPUT naming the field, changing nothing', async () => {
    const t1 = coreUnits.T1;
    const error = await clients.RESEARCHER.errorOf(UPDATE_UNIT, { id: t1.id, v: t1.version, i: { basalErosionM: -0.01 } });
    expect(error.code).toBe('BAD_USER_INPUT');
    expect(error.field).toBe('basalErosionM');
    const created = await clients.RESEARCHER.errorOf(CREATE_UNIT, {
      i: { siteId: coreId, position: 6, name: 'X', topDepthM: 0.7, baseDepthM: 0.8, facies: 'TURBIDITE', basalErosionM: -1 },
    });
    expect(created.field).toBe('basalErosionM');
  });
});

describe('startAgeModelRun depthModel', () => {
  it('refuses HEMIPELAGIC_RATE on a column without hemipelagic mud, on depthModel, saying why', async () => {
    const error = await clients.RESEARCHER.errorOf(START, { i: { siteId: trenchId, depthModel: 'HEMIPELAGIC_RATE' } });
    expect(error.code).toBe('BAD_USER_INPUT');
    expect(error.field).toBe('depthModel');
    expect(error.message).toMatch(/HEMIPELAGIC_MUD/);
  });

  it('defaults to ORDER_ONLY, whose run has no age-depth curve', async () => {
    const { startAgeModelRun } = await clients.RESEARCHER.ok(START, { i: { siteId: coreId, seed: 2, iterations: 2000 } });
    expect(startAgeModelRun.depthModel).toBe('ORDER_ONLY');
    await server.app.get(RunExecutor).execute(server.app.get(AgeModelJob), startAgeModelRun.id);
    const run = (await clients.VIEWER.ok(RUN, { id: startAgeModelRun.id })).ageModelRun;
    expect(run.status).toBe('SUCCEEDED');
    expect(run.ageDepth).toEqual([]);
  });

  it('runs HEMIPELAGIC_RATE: both events dated, the curve at every contact and every 5 cm, stored with its settings', async () => {
    const { startAgeModelRun } = await clients.RESEARCHER.ok(START, { i: { siteId: coreId, seed: 5, depthModel: 'HEMIPELAGIC_RATE', iterations: 4000 } });
    expect(startAgeModelRun.depthModel).toBe('HEMIPELAGIC_RATE');
    expect(startAgeModelRun.settings.depthModel).toBe('HEMIPELAGIC_RATE');
    await server.app.get(RunExecutor).execute(server.app.get(AgeModelJob), startAgeModelRun.id);
    const run = (await clients.VIEWER.ok(RUN, { id: startAgeModelRun.id })).ageModelRun;
    expect(run.status).toBe('SUCCEEDED');
    const byName = Object.fromEntries(run.events.map((e: { eventHorizon: { name: string }; medianCalBp: number }) => [e.eventHorizon.name, e.medianCalBp]));
    // T2 lies between the middle and the deepest level, T1 between the top and the middle one.
    expect(byName.T2).toBeGreaterThan(byName.T1);
    expect(byName.T1).toBeGreaterThan(700);
    const depths: number[] = run.ageDepth.map((p: { depthM: number }) => p.depthM);
    for (const contact of [0.1, 0.25, 0.4, 0.48]) expect(depths).toContain(contact);
    for (let k = 0; k <= 14; k++) expect(depths).toContainEqual(expect.closeTo(k * 0.05, 6));
    // Through a bed the event-free depth stands still and so does the age.
    const inBed = run.ageDepth.filter((p: { depthM: number }) => p.depthM > 0.1 && p.depthM < 0.25);
    expect(new Set(inBed.map((p: { eventFreeDepthM: number }) => p.eventFreeDepthM)).size).toBe(1);
    for (const p of run.ageDepth) expect(p.low95CalBp).toBeLessThanOrEqual(p.high95CalBp);
  });
});
