import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseRangesCalBp } from '../../backend/src/provenance/result-tables';
import { RECURRENCE_CAUTION } from '../../backend/src/recurrence/recurrence-caution';
import { AgeModelJob } from '../../backend/src/age-models/age-model.job';
import { RunExecutor } from '../../backend/src/jobs/run-executor';
import { RefreshService } from '../../backend/src/provenance/refresh.service';
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
const RUN_EVENTS = `query($id: ID!) { ageModelRun(id: $id) { seed events { eventHorizon { id name } medianCalBp hpd68 { olderCalBp youngerCalBp } hpd95 { olderCalBp youngerCalBp } } } }`;
const REGIONAL = `query($id: ID!) { hypothesis(id: $id) { version regionalEvents { members { id } combinedMedianCalBp combinedHpd95 { olderCalBp youngerCalBp } concordance } } }`;
const PROGRESS = 'progress { total waiting running succeeded failed blocked skipped fraction }';
const REFRESH = `mutation($p: ID!) { refreshStaleResults(projectId: $p) { id status ageModelRuns { id } jointRuns { id } recurrenceAnalyses { id }
  steps { id stage kind staleId label status freshId message dependsOn waitingFor } skipped { kind id label reason } ${PROGRESS} } }`;
const PLAN = `query($id: ID!) { refreshPlan(id: $id) { id status automatic ageModelRuns { id } recurrenceAnalyses { id seed stale inputs { ageModelRuns { id } hypothesisVersion } }
  steps { id stage kind staleId label status freshId message dependsOn waitingFor } ${PROGRESS} } }`;
const CANCEL_RUN = `mutation($id: ID!) { cancelAgeModelRun(id: $id) { id status } }`;
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

/** Run a queued job in the test process, as a worker would. */
async function executeRun(kind: typeof AgeModelJob | typeof RecurrenceJob, id: string): Promise<void> {
  await server.app.get(RunExecutor).execute(server.app.get(kind), id);
}

async function runAgeModel(siteId: string): Promise<string> {
  const { startAgeModelRun } = await clients.RESEARCHER.ok(START_RUN, { i: { siteId, iterations: 1500, seed: 11 } });
  await executeRun(AgeModelJob, startAgeModelRun.id);
  return startAgeModelRun.id;
}

async function runAnalysis(input: Record<string, unknown>): Promise<string> {
  const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START_ANALYSIS, { i: { draws: 200, seed: 5, forecastStartYear: 2030, ...input } });
  await executeRun(RecurrenceJob, startRecurrenceAnalysis.id);
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
  // Untied events counted too: after a tie is removed below, the segment still has three events.
  analyses.segment = await runAnalysis({ segmentId, hypothesisId, countingRule: { includeUntied: true } });
  analyses.siteC = await runAnalysis({ siteId: site.C.id });
}, 120_000);

afterAll(async () => {
  await server?.close();
});

describe('provenance of recurrence analyses', () => {
  it("names the runs each regional event's ages came from", async () => {
    const { hypothesis } = await clients.VIEWER.ok(`query($id: ID!) { hypothesis(id: $id) { regionalEvents { members { id } ageModelRuns { id site { name } } } } }`, { id: hypothesisId });
    type Regional = { members: { id: string }[]; ageModelRuns: { id: string; site: { name: string } }[] };
    const tied = (hypothesis.regionalEvents as Regional[]).filter((r) => r.members.length === 2);
    expect(tied).toHaveLength(3);
    for (const regional of tied) {
      expect(regional.ageModelRuns.map((r) => r.id).sort()).toEqual([site.A.run, site.B.run].sort());
      expect(regional.ageModelRuns.map((r) => r.site.name).sort()).toEqual(['Tarn Flat', 'Wren Core']);
    }
    // An untied event of site C stands alone, its age from C's run.
    const alone = (hypothesis.regionalEvents as Regional[]).find((r) => r.members[0].id === site.C.events[0])!;
    expect(alone.ageModelRuns.map((r) => r.id)).toEqual([site.C.run]);
  });

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

/** GET with a client's bearer token. */
async function download(client: GraphqlClient, path: string): Promise<Response> {
  return fetch(`${server.url}${path}`, { headers: client.token ? { authorization: `Bearer ${client.token}` } : {} });
}

/** A table download split into its inputs (field -> value) and its rows under the title line. */
function readTableCsv(text: string, title: string) {
  const rows = Papa.parse<string[]>(text, { skipEmptyLines: false }).data;
  const inputs = new Map<string, string>();
  const start = rows.findIndex((r) => r[0] === 'inputs');
  let i = start + 2;
  for (; rows[i] && rows[i].length === 2; i++) inputs.set(rows[i][0], rows[i][1]);
  const at = rows.findIndex((r) => r[0] === title && r.length === 1);
  const header = rows[at + 1];
  const body = rows.slice(at + 2).filter((r) => r.length === header.length);
  return { inputs, body: body.map((r) => Object.fromEntries(header.map((h, k) => [h, r[k]]))) };
}

const pairs = (ranges: { olderCalBp: number; youngerCalBp: number }[]) => ranges.map((r) => [r.olderCalBp, r.youngerCalBp]);

describe('exports', () => {
  it('round-trips a run\'s event ages through CSV and JSON, naming site, run and seed', async () => {
    const { ageModelRun } = await clients.VIEWER.ok(RUN_EVENTS, { id: site.B.run });
    const csv = await download(clients.VIEWER, `/api/age-model-runs/${site.B.run}/events.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toContain('text/csv');
    const { inputs, body } = readTableCsv(await csv.text(), 'event ages');
    expect(inputs.get('site')).toBe('Wren Core');
    expect(inputs.get('age model run id')).toBe(site.B.run);
    expect(Number(inputs.get('seed'))).toBe(ageModelRun.seed);
    expect(body).toHaveLength(3);
    for (const event of ageModelRun.events) {
      const row = body.find((r) => r['event horizon id'] === event.eventHorizon.id)!;
      expect(row.site).toBe('Wren Core');
      expect(row.event).toBe(event.eventHorizon.name);
      expect(Number(row['median (cal BP)'])).toBe(event.medianCalBp);
      expect(parseRangesCalBp(row['68.3 % range (cal BP)'])).toEqual(pairs(event.hpd68));
      expect(parseRangesCalBp(row['95.4 % range (cal BP)'])).toEqual(pairs(event.hpd95));
      // CE/BCE: 1950 - cal BP, with no year 0 (1 BCE is astronomical year 0) [common practice].
      const year = 1950 - Math.round(event.medianCalBp);
      expect(row['median (CE/BCE)']).toBe(year > 0 ? `${year} CE` : `${1 - year} BCE`);
    }
    const json = await (await download(clients.VIEWER, `/api/age-model-runs/${site.B.run}/events.json`)).json();
    expect(json.inputs).toContainEqual({ field: 'seed', value: ageModelRun.seed });
    for (const event of ageModelRun.events) {
      const row = json.rows.find((r: { eventHorizonId: string }) => r.eventHorizonId === event.eventHorizon.id);
      expect(row.medianCalBp).toBe(event.medianCalBp);
      expect(pairs(row.hpd95)).toEqual(pairs(event.hpd95));
    }
  });

  it('round-trips a hypothesis\' regional events with their checks', async () => {
    const { hypothesis } = await clients.VIEWER.ok(REGIONAL, { id: hypothesisId });
    const response = await download(clients.ANALYST, `/api/hypotheses/${hypothesisId}/regional-events.csv`);
    expect(response.status).toBe(200);
    const { inputs, body } = readTableCsv(await response.text(), 'regional events');
    expect(inputs.get('hypothesis')).toBe('Invented one-to-one');
    expect(Number(inputs.get('hypothesis version'))).toBe(hypothesis.version);
    expect(inputs.get('age model run of Wren Core')).toContain(site.B.run);
    expect(body).toHaveLength(hypothesis.regionalEvents.length);
    for (const [i, event] of hypothesis.regionalEvents.entries()) {
      const row = body[i];
      expect(row['member event horizon ids'].split(' ').sort()).toEqual(event.members.map((m: { id: string }) => m.id).sort());
      if (event.combinedMedianCalBp === null) continue;
      expect(Number(row['median (cal BP)'])).toBe(event.combinedMedianCalBp);
      expect(parseRangesCalBp(row['95.4 % range (cal BP)'])).toEqual(pairs(event.combinedHpd95));
      expect(row['age concordance'] === '' ? null : Number(row['age concordance'])).toBe(event.concordance);
    }
    expect(body.some((r) => r['members (site: event)'].includes('Tarn Flat: A-E'))).toBe(true);
  });

  it('gives an analysis\' event table with its caution, inputs and seed', async () => {
    const response = await download(clients.VIEWER, `/api/recurrence-analyses/${analyses.segment}/events.csv`);
    const text = await response.text();
    expect(text.startsWith(RECURRENCE_CAUTION)).toBe(true);
    const { inputs, body } = readTableCsv(text, 'analysis events');
    expect(Number(inputs.get('seed'))).toBe(5);
    expect(inputs.get('hypothesis')).toContain('Invented one-to-one version 4');
    expect(body.length).toBeGreaterThanOrEqual(3);
    const medians = body.map((r) => Number(r['median (cal BP)']));
    expect(medians).toEqual([...medians].sort((a, b) => a - b));
  });

  it('answers 404 to outsiders and 401 without a token, for every table', async () => {
    for (const path of [
      `/api/age-model-runs/${site.A.run}/events.csv`,
      `/api/hypotheses/${hypothesisId}/regional-events.csv`,
      `/api/recurrence-analyses/${analyses.segment}/events.json`,
    ]) {
      expect((await download(clients.OUTSIDER, path)).status).toBe(404);
      expect((await download(new GraphqlClient(server.url), path)).status).toBe(401);
    }
    expect((await download(clients.VIEWER, '/api/age-model-runs/not-a-uuid/events.csv')).status).toBe(404);
  });

  it('downloads a release as one bundle: frozen data, pinned analyses with their event tables and the runs they used', async () => {
    const { createRelease } = await clients.ADMIN.ok(`mutation($i: CreateReleaseInput!) { createRelease(input: $i) { id number } }`, {
      i: { projectId: fixture.projectId, note: 'Invented data set for the provenance spec' },
    });
    const pinned = await runAnalysis({ siteId: site.C.id, releaseId: createRelease.id });
    const response = await download(clients.VIEWER, `/api/releases/${createRelease.id}/bundle.json`);
    expect(response.status).toBe(200);
    const bundle = await response.json();
    expect(bundle.release).toMatchObject({ id: createRelease.id, number: createRelease.number });
    expect(bundle.data.sites.map((s: { name: string }) => s.name).sort()).toEqual(['Sedge Bank', 'Tarn Flat', 'Wren Core']);
    expect(bundle.recurrenceAnalyses).toHaveLength(1);
    expect(bundle.recurrenceAnalyses[0].results.analysis.id).toBe(pinned);
    expect(bundle.recurrenceAnalyses[0].events.inputs).toContainEqual({ field: 'seed', value: 5 });
    expect(bundle.ageModelRuns.map((t: { inputs: { field: string; value: unknown }[] }) => t.inputs.find((i) => i.field === 'age model run id')?.value)).toEqual([site.C.run]);

    // Every table also as CSV naming its inputs and seed; its numbers read back equal the JSON's.
    type CsvFile = { name: string; table: string; content: string };
    const csvFiles = bundle.csvFiles as CsvFile[];
    expect(csvFiles.map((f) => f.table).sort()).toEqual(['analysis events', 'analysis results', 'event ages']);
    for (const file of csvFiles) expect(file.content, file.name).toMatch(/\r\nseed,5\r\n|\r\nseed,11\r\n/);
    const runCsv = Papa.parse<string[]>(csvFiles.find((f) => f.table === 'event ages')!.content.trim()).data;
    const header = runCsv.findIndex((row) => row[0] === 'site' && row[1] === 'event');
    const csvRows = runCsv.slice(header + 1).map((row) => Object.fromEntries(runCsv[header].map((title, i) => [title, row[i]])));
    const jsonRows = bundle.ageModelRuns[0].rows as { event: string; medianCalBp: number; hpd95: { olderCalBp: number; youngerCalBp: number }[] }[];
    expect(csvRows.map((r) => r.event)).toEqual(jsonRows.map((r) => r.event));
    csvRows.forEach((row, i) => {
      expect(Number(row['median (cal BP)'])).toBe(jsonRows[i].medianCalBp);
      expect(parseRangesCalBp(row['95.4 % range (cal BP)'])).toEqual(jsonRows[i].hpd95.map((r) => [r.olderCalBp, r.youngerCalBp]));
    });

    // A figure per table, drawn from its rows: the medians it marks are the table's.
    type Figure = { name: string; table: string; mediaType: string; svg: string };
    const figures = bundle.figures as Figure[];
    expect(figures.map((f) => f.table).sort()).toEqual(['analysis events', 'event ages']);
    const medians = (svg: string) => [...svg.matchAll(/data-median-cal-bp="([-\d.]+)"/g)].map((m) => Number(m[1]));
    const runFigure = figures.find((f) => f.table === 'event ages')!;
    expect(runFigure).toMatchObject({ mediaType: 'image/svg+xml', name: expect.stringMatching(/^age-model-run-sedge-bank-[0-9a-f]{8}\.svg$/) });
    expect(runFigure.svg).toContain('Age (cal BP');
    expect(medians(runFigure.svg)).toEqual(jsonRows.map((r) => r.medianCalBp));
    const analysisRows = bundle.recurrenceAnalyses[0].events.rows as { medianCalBp: number }[];
    expect(medians(figures.find((f) => f.table === 'analysis events')!.svg)).toEqual(analysisRows.map((r) => r.medianCalBp));
    expect((await download(clients.OUTSIDER, `/api/releases/${createRelease.id}/bundle.json`)).status).toBe(404);
  });
});

describe('refreshStaleResults', () => {
  type Step = { id: string; stage: number; kind: string; staleId: string; label: string; status: string; freshId: string | null; message: string | null; dependsOn: string[] };
  const planOf = async (id: string) => (await clients.VIEWER.ok(PLAN, { id })).refreshPlan;

  it('is refused to viewers and hidden from outsiders', async () => {
    expect((await clients.VIEWER.errorOf(REFRESH, { p: fixture.projectId })).code).toBe('FORBIDDEN');
    expect((await clients.OUTSIDER.errorOf(REFRESH, { p: fixture.projectId })).code).toBe('NOT_FOUND');
  });

  it('queues nothing an analyst or correlator may not start, and says what it skipped and why', async () => {
    const { refreshStaleResults: analyst } = await clients.ANALYST.ok(REFRESH, { p: fixture.projectId });
    expect(analyst).toMatchObject({ status: 'FINISHED', steps: [], ageModelRuns: [], recurrenceAnalyses: [] });
    expect(analyst.skipped).toEqual(expect.arrayContaining([
      expect.objectContaining({ kind: 'ageModelRun', id: site.A.run, label: 'age model of Tarn Flat', reason: expect.stringContaining('cannot run age models') }),
      expect.objectContaining({ kind: 'recurrenceAnalysis', id: analyses.segment, reason: expect.stringContaining('not refreshed by you') }),
    ]));
    const { refreshStaleResults: correlator } = await clients.CORRELATOR.ok(REFRESH, { p: fixture.projectId });
    expect(correlator.steps).toEqual([]);
    expect(correlator.skipped.map((s: { id: string }) => s.id).sort()).toEqual([site.A.run, analyses.segment].sort());
  });

  it('re-runs exactly the stale results in dependency order, with their seeds; a failure stops only what depends on it', async () => {
    // Site C changes too: now runs A and C, the segment analysis (A, B) and the site analysis of C are stale; B and its run are not.
    const unitC = site.C.units[0];
    await clients.RESEARCHER.ok(UPDATE_UNIT, { id: unitC.id, v: unitC.version, i: { notes: 'base re-measured' } });
    unitC.version += 1;
    const { refreshStaleResults: plan } = await clients.ADMIN.ok(REFRESH, { p: fixture.projectId });
    const steps = plan.steps as Step[];
    expect(steps.map((s) => `${s.kind}:${s.staleId}`).sort()).toEqual(
      [`ageModelRun:${site.A.run}`, `ageModelRun:${site.C.run}`, `recurrenceAnalysis:${analyses.segment}`, `recurrenceAnalysis:${analyses.siteC}`].sort(),
    );
    const step = (staleId: string) => steps.find((s) => s.staleId === staleId)!;
    expect(step(site.A.run)).toMatchObject({ stage: 1, status: 'QUEUED' });
    expect(step(site.C.run)).toMatchObject({ stage: 1, status: 'QUEUED' });
    expect(step(analyses.segment)).toMatchObject({ stage: 3, status: 'WAITING', freshId: null, dependsOn: [step(site.A.run).id] });
    expect(step(analyses.siteC)).toMatchObject({ stage: 3, status: 'WAITING', dependsOn: [step(site.C.run).id] });
    expect(plan.ageModelRuns.map((r: { id: string }) => r.id).sort()).toEqual([step(site.A.run).freshId, step(site.C.run).freshId].sort());
    expect(plan.recurrenceAnalyses).toEqual([]);
    expect(plan.skipped).toEqual([]);
    // The whole plan is in the answer: what is queued now, and what waits for which run.
    expect(step(analyses.segment).waitingFor).toEqual(['age model of Tarn Flat']);
    expect(step(analyses.siteC).waitingFor).toEqual(['age model of Sedge Bank']);
    expect(step(site.A.run).waitingFor).toEqual([]);
    expect(plan.progress).toEqual({ total: 4, waiting: 2, running: 2, succeeded: 0, failed: 0, blocked: 0, skipped: 0, fraction: 0 });

    // The fresh run of C is cancelled (a failure); the fresh run of A succeeds.
    await clients.RESEARCHER.ok(CANCEL_RUN, { id: step(site.C.run).freshId });
    await executeRun(AgeModelJob, step(site.A.run).freshId!);
    let now = await planOf(plan.id);
    const nowStep = (staleId: string) => (now.steps as Step[]).find((s) => s.staleId === staleId)!;
    expect(nowStep(site.A.run).status).toBe('SUCCEEDED');
    expect(nowStep(site.C.run).status).toBe('FAILED');
    expect(nowStep(analyses.siteC)).toMatchObject({ status: 'BLOCKED', message: 'not started: age model of Sedge Bank failed' });
    expect(nowStep(analyses.segment).status).toBe('QUEUED');
    expect(nowStep(analyses.segment).waitingFor).toEqual([]);
    expect(now.status).toBe('ACTIVE');
    expect(now.progress).toEqual({ total: 4, waiting: 0, running: 1, succeeded: 1, failed: 1, blocked: 1, skipped: 0, fraction: 0.75 });

    await executeRun(RecurrenceJob, nowStep(analyses.segment).freshId!);
    now = await planOf(plan.id);
    expect(nowStep(analyses.segment).status).toBe('SUCCEEDED');
    expect(now.status).toBe('FINISHED');
    expect(now.progress.fraction).toBe(1);
    const [fresh] = now.recurrenceAnalyses;
    expect(fresh.id).toBe(nowStep(analyses.segment).freshId);
    expect(fresh).toMatchObject({ seed: 5, stale: false, inputs: { hypothesisVersion: 5 } });
    // ... and its counting rule (untied events in): the one setting the default would change.
    const { recurrenceAnalysis: counted } = await clients.VIEWER.ok(`query($id: ID!) { recurrenceAnalysis(id: $id) { eventTable { rule { includeUntied } } } }`, { id: fresh.id });
    expect(counted.eventTable.rule.includeUntied).toBe(true);
    expect(fresh.inputs.ageModelRuns.map((r: { id: string }) => r.id).sort()).toEqual([nowStep(site.A.run).freshId, site.B.run].sort());
    // The fresh run kept the stale run's seed and settings.
    const { ageModelRun } = await clients.VIEWER.ok(`query($id: ID!) { ageModelRun(id: $id) { seed settings stale } }`, { id: nowStep(site.A.run).freshId });
    expect(ageModelRun).toMatchObject({ seed: 11, stale: false, settings: expect.objectContaining({ iterations: 1500 }) });
  });

  it('lets a researcher refresh the site run that is still stale, skipping the analysis it may not start', async () => {
    const { refreshStaleResults: plan } = await clients.RESEARCHER.ok(REFRESH, { p: fixture.projectId });
    expect((plan.steps as Step[]).map((s) => s.staleId)).toEqual([site.C.run]);
    expect(plan.skipped).toEqual([expect.objectContaining({ kind: 'recurrenceAnalysis', id: analyses.siteC, reason: expect.stringContaining('cannot run recurrence analyses') })]);
  });
});

describe('automatic refresh', () => {
  const SETTINGS = `mutation($i: SetRefreshSettingsInput!) { setRefreshSettings(input: $i) { automatic debounceSeconds } }`;
  const PLANS = `query($p: ID!) { project(id: $p) { refreshPlans { id automatic createdAt steps { label } } } }`;

  it('waits for the debounce after a change, and replicas ticking together start one refresh', async () => {
    const { setRefreshSettings } = await clients.ADMIN.ok(SETTINGS, { i: { projectId: fixture.projectId, automatic: true, debounceSeconds: 30 } });
    expect(setRefreshSettings).toEqual({ automatic: true, debounceSeconds: 30 });
    // The researcher's refresh above is still running its site run: finish it (an active refresh holds the automatic one back).
    const [active] = (await clients.VIEWER.ok(PLANS, { p: fixture.projectId })).project.refreshPlans;
    const activePlan = await clients.VIEWER.ok(PLAN, { id: active.id });
    for (const step of activePlan.refreshPlan.steps as { kind: string; status: string; freshId: string | null }[]) {
      if (step.kind === 'ageModelRun' && step.status === 'QUEUED') await executeRun(AgeModelJob, step.freshId!);
    }
    expect((await clients.VIEWER.ok(PLAN, { id: active.id })).refreshPlan.status).toBe('FINISHED');
    const plansBefore = (await clients.VIEWER.ok(PLANS, { p: fixture.projectId })).project.refreshPlans.length;
    const unit = site.A.units[1];
    await clients.RESEARCHER.ok(UPDATE_UNIT, { id: unit.id, v: unit.version, i: { notes: 'contact re-logged' } });
    unit.version += 1;
    const changedAt = Date.now();
    const refresh = server.app.get(RefreshService);
    // 10 s after the change: still inside the 30 s debounce, nothing starts.
    await refresh.refreshAutomatically(new Date(changedAt + 10_000));
    expect((await clients.VIEWER.ok(PLANS, { p: fixture.projectId })).project.refreshPlans).toHaveLength(plansBefore);
    // 31 s after: three replicas tick at once; the project's lock in PostgreSQL lets one start.
    const later = new Date(changedAt + 31_000);
    await Promise.all([refresh.refreshAutomatically(later), refresh.refreshAutomatically(later), refresh.refreshAutomatically(later)]);
    const plans = (await clients.VIEWER.ok(PLANS, { p: fixture.projectId })).project.refreshPlans;
    expect(plans).toHaveLength(plansBefore + 1);
    expect(plans[0].automatic).toBe(true);
    expect(plans[0].steps.map((s: { label: string }) => s.label)).toContain('age model of Tarn Flat');
    // Once started, another tick does not start a second one for the same change.
    await refresh.refreshAutomatically(new Date(changedAt + 60_000));
    expect((await clients.VIEWER.ok(PLANS, { p: fixture.projectId })).project.refreshPlans).toHaveLength(plansBefore + 1);
    await clients.ADMIN.ok(SETTINGS, { i: { projectId: fixture.projectId, automatic: false } });
  });
});

describe('audit trail names', () => {
  it('names the changed object and every id in its before/after images, ids kept', async () => {
    const { auditTrail } = await clients.VIEWER.ok(
      `query($i: AuditTrailInput!) { auditTrail(input: $i) { edges { node { objectId objectName before after referencedNames { id name } } } } }`,
      { i: { projectId: fixture.projectId, objectType: 'unit', objectId: site.A.units[3].id, first: 5 } },
    );
    const update = auditTrail.edges.map((e: { node: Record<string, unknown> }) => e.node).find((n: { before: unknown }) => n.before !== null);
    expect(update.objectId).toBe(site.A.units[3].id);
    expect(update.objectName).toBe('U4');
    expect(update.before).not.toEqual(update.after);
    expect(update.referencedNames).toEqual(expect.arrayContaining([{ id: site.A.id, name: 'Tarn Flat' }, { id: site.A.units[3].id, name: 'Tarn Flat: U4' }]));
  });
});
