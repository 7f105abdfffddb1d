import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { storeDensity, type StoredAgeModelResults } from '../../backend/src/age-models/age-model-results';
import { AgeModelJob } from '../../backend/src/age-models/age-model.job';
import { normalDensity, summarise } from '../../backend/src/chronology/common/density';
import { SeededRandom } from '../../backend/src/chronology/common/random';
import { RunExecutor } from '../../backend/src/jobs/run-executor';
import { RecurrenceJob } from '../../backend/src/recurrence/recurrence.job';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

/**
 * Which age model run of a site feeds the ladder, regional events, site recurrence and the refresh:
 * the newest successful run, or the one a researcher chose (chooseDownstreamRun). The runs here are
 * written with known event ages, so what each screen reads is checked against those ages, not
 * against the code's own output.
 */

const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id version } }`;
const UPDATE_UNIT = `mutation($id: ID!, $v: Int!, $i: UpdateUnitInput!) { updateUnit(id: $id, version: $v, input: $i) { id version } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const CREATE_SAMPLE = `mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }`;
const CHOOSE = `mutation($i: ChooseDownstreamRunInput!) { chooseDownstreamRun(input: $i) { id downstreamRun { id usedDownstream } downstreamRunChoice { run { id } } } }`;
const SITE = `query($id: ID!) { site(id: $id) { id downstreamRun { id } ageModelRuns { id usedDownstream }
  downstreamRunChoice { run { id } newestRun { id } newerRunExists chosenBy { displayName } chosenAt site { id } } } }`;
const LADDER = `query($p: ID!) { eventLadder(projectId: $p) { columns { site { id } latestAgeModelRun { id } events { eventHorizon { id } medianCalBp } } } }`;
const REGIONAL = `query($id: ID!) { hypothesis(id: $id) { regionalEvents { members { id } combinedMedianCalBp ageModelRuns { id } } } }`;
const START_ANALYSIS = `mutation($i: StartRecurrenceAnalysisInput!) { startRecurrenceAnalysis(input: $i) { id } }`;
const ANALYSIS = `query($id: ID!) { recurrenceAnalysis(id: $id) { id status stale lastEventMedianCalBp
  staleReasons { message inputKind inputId inputName via } inputs { ageModelRuns { id } } } }`;
const CHOICES = `query($p: ID!) { project(id: $p) { downstreamRunChoices { site { id } run { id } newestRun { id } newerRunExists } } }`;
const REFRESH = `mutation($p: ID!) { refreshStaleResults(projectId: $p) { id steps { id stage kind staleId status freshId } } }`;
const PLAN = `query($id: ID!) { refreshPlan(id: $id) { id status steps { id stage kind staleId status freshId } } }`;

let server: TestServer;
let fixture: ProjectFixture;
let other: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;

/** Invented ages (cal BP) of the three events, oldest first, in each run written below. */
const AGES = {
  olderA: [1800, 1150, 520],
  newerA: [1700, 1050, 420],
  b: [1790, 1140, 510],
} as const;
/** Conventional 14C ages (invented) in each of Kelp Terrace's four units, oldest first: its column can be re-run for real. */
const UNIT_AGES = [[1930, 1900], [1320, 1290], [760, 730], [380, 350]] as const;

const A = { id: '', units: [] as { id: string; version: number }[], events: [] as string[], older: '', newer: '', failed: '', running: '' };
const B = { id: '', events: [] as string[], run: '' };
let hypothesisId: string;
let otherProjectRun: string;

/**
 * A run of a site in the stored results format, normal event densities (sd 30 years) at `ages` with
 * joint draws, at the site's current column revision (so it is not stale), settings a refresh can
 * re-run cheaply, queued `hoursAgo` hours ago.
 */
async function writeRun(siteId: string, horizonIds: string[], ages: readonly number[], hoursAgo: number, status = 'SUCCEEDED'): Promise<string> {
  const drawCount = 1000;
  const rng = new SeededRandom(23);
  const draws: number[] = [];
  for (let d = 0; d < drawCount; d++) for (const age of ages) draws.push(Math.round((age + 30 * rng.normal()) * 10) / 10);
  const results: StoredAgeModelResults = {
    events: horizonIds.map((eventHorizonId, i) => {
      const density = normalDensity(ages[i], 30);
      return { eventHorizonId, summary: summarise(density), rhat: 1.001, ess: 2000, density: storeDensity(density) };
    }),
    samples: [],
    eventDraws: { eventHorizonIds: horizonIds, drawCount, draws },
  };
  const [row] = await sql<{ id: string }>(
    `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, column_revision, results, created_at, finished_at)
     values ($1, $2, 1, 17, '{"iterations": 500, "chains": 4}'::jsonb, '{}'::jsonb, 'fixture', (select column_revision from sites where id = $1),
       $3::jsonb, now() - $4::float8 * interval '1 hour', case when $5::boolean then now() end) returning id`,
    [siteId, status, status === 'SUCCEEDED' ? JSON.stringify(results) : null, hoursAgo, status !== 'RUNNING'],
  );
  return row.id;
}

/** The median a run written by `writeRun` gives an event of age `age` (its density's own summary). */
const medianOf = (age: number) => summarise(normalDensity(age, 30)).medianCalBp;

async function siteAnalysis(): Promise<string> {
  const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START_ANALYSIS, { i: { siteId: A.id, draws: 200, seed: 3, forecastStartYear: 2030 } });
  await server.app.get(RunExecutor).execute(server.app.get(RecurrenceJob), startRecurrenceAnalysis.id);
  return startRecurrenceAnalysis.id;
}

const analysisOf = async (id: string) => (await clients.VIEWER.ok(ANALYSIS, { id })).recurrenceAnalysis;
const siteOf = async (id: string) => (await clients.VIEWER.ok(SITE, { id })).site;
const revision = async () => Number((await sql<{ revision: string }>(`select revision from project_revisions where project_id = $1`, [fixture.projectId]))[0].revision);
const choiceAudits = async () => Number((await sql<{ n: string }>(`select count(*) as n from audit_records where object_type = 'downstreamRunChoice' and project_id = $1`, [fixture.projectId]))[0].n);

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Downstream run');
  other = await createProjectFixture('Downstream run, other project');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);

  for (const [target, name, km] of [[A, 'Kelp Terrace', 20], [B, 'Ngaio Swamp', 60]] as const) {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, { i: { projectId: fixture.projectId, name, kind: 'MARSH', latitude: -41, longitude: 174, alongStrikeKm: km } });
    target.id = createSite.id;
    const units: { id: string; version: number }[] = [];
    for (const [i, [top, base]] of [[3, 4], [2, 3], [1, 2], [0, 1]].entries()) {
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: createSite.id, position: i + 1, name: `U${i + 1}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' } });
      units.push(createUnit);
      if (target !== A) continue;
      for (const [k, c14Age] of UNIT_AGES[i].entries()) {
        await clients.RESEARCHER.ok(CREATE_SAMPLE, {
          i: { siteId: createSite.id, unitId: createUnit.id, depthM: base - 0.3 - 0.4 * k, labCode: `KT-${i + 1}${k}`, method: 'RADIOCARBON', material: 'PLANT_MACROFOSSIL', ageRelation: 'DATES_DEPOSIT', c14Age, c14Error: 25, curve: 'INTCAL20' },
        });
      }
    }
    for (const i of [1, 2, 3]) {
      const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, { i: { siteId: createSite.id, name: `E${i}`, unitBelowId: units[i - 1].id, unitAboveId: units[i].id, quality: 1 } });
      target.events.push(createEventHorizon.id);
    }
    if (target === A) A.units = units;
  }
  A.older = await writeRun(A.id, A.events, AGES.olderA, 3);
  A.failed = await writeRun(A.id, A.events, AGES.olderA, 2.5, 'FAILED');
  A.newer = await writeRun(A.id, A.events, AGES.newerA, 2);
  A.running = await writeRun(A.id, A.events, AGES.newerA, 1, 'RUNNING');
  B.run = await writeRun(B.id, B.events, AGES.b, 2);

  const [hypothesis] = await sql<{ id: string }>(`insert into hypotheses (project_id, name, version) values ($1, 'Invented pairs', 1) returning id`, [fixture.projectId]);
  hypothesisId = hypothesis.id;
  for (const i of [0, 1, 2]) await sql(`insert into ties (hypothesis_id, event_a_id, event_b_id, confidence) values ($1, $2, $3, 1)`, [hypothesisId, A.events[i], B.events[i]]);

  const [otherSite] = await sql<{ id: string }>(
    `insert into sites (project_id, name, kind, latitude, longitude, along_strike_km) values ($1, 'Elsewhere Bog', 'MARSH', -41, 174, 5) returning id`,
    [other.projectId],
  );
  otherProjectRun = await writeRun(otherSite.id, [], [], 1);
}, 120_000);

afterAll(async () => {
  await server?.close();
});

describe('chooseDownstreamRun', () => {
  let followingNewest: string;
  let regionalBefore: { members: { id: string }[]; combinedMedianCalBp: number }[];

  it('follows the newest successful run until a run is chosen', async () => {
    const site = await siteOf(A.id);
    expect(site.downstreamRun.id).toBe(A.newer);
    expect(site.downstreamRunChoice).toBeNull();
    expect(site.ageModelRuns.filter((r: { usedDownstream: boolean }) => r.usedDownstream).map((r: { id: string }) => r.id)).toEqual([A.newer]);
    followingNewest = await siteAnalysis();
    const analysis = await analysisOf(followingNewest);
    expect(analysis).toMatchObject({ status: 'SUCCEEDED', stale: false, inputs: { ageModelRuns: [{ id: A.newer }] } });
    expect(Math.abs(analysis.lastEventMedianCalBp - AGES.newerA[2])).toBeLessThan(10);
    regionalBefore = (await clients.VIEWER.ok(REGIONAL, { id: hypothesisId })).hypothesis.regionalEvents;
  });

  it('is refused to roles that may not run age models, and hidden from outsiders', async () => {
    const input = { i: { siteId: A.id, runId: A.older } };
    for (const role of ['VIEWER', 'CORRELATOR', 'ANALYST'] as const) expect((await clients[role].errorOf(CHOOSE, input)).code).toBe('FORBIDDEN');
    expect((await clients.OUTSIDER.errorOf(CHOOSE, input)).code).toBe('NOT_FOUND');
    expect((await siteOf(A.id)).downstreamRunChoice).toBeNull();
  });

  it('lets a researcher choose an older run: the ladder, regional events and site recurrence read its ages, and the ladder cache revision moves', async () => {
    const before = await revision();
    const { chooseDownstreamRun } = await clients.RESEARCHER.ok(CHOOSE, { i: { siteId: A.id, runId: A.older } });
    expect(chooseDownstreamRun).toMatchObject({ id: A.id, downstreamRun: { id: A.older, usedDownstream: true }, downstreamRunChoice: { run: { id: A.older } } });
    expect(await revision()).toBeGreaterThan(before);

    const site = await siteOf(A.id);
    expect(site.downstreamRunChoice).toMatchObject({ run: { id: A.older }, newestRun: { id: A.newer }, newerRunExists: true, site: { id: A.id } });
    expect(site.downstreamRunChoice.chosenBy.displayName).toMatch(/^RESEARCHER /);
    expect(site.ageModelRuns.filter((r: { usedDownstream: boolean }) => r.usedDownstream).map((r: { id: string }) => r.id)).toEqual([A.older]);

    const { eventLadder } = await clients.VIEWER.ok(LADDER, { p: fixture.projectId });
    const column = eventLadder.columns.find((c: { site: { id: string } }) => c.site.id === A.id);
    expect(column.latestAgeModelRun.id).toBe(A.older);
    for (const [i, id] of A.events.entries()) {
      expect(column.events.find((e: { eventHorizon: { id: string } }) => e.eventHorizon.id === id).medianCalBp).toBe(medianOf(AGES.olderA[i]));
    }

    const regional = (await clients.VIEWER.ok(REGIONAL, { id: hypothesisId })).hypothesis.regionalEvents as { members: { id: string }[]; combinedMedianCalBp: number; ageModelRuns: { id: string }[] }[];
    expect(regional).toHaveLength(3);
    for (const event of regional) {
      expect(event.ageModelRuns.map((r) => r.id).sort()).toEqual([A.older, B.run].sort());
      // The older run puts each of Kelp Terrace's events 100 years older: every combined age moves older.
      const was = regionalBefore.find((r) => r.members[0].id === event.members[0].id)!;
      expect(event.combinedMedianCalBp).toBeGreaterThan(was.combinedMedianCalBp);
    }

    const onChosen = await analysisOf(await siteAnalysis());
    expect(onChosen).toMatchObject({ stale: false, inputs: { ageModelRuns: [{ id: A.older }] } });
    expect(Math.abs(onChosen.lastEventMedianCalBp - AGES.olderA[2])).toBeLessThan(10);
  });

  it('marks stale what used the run fed downstream before, saying why', async () => {
    const analysis = await analysisOf(followingNewest);
    expect(analysis.stale).toBe(true);
    expect(analysis.staleReasons).toEqual([
      { inputKind: 'AGE_MODEL_RUN', inputId: A.newer, inputName: 'Kelp Terrace', via: [], message: expect.stringContaining('chosen by a researcher') },
    ]);
    // The runs themselves are not stale: their column did not change.
    expect((await clients.VIEWER.ok(`query($id: ID!) { ageModelRun(id: $id) { stale } }`, { id: A.newer })).ageModelRun.stale).toBe(false);
  });

  it('refuses a run that is not a successful run of the site, naming runId, and changes nothing', async () => {
    const before = { revision: await revision(), audits: await choiceAudits() };
    const cases = [
      [B.run, 'not an age model run of site Kelp Terrace'],
      [otherProjectRun, 'not an age model run of site Kelp Terrace'],
      ['00000000-0000-4000-8000-000000000000', 'not an age model run of site Kelp Terrace'],
      [A.failed, 'this run is failed'],
      [A.running, 'this run is'],
    ] as const;
    for (const [runId, message] of cases) {
      const error = await clients.RESEARCHER.errorOf(CHOOSE, { i: { siteId: A.id, runId } });
      expect(error, runId).toMatchObject({ code: 'BAD_USER_INPUT', field: 'runId' });
      expect(error.message).toContain(message);
      expect(error.message).not.toMatch(/select|insert|update /i);
    }
    expect((await siteOf(A.id)).downstreamRunChoice.run.id).toBe(A.older);
    expect(await revision()).toBe(before.revision);
    expect(await choiceAudits()).toBe(before.audits);
  });

  it('lists the choice for the refresh screen while a newer run exists', async () => {
    const { project } = await clients.VIEWER.ok(CHOICES, { p: fixture.projectId });
    expect(project.downstreamRunChoices).toEqual([{ site: { id: A.id }, run: { id: A.older }, newestRun: { id: A.newer }, newerRunExists: true }]);
    const { project: elsewhere } = await clients.RESEARCHER.request(CHOICES, { p: other.projectId }).then((r) => ({ project: r.data?.project ?? null }));
    expect(elsewhere).toBeNull();
  });

  it('goes back to the newest run when the choice is cleared: what used it is up to date again', async () => {
    const before = await revision();
    const { chooseDownstreamRun } = await clients.ADMIN.ok(CHOOSE, { i: { siteId: A.id, runId: null } });
    expect(chooseDownstreamRun).toMatchObject({ downstreamRun: { id: A.newer }, downstreamRunChoice: null });
    expect(await revision()).toBeGreaterThan(before);
    const { eventLadder } = await clients.VIEWER.ok(LADDER, { p: fixture.projectId });
    const column = eventLadder.columns.find((c: { site: { id: string } }) => c.site.id === A.id);
    expect(column.latestAgeModelRun.id).toBe(A.newer);
    expect(column.events.find((e: { eventHorizon: { id: string } }) => e.eventHorizon.id === A.events[2]).medianCalBp).toBe(medianOf(AGES.newerA[2]));
    expect(await analysisOf(followingNewest)).toMatchObject({ stale: false, staleReasons: [] });
    const regional = (await clients.VIEWER.ok(REGIONAL, { id: hypothesisId })).hypothesis.regionalEvents as { members: { id: string }[]; combinedMedianCalBp: number }[];
    for (const event of regional) expect(event.combinedMedianCalBp).toBe(regionalBefore.find((r) => r.members[0].id === event.members[0].id)!.combinedMedianCalBp);
    // Clearing again changes nothing and records nothing.
    const audits = await choiceAudits();
    await clients.ADMIN.ok(CHOOSE, { i: { siteId: A.id } });
    expect(await choiceAudits()).toBe(audits);
  });
});

describe('the refresh and a chosen run', () => {
  it('re-runs the chosen run when its column changed, and the choice moves to the fresh run', async () => {
    await clients.RESEARCHER.ok(CHOOSE, { i: { siteId: A.id, runId: A.older } });
    const onChosen = await siteAnalysis();
    const unit = A.units[3];
    await clients.RESEARCHER.ok(UPDATE_UNIT, { id: unit.id, v: unit.version, i: { notes: 'contact re-logged' } });

    const { refreshStaleResults: plan } = await clients.ADMIN.ok(REFRESH, { p: fixture.projectId });
    const siteStep = plan.steps.find((s: { kind: string }) => s.kind === 'ageModelRun');
    // The chosen run is the one re-run (with its settings and seed), not the newer one.
    expect(siteStep).toMatchObject({ stage: 1, staleId: A.older, status: 'QUEUED' });
    expect(plan.steps.find((s: { kind: string; staleId: string }) => s.kind === 'recurrenceAnalysis' && s.staleId === onChosen)).toMatchObject({ stage: 3, status: 'WAITING' });

    await server.app.get(RunExecutor).execute(server.app.get(AgeModelJob), siteStep.freshId);
    const { refreshPlan } = await clients.VIEWER.ok(PLAN, { id: plan.id });
    expect(refreshPlan.steps.find((s: { id: string }) => s.id === siteStep.id).status).toBe('SUCCEEDED');
    const site = await siteOf(A.id);
    expect(site.downstreamRun.id).toBe(siteStep.freshId);
    expect(site.downstreamRunChoice).toMatchObject({ run: { id: siteStep.freshId }, newestRun: { id: siteStep.freshId }, newerRunExists: false });
    // The analysis waiting for it starts on the fresh chosen run.
    const analysisStep = refreshPlan.steps.find((s: { staleId: string }) => s.staleId === onChosen);
    expect(analysisStep.status).toBe('QUEUED');
    await server.app.get(RunExecutor).execute(server.app.get(RecurrenceJob), analysisStep.freshId);
    expect(await analysisOf(analysisStep.freshId)).toMatchObject({ status: 'SUCCEEDED', stale: false, inputs: { ageModelRuns: [{ id: siteStep.freshId }] } });
  });
});
