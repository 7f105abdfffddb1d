import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AgeModelJob } from '../../backend/src/age-models/age-model.job';
import { RecurrenceJob } from '../../backend/src/recurrence/recurrence.job';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SEGMENT = `mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`;
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const UPDATE_UNIT = `mutation($id: ID!, $v: Int!, $i: UpdateUnitInput!) { updateUnit(id: $id, version: $v, input: $i) { id version } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const CREATE_SAMPLE = `mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }`;
const START_RUN = `mutation($i: StartAgeModelRunInput!) { startAgeModelRun(input: $i) { id } }`;
const CREATE_HYPOTHESIS = `mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id version } }`;
const ADD_TIE = `mutation($i: AddTieInput!) { addTie(input: $i) { id } }`;
const REMOVE_TIE = `mutation($id: ID!) { removeTie(id: $id) }`;
const START_ANALYSIS = `mutation($i: StartRecurrenceAnalysisInput!) { startRecurrenceAnalysis(input: $i) { id } }`;
const RUN = `query($id: ID!) { ageModelRun(id: $id) { id status stale staleReasons { message inputKind inputId inputName via } } }`;
const ANALYSIS = `query($id: ID!) { recurrenceAnalysis(id: $id) { id status stale
  staleReasons { message inputKind inputId inputName via }
  inputs { ageModelRuns { id } jointRun { id } hypothesis { id } hypothesisVersion recorded { kind id name revision } } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;

/** Invented sites: A and B in the segment and tied event by event, C outside it with its own analysis. */
const SITES = [
  { key: 'A', name: 'Tarn Flat', alongStrikeKm: 30, inSegment: true },
  { key: 'B', name: 'Wren Core', alongStrikeKm: 80, inSegment: true },
  { key: 'C', name: 'Sedge Bank', alongStrikeKm: 400, inSegment: false },
] as const;
/** Conventional 14C ages (invented) in each of the four units, oldest unit first. */
const UNIT_AGES = [[2480, 2420], [1890, 1840], [1320, 1270], [720, 680]] as const;

const site: Record<string, { id: string; units: { id: string; version: number }[]; events: string[]; run: string }> = {};
let segmentId: string;
let hypothesisId: string;
let firstTieId: string;
const analyses = { segment: '', siteC: '' };

async function runAgeModel(siteId: string): Promise<string> {
  const { startAgeModelRun } = await clients.RESEARCHER.ok(START_RUN, { i: { siteId, iterations: 1500, seed: 11 } });
  await server.app.get(AgeModelJob).execute(startAgeModelRun.id);
  return startAgeModelRun.id;
}

async function runAnalysis(input: Record<string, unknown>): Promise<string> {
  const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START_ANALYSIS, { i: { draws: 200, seed: 5, forecastStartYear: 2030, ...input } });
  await server.app.get(RecurrenceJob).execute(startRecurrenceAnalysis.id);
  return startRecurrenceAnalysis.id;
}

const runOf = async (id: string) => (await clients.VIEWER.ok(RUN, { id })).ageModelRun;
const analysisOf = async (id: string) => (await clients.VIEWER.ok(ANALYSIS, { id })).recurrenceAnalysis;

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Provenance');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
  segmentId = (await clients.RESEARCHER.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'Invented Middle', startKm: 0, endKm: 200 } })).createSegment.id;
  for (const s of SITES) {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
      i: { projectId: fixture.projectId, name: s.name, kind: 'MARSH', latitude: -41, longitude: 174, alongStrikeKm: s.alongStrikeKm, ...(s.inSegment ? { segmentId } : {}) },
    });
    const units: { id: string; version: number }[] = [];
    for (const [i, [top, base]] of [[3, 4], [2, 3], [1, 2], [0, 1]].entries()) {
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
        i: { siteId: createSite.id, position: i + 1, name: `U${i + 1}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' },
      });
      units.push({ id: createUnit.id, version: 1 });
      for (const [k, c14Age] of UNIT_AGES[i].entries()) {
        await clients.RESEARCHER.ok(CREATE_SAMPLE, {
          i: { siteId: createSite.id, unitId: createUnit.id, depthM: base - 0.3 - 0.4 * k, labCode: `${s.key}-${i + 1}${k}`, method: 'RADIOCARBON', material: 'PLANT_MACROFOSSIL', ageRelation: 'DATES_DEPOSIT', c14Age, c14Error: 25, curve: 'INTCAL20' },
        });
      }
    }
    const events: string[] = [];
    for (const i of [1, 2, 3]) {
      const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
        i: { siteId: createSite.id, name: `${s.key}-E${i}`, unitBelowId: units[i - 1].id, unitAboveId: units[i].id, quality: 1 },
      });
      events.push(createEventHorizon.id);
    }
    site[s.key] = { id: createSite.id, units, events, run: '' };
    site[s.key].run = await runAgeModel(createSite.id);
  }
  hypothesisId = (await clients.CORRELATOR.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: 'Invented one-to-one' } })).createHypothesis.id;
  for (const i of [0, 1, 2]) {
    const { addTie } = await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId, eventAId: site.A.events[i], eventBId: site.B.events[i], confidence: 1 } });
    if (i === 0) firstTieId = addTie.id;
  }
  analyses.segment = await runAnalysis({ segmentId, hypothesisId });
  analyses.siteC = await runAnalysis({ siteId: site.C.id });
}, 120_000);

afterAll(async () => {
  await server?.close();
});

describe('provenance of recurrence analyses', () => {
  it('names the runs and hypothesis version a segment analysis used, and the run a site analysis used', async () => {
    const segment = await analysisOf(analyses.segment);
    expect(segment.status).toBe('SUCCEEDED');
    expect(segment.inputs.ageModelRuns.map((r: { id: string }) => r.id).sort()).toEqual([site.A.run, site.B.run].sort());
    expect(segment.inputs).toMatchObject({ jointRun: null, hypothesis: { id: hypothesisId }, hypothesisVersion: 4 });
    expect(segment.inputs.recorded.map((i: { name: string }) => i.name).sort()).toEqual(['Invented one-to-one', 'Tarn Flat', 'Wren Core']);
    const siteC = await analysisOf(analyses.siteC);
    expect(siteC.inputs).toMatchObject({ ageModelRuns: [{ id: site.C.run }], hypothesis: null, hypothesisVersion: null });
    for (const a of [segment, siteC]) expect(a).toMatchObject({ stale: false, staleReasons: [] });
  });
});

describe('staleness downstream', () => {
  it('marks stale exactly what a change at one site reaches: its run and the analyses that used it', async () => {
    const unit = site.A.units[3];
    const { updateUnit } = await clients.RESEARCHER.ok(UPDATE_UNIT, { id: unit.id, v: unit.version, i: { notes: 'root casts seen on re-logging' } });
    unit.version = updateUnit.version;

    const runA = await runOf(site.A.run);
    expect(runA.stale).toBe(true);
    expect(runA.staleReasons).toEqual([
      { inputKind: 'SITE_COLUMN', inputId: site.A.id, inputName: 'Tarn Flat', via: [], message: expect.stringContaining('Tarn Flat') },
    ]);
    const segment = await analysisOf(analyses.segment);
    expect(segment.stale).toBe(true);
    expect(segment.staleReasons).toEqual([
      expect.objectContaining({ inputKind: 'SITE_COLUMN', inputId: site.A.id, via: ['age model run of Tarn Flat'] }),
    ]);
    // Untouched: the other segment site's run, and the analysis outside the segment.
    expect(await runOf(site.B.run)).toMatchObject({ stale: false, staleReasons: [] });
    expect(await runOf(site.C.run)).toMatchObject({ stale: false });
    expect(await analysisOf(analyses.siteC)).toMatchObject({ stale: false, staleReasons: [] });
  });

  it('marks a segment analysis stale when its hypothesis gets a new version, saying which', async () => {
    await clients.CORRELATOR.ok(REMOVE_TIE, { id: firstTieId });
    const segment = await analysisOf(analyses.segment);
    expect(segment.staleReasons.map((r: { inputKind: string }) => r.inputKind).sort()).toEqual(['HYPOTHESIS', 'SITE_COLUMN']);
    expect(segment.staleReasons.find((r: { inputKind: string }) => r.inputKind === 'HYPOTHESIS').message).toContain('this used version 4');
    expect(await analysisOf(analyses.siteC)).toMatchObject({ stale: false });
  });

  it('hides a run and an analysis from outsiders', async () => {
    expect((await clients.OUTSIDER.errorOf(ANALYSIS, { id: analyses.segment })).code).toBe('NOT_FOUND');
    expect((await clients.OUTSIDER.errorOf(RUN, { id: site.A.run })).code).toBe('NOT_FOUND');
  });
});
