import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { storeDensity, type StoredAgeModelResults } from '../../backend/src/age-models/age-model-results';
import { normalDensity, summarise } from '../../backend/src/chronology/common/density';
import { SeededRandom } from '../../backend/src/chronology/common/random';
import type { JointAgeModelResult, JointChainDraws, JointChainSettings, JointModelInput } from '../../backend/src/chronology/joint-age-model/types';
import { JointChainJob } from '../../backend/src/correlation/joint-runs/joint-chain.job';
import { JobQueueService } from '../../backend/src/jobs/job-queue.service';
import { JobReaper } from '../../backend/src/jobs/job-reaper';
import { JobRegistry } from '../../backend/src/jobs/job-registry';
import { RunExecutor } from '../../backend/src/jobs/run-executor';
import { RunsRepository } from '../../backend/src/jobs/runs.repository';
import { RecurrenceJob } from '../../backend/src/recurrence/recurrence.job';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

/**
 * The joint age model's run plumbing and API (issue 13's contract, issue 15's staleness and
 * refresh). The computation itself is validated beside its code (chronology/joint-age-model);
 * here a small TEST DOUBLE stands in for it, so that these checks are about queueing, chains as
 * separate jobs, settling, cancelling, access, staleness and the recurrence source, and run in
 * seconds. The double's ages are known, so the API's figures can be checked against them.
 */
const DOUBLE = vi.hoisted(() => ({
  /** A chain with this seed fails, as a computation that throws would. */
  failingSeed: 13,
  /** Each regional event's age in the double: 3,000 cal BP for the oldest member order, 700 years apart. */
  ageOf: (orderFromBase: number) => 3000 - 700 * orderFromBase,
  drawsPerChain: 60,
  /** Runs with this seed use the real computation. */
  realSeed: 4242,
}));

// The double stands in for the computation except for runs seeded `DOUBLE.realSeed`, which run the
// real one (the last test), so the plumbing is also checked with the real chains' output.
vi.mock('../../backend/src/chronology/joint-age-model/joint-age-model', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../backend/src/chronology/joint-age-model/joint-age-model')>();
  return {
    ...real,
    runJointChain: ((input, settings, hooks) =>
      settings.seed === DOUBLE.realSeed ? real.runJointChain(input, settings, hooks) : testDoubleRunJointChain(input, settings, hooks)) as typeof real.runJointChain,
    summariseJointChains: ((input, chains, options) =>
      chains.every((c) => c.acceptance.testDouble === 1) ? testDoubleSummariseJointChains(input, chains, options) : real.summariseJointChains(input, chains, options)) as typeof real.summariseJointChains,
  };
});

/** TEST DOUBLE of `RunJointChain`: each regional event at a fixed age by its members' order in their columns, plus noise of sd 20 years. */
function testDoubleRunJointChain(input: JointModelInput, settings: JointChainSettings, hooks?: { onProgress?: (f: number) => void }): JointChainDraws {
  if (settings.seed === DOUBLE.failingSeed) throw new Error('test double: this seed fails');
  const rng = new SeededRandom(settings.seed * 31 + settings.chainIndex);
  const orderOf = new Map<string, number>();
  for (const site of input.sites) {
    const position = new Map(site.column.units.map((u) => [u.id, u.position]));
    const sorted = [...site.column.eventHorizons].sort((a, b) => position.get(a.unitBelowId)! - position.get(b.unitBelowId)!);
    sorted.forEach((h, k) => orderOf.set(h.id, k));
  }
  const n = DOUBLE.drawsPerChain;
  const regionalIds = input.regionalEvents.map((r) => r.regionalEventId);
  const regionalOf = new Map<string, number>();
  input.regionalEvents.forEach((r, k) => r.members.forEach((m) => regionalOf.set(m.eventHorizonId, k)));
  const siteEvents = input.sites.flatMap((s) => s.column.eventHorizons.map((h) => ({ siteId: s.siteId, eventHorizonId: h.id })));
  const samples = input.sites.flatMap((s) => s.column.samples.map((x) => ({ siteId: s.siteId, sampleId: x.id })));
  const regional = new Float64Array(n * regionalIds.length);
  for (let d = 0; d < n; d++) {
    input.regionalEvents.forEach((r, k) => {
      regional[d * regionalIds.length + k] = DOUBLE.ageOf(orderOf.get(r.members[0].eventHorizonId) ?? 0) + 20 * rng.normal();
    });
  }
  const siteEventDraws = new Float64Array(n * siteEvents.length);
  for (let d = 0; d < n; d++) siteEvents.forEach((e, k) => (siteEventDraws[d * siteEvents.length + k] = regional[d * regionalIds.length + regionalOf.get(e.eventHorizonId)!]));
  hooks?.onProgress?.(1);
  return {
    chainIndex: settings.chainIndex,
    drawCount: n,
    regionalEventIds: regionalIds,
    regionalEvents: regional,
    siteEvents,
    siteEventDraws,
    samples,
    sampleDraws: new Float64Array(n * samples.length).fill(2000),
    outlierShare: new Float64Array(samples.length).fill(0.05),
    acceptance: { testDouble: 1 },
  };
}

/** TEST DOUBLE of `SummariseJointChains`: normal densities from the pooled draws' mean and sd. */
function testDoubleSummariseJointChains(input: JointModelInput, chains: readonly JointChainDraws[], options: { maxStoredDraws: number }): JointAgeModelResult {
  const pooled = (column: number, width: number, of: (c: JointChainDraws) => Float64Array) => {
    const values: number[] = [];
    for (const c of chains) for (let d = 0; d < c.drawCount; d++) values.push(of(c)[d * width + column]);
    const mean = values.reduce((a, b) => a + b, 0) / values.length;
    const sd = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / values.length);
    const density = normalDensity(mean, Math.max(sd, 5));
    return { density, summary: summarise(density), rhat: 1.001, ess: values.length };
  };
  const first = chains[0];
  const drawCount = Math.min(options.maxStoredDraws, chains.reduce((a, c) => a + c.drawCount, 0));
  const draws = new Float64Array(drawCount * first.regionalEventIds.length);
  let row = 0;
  for (const c of chains) for (let d = 0; d < c.drawCount && row < drawCount; d++, row++) draws.set(c.regionalEvents.subarray(d * first.regionalEventIds.length, (d + 1) * first.regionalEventIds.length), row * first.regionalEventIds.length);
  return {
    regionalEvents: first.regionalEventIds.map((id, k) => ({ regionalEventId: id, ...pooled(k, first.regionalEventIds.length, (c) => c.regionalEvents) })),
    siteEvents: first.siteEvents.map((e, k) => ({ ...e, ...pooled(k, first.siteEvents.length, (c) => c.siteEventDraws) })),
    samples: first.samples.map((s, k) => {
      const p = pooled(k, first.samples.length, (c) => c.sampleDraws);
      return { ...s, ageRelation: 'DATES_DEPOSIT' as const, outlierProbability: 0.05, medianCalBp: p.summary.medianCalBp, ...p };
    }),
    diagnostics: { converged: true, maxRhat: 1.001, minEss: 120, message: 'test double', acceptance: { blockShift: 0.4, boundaries: 0.4, paths: 0.4 }, keptDrawsPerChain: first.drawCount },
    regionalEventDraws: { regionalEventIds: first.regionalEventIds, drawCount, draws },
  };
}

const CREATE_SEGMENT = `mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`;
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const UPDATE_UNIT = `mutation($id: ID!, $v: Int!, $i: UpdateUnitInput!) { updateUnit(id: $id, version: $v, input: $i) { id version } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const CREATE_SAMPLE = `mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }`;
const CREATE_HYPOTHESIS = `mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id version } }`;
const ADD_TIE = `mutation($i: AddTieInput!) { addTie(input: $i) { id } }`;
const HYPOTHESIS_TIES = `query($id: ID!) { hypothesis(id: $id) { ties { id } } }`;
const START = `mutation($i: StartJointAgeModelRunInput!) { startJointAgeModelRun(input: $i) { id status } }`;
const CANCEL = `mutation($id: ID!) { cancelJointAgeModelRun(id: $id) { id status } }`;
const RUN = `query($id: ID!) { jointAgeModelRun(id: $id) { id status progress message stale staleReasons { message inputKind }
  chains { index status progress message }
  diagnostics { converged maxRhat minEss }
  regionalEvents { members { id } medianCalBp hpd95 { olderCalBp youngerCalBp probability } }
  siteEvents { eventHorizon { id } medianCalBp hpd95 { olderCalBp youngerCalBp probability } } } }`;
const LATEST = `query($id: ID!) { hypothesis(id: $id) { latestJointRun { id status } regionalEvents { id members { id } combinedMedianCalBp jointMedianCalBp jointHpd95 { olderCalBp youngerCalBp } ageShown jointRun { id } } } }`;
const START_ANALYSIS = `mutation($i: StartRecurrenceAnalysisInput!) { startRecurrenceAnalysis(input: $i) { id } }`;
const ANALYSIS = `query($id: ID!) { recurrenceAnalysis(id: $id) { id status message source eventCount draws inputs { ageModelRuns { id } jointRun { id } hypothesisVersion } } }`;
const REFRESH = `mutation($p: ID!) { refreshStaleResults(projectId: $p) { id ageModelRuns { id } jointRuns { id } steps { stage kind staleId status freshId dependsOn } skipped { kind reason } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole, GraphqlClient>;

/** Invented sites, both in the segment, with three events each (oldest first). */
const SITES = [
  { key: 'A', name: 'Kettle Reach', alongStrikeKm: 20 },
  { key: 'B', name: 'Plover Marsh', alongStrikeKm: 70 },
] as const;
const EVENT_AGES = [3000, 2300, 1600];
const site: Record<string, { id: string; units: { id: string; version: number }[]; events: string[] }> = {};
let segmentId: string;
let hypothesisId: string;
let hypothesisName: string;

async function executeChains(runId: string, together = false): Promise<void> {
  const chains = await sql<{ id: string }>(`select id from joint_age_model_chains where run_id = $1 order by chain_index`, [runId]);
  const run = (id: string) => server.app.get(RunExecutor).execute(server.app.get(JointChainJob), id);
  if (together) await Promise.all(chains.map((c) => run(c.id)));
  else for (const c of chains) await run(c.id);
}

async function startJoint(input: Record<string, unknown>, client = clients.CORRELATOR): Promise<string> {
  return (await client.ok(START, { i: { hypothesisId, chains: 2, iterations: 500, seed: 7, ...input } })).startJointAgeModelRun.id;
}

const runOf = async (id: string) => (await clients.VIEWER.ok(RUN, { id })).jointAgeModelRun;

/** A SUCCEEDED site run of the current column in the stored format (as recurrence.spec.ts seeds one), events oldest first. */
async function writeSiteRun(siteId: string, horizonIds: string[], ages: number[]): Promise<void> {
  const drawCount = 200;
  const rng = new SeededRandom(5);
  const draws: number[] = [];
  for (let d = 0; d < drawCount; d++) for (const age of ages) draws.push(Math.round(age + 40 * rng.normal()));
  const results: StoredAgeModelResults = {
    events: horizonIds.map((eventHorizonId, i) => {
      const density = normalDensity(ages[i], 40);
      return { eventHorizonId, summary: summarise(density), rhat: 1.001, ess: 2000, density: storeDensity(density) };
    }),
    samples: [],
    eventDraws: { eventHorizonIds: horizonIds, drawCount, draws },
  };
  await sql(
    `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, results, finished_at, column_revision)
     values ($1, 'SUCCEEDED', 1, 7, '{}'::jsonb, '{}'::jsonb, 'fixture', $2::jsonb, now(), (select column_revision from sites where id = $1))`,
    [siteId, JSON.stringify(results)],
  );
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Joint age model');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  segmentId = (await clients.RESEARCHER.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'Invented South', startKm: 0, endKm: 100 } })).createSegment.id;
  for (const s of SITES) {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
      i: { projectId: fixture.projectId, name: s.name, kind: 'MARSH', latitude: -42, longitude: 173, alongStrikeKm: s.alongStrikeKm, segmentId },
    });
    const units: { id: string; version: number }[] = [];
    for (const [i, c14Age] of [2950, 2250, 1650, 900].entries()) {
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
        i: { siteId: createSite.id, position: i + 1, name: `U${i + 1}`, topDepthM: 3 - i, baseDepthM: 4 - i, facies: 'PEAT' },
      });
      units.push({ id: createUnit.id, version: 1 });
      await clients.RESEARCHER.ok(CREATE_SAMPLE, {
        i: { siteId: createSite.id, unitId: createUnit.id, depthM: 3.5 - i, labCode: `${s.key}-J${i + 1}`, method: 'RADIOCARBON', material: 'PLANT_MACROFOSSIL', ageRelation: 'DATES_DEPOSIT', c14Age, c14Error: 25, curve: 'INTCAL20' },
      });
    }
    const events: string[] = [];
    for (const i of [1, 2, 3]) {
      const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
        i: { siteId: createSite.id, name: `${s.key}-E${i}`, unitBelowId: units[i - 1].id, unitAboveId: units[i].id, quality: 1 },
      });
      events.push(createEventHorizon.id);
    }
    site[s.key] = { id: createSite.id, units, events };
    await writeSiteRun(createSite.id, events, EVENT_AGES);
  }
  hypothesisName = 'Invented one-to-one';
  hypothesisId = (await clients.CORRELATOR.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: hypothesisName } })).createHypothesis.id;
  for (const i of [0, 1, 2]) await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId, eventAId: site.A.events[i], eventBId: site.B.events[i], confidence: 1 } });
}, 120_000);

afterAll(async () => {
  await server?.close();
});

describe('starting and reading a joint run', () => {
  let runId: string;

  it('queues one job per chain for a CORRELATOR and reads back the joint posteriors once every chain has run', async () => {
    const { startJointAgeModelRun } = await clients.CORRELATOR.ok(START, { i: { hypothesisId, chains: 3, iterations: 500, seed: 7 } });
    runId = startJointAgeModelRun.id;
    expect(startJointAgeModelRun.status).toBe('QUEUED');
    const queued = await runOf(runId);
    expect(queued.chains.map((c: { index: number; status: string }) => [c.index, c.status])).toEqual([[0, 'QUEUED'], [1, 'QUEUED'], [2, 'QUEUED']]);
    expect(queued.progress).toBe(0);

    const [first] = await sql<{ id: string }>(`select id from joint_age_model_chains where run_id = $1 and chain_index = 0`, [runId]);
    await server.app.get(RunExecutor).execute(server.app.get(JointChainJob), first.id);
    const partway = await runOf(runId);
    expect(partway.status).toBe('RUNNING');
    expect(partway.progress).toBeCloseTo(1 / 3, 5);

    await executeChains(runId, true);
    const run = await runOf(runId);
    expect(run).toMatchObject({ status: 'SUCCEEDED', progress: 1, stale: false, diagnostics: { converged: true } });
    expect(run.regionalEvents).toHaveLength(3);
    for (const [k, age] of EVENT_AGES.entries()) {
      const regional = run.regionalEvents.find((r: { members: { id: string }[] }) => r.members.some((m) => m.id === site.A.events[k]));
      expect(regional.members.map((m: { id: string }) => m.id).sort()).toEqual([site.A.events[k], site.B.events[k]].sort());
      // The double puts the k-th event of each column at `age` with sd 20 years.
      expect(Math.abs(regional.medianCalBp - age)).toBeLessThan(15);
      expect(regional.hpd95[0].olderCalBp).toBeGreaterThan(age + 20);
      expect(regional.hpd95[0].youngerCalBp).toBeLessThan(age - 20);
    }
    expect(run.siteEvents.map((e: { eventHorizon: { id: string } }) => e.eventHorizon.id).sort()).toEqual([...site.A.events, ...site.B.events].sort());
  });

  it('shows the joint age beside the combined age of each regional event, and says the joint one is shown', async () => {
    const { hypothesis } = await clients.VIEWER.ok(LATEST, { id: hypothesisId });
    expect(hypothesis.latestJointRun).toEqual({ id: runId, status: 'SUCCEEDED' });
    for (const regional of hypothesis.regionalEvents) {
      expect(regional).toMatchObject({ ageShown: 'JOINT_RUN', jointRun: { id: runId } });
      expect(regional.jointMedianCalBp).not.toBeNull();
      expect(regional.combinedMedianCalBp).not.toBeNull();
      expect(regional.jointHpd95.length).toBeGreaterThan(0);
    }
  });

  it('draws a segment analysis from the joint run (source JOINT_RUN) and a site analysis from its run (SITE_RUN)', async () => {
    const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START_ANALYSIS, { i: { segmentId, hypothesisId, draws: 100, seed: 5, forecastStartYear: 2030 } });
    await server.app.get(RunExecutor).execute(server.app.get(RecurrenceJob), startRecurrenceAnalysis.id);
    const joint = (await clients.VIEWER.ok(ANALYSIS, { id: startRecurrenceAnalysis.id })).recurrenceAnalysis;
    expect(joint).toMatchObject({ status: 'SUCCEEDED', source: 'JOINT_RUN', eventCount: 3, draws: 100, inputs: { jointRun: { id: runId }, ageModelRuns: [] } });

    // The analysis' event table gives the ages it drew from: the joint run's (the double's ages), young to old.
    const download = async (path: string) =>
      (await fetch(`${server.url}${path}`, { headers: { authorization: `Bearer ${clients.VIEWER.token}` } })).json();
    const events = await download(`/api/recurrence-analyses/${startRecurrenceAnalysis.id}/events.json`);
    expect(events.inputs).toContainEqual({ field: 'ages drawn from', value: expect.stringContaining('joint age model run') });
    expect(events.rows.map((row: { medianCalBp: number }) => Math.round(row.medianCalBp / 100) * 100)).toEqual([1600, 2300, 3000]);
    const regional = await download(`/api/hypotheses/${hypothesisId}/regional-events.json`);
    for (const row of regional.rows) expect(row.ageShown).toBe('joint run');
    expect(regional.rows.map((row: { jointMedianCalBp: number }) => Math.round(row.jointMedianCalBp / 100) * 100)).toEqual([1600, 2300, 3000]);

    const site = await clients.ANALYST.ok(START_ANALYSIS, { i: { siteId: siteIdOf('A'), draws: 100, seed: 5, forecastStartYear: 2030 } });
    expect((await clients.VIEWER.ok(ANALYSIS, { id: site.startRecurrenceAnalysis.id })).recurrenceAnalysis.source).toBe('SITE_RUN');
  });

  it('marks the run stale once a member site’s column changes, and then shows and draws from the combined densities', async () => {
    const unit = site.A.units[3];
    const { updateUnit } = await clients.RESEARCHER.ok(UPDATE_UNIT, { id: unit.id, v: unit.version, i: { notes: 'roots seen on re-logging' } });
    unit.version = updateUnit.version;
    const run = await runOf(runId);
    expect(run.stale).toBe(true);
    expect(run.staleReasons).toEqual([expect.objectContaining({ inputKind: 'SITE_COLUMN', message: expect.stringContaining('Kettle Reach') })]);

    const { hypothesis } = await clients.VIEWER.ok(LATEST, { id: hypothesisId });
    for (const regional of hypothesis.regionalEvents) expect(regional).toMatchObject({ ageShown: 'COMBINED_DENSITIES', jointMedianCalBp: null, jointHpd95: [], jointRun: null });

    const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START_ANALYSIS, { i: { segmentId, hypothesisId, draws: 100, seed: 5, forecastStartYear: 2030 } });
    const combined = (await clients.VIEWER.ok(ANALYSIS, { id: startRecurrenceAnalysis.id })).recurrenceAnalysis;
    expect(combined.source).toBe('COMBINED_DENSITIES');
    expect(combined.inputs.jointRun).toBeNull();
    expect(combined.inputs.ageModelRuns).toHaveLength(2);
  });

  it('plans the stale joint run in the refresh after the site run it waits for', async () => {
    const { refreshStaleResults } = await clients.ADMIN.ok(REFRESH, { p: fixture.projectId });
    const siteStep = refreshStaleResults.steps.find((s: { kind: string }) => s.kind === 'ageModelRun');
    const jointStep = refreshStaleResults.steps.find((s: { kind: string }) => s.kind === 'jointRun');
    expect(jointStep).toMatchObject({ stage: 2, staleId: runId, status: 'WAITING' });
    expect(siteStep).toMatchObject({ stage: 1, status: 'QUEUED' });
    // Only site A's column changed, so its run is the one the joint run waits for.
    expect(jointStep.dependsOn).toHaveLength(1);
  });
});

describe('refusals and access', () => {
  it('refuses VIEWER, RESEARCHER and ANALYST (FORBIDDEN) and changes nothing', async () => {
    const [before] = await sql<{ n: string }>(`select count(*) as n from joint_age_model_runs where hypothesis_id = $1`, [hypothesisId]);
    for (const role of ['VIEWER', 'RESEARCHER', 'ANALYST'] as const) {
      expect((await clients[role].errorOf(START, { i: { hypothesisId } })).code).toBe('FORBIDDEN');
    }
    const [after] = await sql<{ n: string }>(`select count(*) as n from joint_age_model_runs where hypothesis_id = $1`, [hypothesisId]);
    expect(after.n).toBe(before.n);
  });

  it('refuses out-of-bounds chains and iterations naming the field', async () => {
    expect(await clients.CORRELATOR.errorOf(START, { i: { hypothesisId, chains: 1 } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'chains' });
    expect(await clients.CORRELATOR.errorOf(START, { i: { hypothesisId, chains: 17 } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'chains' });
    expect(await clients.CORRELATOR.errorOf(START, { i: { hypothesisId, iterations: 100 } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'iterations' });
    expect(await clients.CORRELATOR.errorOf(START, { i: { hypothesisId, iterations: 1_000_000 } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'iterations' });
  });

  it('refuses a hypothesis with an order loop, naming the hypothesis and the loop', async () => {
    const name = 'Invented crossing';
    const crossing = (await clients.CORRELATOR.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name } })).createHypothesis.id;
    // A-E1 with B-E2 and A-E2 with B-E1: each site puts the other pair in the opposite order.
    await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId: crossing, eventAId: site.A.events[0], eventBId: site.B.events[1], confidence: 1 } });
    await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId: crossing, eventAId: site.A.events[1], eventBId: site.B.events[0], confidence: 1 } });
    const tieIds: string[] = (await clients.CORRELATOR.ok(HYPOTHESIS_TIES, { id: crossing })).hypothesis.ties.map((tie: { id: string }) => tie.id);
    const { errors } = await clients.CORRELATOR.request(START, { i: { hypothesisId: crossing } });
    const [error] = errors ?? [];
    expect(error.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'hypothesisId' });
    expect(error.message).toContain(name);
    expect(error.message).toMatch(/order loop/);
    // Sites and events as a correlator reads them; no id in the words (ties, events, sites, regional events).
    expect(error.message).toContain('Kettle Reach "A-E1" is older than "A-E2", which is tied to "B-E1" at Plover Marsh');
    expect(error.message).toContain('Plover Marsh "B-E1" is older than "B-E2", which is tied to "A-E1" at Kettle Reach');
    expect(error.message).toContain('The regional events on this loop: ');
    for (const regional of ['"A-E1" at Kettle Reach + "B-E2" at Plover Marsh', '"A-E2" at Kettle Reach + "B-E1" at Plover Marsh']) expect(error.message).toContain(regional);
    expect(error.message).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i);
    // The ids are in the structured fields, one list per loop.
    const extensions = error.extensions as { regionalEventIds: string[][]; tieIds: string[][] };
    expect(extensions.regionalEventIds).toHaveLength(1);
    expect(extensions.regionalEventIds[0]).toHaveLength(2);
    expect([...extensions.tieIds[0]].sort()).toEqual([...tieIds].sort());
    const [count] = await sql<{ n: string }>(`select count(*) as n from joint_age_model_runs where hypothesis_id = $1`, [crossing]);
    expect(count.n).toBe('0');
  });

  it('hides another project’s run (NOT_FOUND) and its hypothesis from an outsider', async () => {
    const runId = await startJoint({});
    const other = await createProjectFixture('Joint outsider');
    const outsider = await new GraphqlClient(server.url).signIn(other.emails.ADMIN, PASSWORD);
    expect((await outsider.errorOf(RUN, { id: runId })).code).toBe('NOT_FOUND');
    expect((await outsider.errorOf(CANCEL, { id: runId })).code).toBe('NOT_FOUND');
    expect((await outsider.errorOf(START, { i: { hypothesisId } })).code).toBe('NOT_FOUND');
    await clients.ADMIN.ok(CANCEL, { id: runId });
  });
});

describe('cancelling and failing', () => {
  it('cancel stops every chain: none of them runs afterwards', async () => {
    const runId = await startJoint({ chains: 3 });
    const { cancelJointAgeModelRun } = await clients.CORRELATOR.ok(CANCEL, { id: runId });
    expect(cancelJointAgeModelRun.status).toBe('CANCELLED');
    await executeChains(runId);
    const run = await runOf(runId);
    expect(run.status).toBe('CANCELLED');
    expect(run.chains.map((c: { status: string }) => c.status)).toEqual(['CANCELLED', 'CANCELLED', 'CANCELLED']);
    expect(run.regionalEvents).toEqual([]);
    expect(await clients.CORRELATOR.errorOf(CANCEL, { id: runId })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'id' });
  });

  it('a failed chain fails the run with its message and stops the other chains', async () => {
    const runId = await startJoint({ seed: DOUBLE.failingSeed });
    await executeChains(runId);
    const run = await runOf(runId);
    expect(run.status).toBe('FAILED');
    expect(run.message).toContain('chain 1 of 2 failed');
    expect(run.message).toContain('test double: this seed fails');
    expect(run.chains.map((c: { status: string }) => c.status)).toEqual(['FAILED', 'CANCELLED']);
  });
});

describe('a chain whose worker died', () => {
  it('is given up by the reaper after its last attempt, which fails the run and stops its other chains', async () => {
    const runId = await startJoint({});
    const [first] = await sql<{ id: string }>(`select id from joint_age_model_chains where run_id = $1 and chain_index = 0`, [runId]);
    // As a worker that claimed the chain for its last attempt and then vanished leaves it.
    await sql(`update joint_age_model_chains set status = 'RUNNING', attempts = 2, updated_at = now() - interval '1 hour' where id = $1`, [first.id]);
    await sql(`update joint_age_model_runs set status = 'RUNNING' where id = $1`, [runId]);
    const reaper = new JobReaper(server.app.get(JobRegistry), server.app.get(RunsRepository), server.app.get(JobQueueService));
    await reaper.reapOnce();
    const run = await runOf(runId);
    expect(run.status).toBe('FAILED');
    expect(run.message).toMatch(/^chain 1 of 2 failed: the worker stopped during the run 2 times/);
    expect(run.chains.map((c: { status: string }) => c.status)).toEqual(['FAILED', 'CANCELLED']);
  });
});

describe('refresh of a joint run after a hypothesis change', () => {
  it('queues a fresh joint run at once (no site run to wait for) with the same settings and seed', async () => {
    const fresh = (await clients.CORRELATOR.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: 'Invented partial' } })).createHypothesis.id;
    await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId: fresh, eventAId: site.A.events[2], eventBId: site.B.events[2], confidence: 1 } });
    // The columns of A and B are current again once their runs are rewritten for today's revision.
    await writeSiteRun(site.A.id, site.A.events, EVENT_AGES);
    const runId = (await clients.CORRELATOR.ok(START, { i: { hypothesisId: fresh, chains: 2, iterations: 700, seed: 21 } })).startJointAgeModelRun.id;
    await executeChains(runId);
    expect((await runOf(runId)).status).toBe('SUCCEEDED');
    await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId: fresh, eventAId: site.A.events[1], eventBId: site.B.events[1], confidence: 1 } });
    expect((await runOf(runId)).staleReasons).toEqual([expect.objectContaining({ inputKind: 'HYPOTHESIS' })]);

    const { refreshStaleResults } = await clients.CORRELATOR.ok(REFRESH, { p: fixture.projectId });
    const step = refreshStaleResults.steps.find((s: { staleId: string }) => s.staleId === runId);
    expect(step).toMatchObject({ kind: 'jointRun', stage: 2, status: 'QUEUED' });
    expect(refreshStaleResults.jointRuns).toContainEqual({ id: step.freshId });
    const [row] = await sql<{ seed: number; chains: number; iterations: number }>(
      `select seed, (settings->>'chains')::int as chains, (settings->>'iterations')::int as iterations from joint_age_model_runs where id = $1`,
      [step.freshId],
    );
    expect(row).toEqual({ seed: 21, chains: 2, iterations: 700 });
  });
});

describe('with the real computation', () => {
  it('runs the one-to-one hypothesis end to end, each regional event between the calibrated ages of the dated units around it', async () => {
    const runId = await startJoint({ seed: DOUBLE.realSeed, chains: 2, iterations: 1000 });
    await executeChains(runId, true);
    const run = await runOf(runId);
    expect(run.status, run.message).toBe('SUCCEEDED');
    expect(run.regionalEvents).toHaveLength(3);
    expect(run.diagnostics.maxRhat).toBeGreaterThan(0.99);
    // Superposition (the model's definition, checked from the samples' own calibrations): event k
    // lies above unit k's dated sample and below unit k+1's, at both sites.
    const { site: a } = await clients.VIEWER.ok(`query($id: ID!) { site(id: $id) { samples { labCode calibration { medianCalBp } } } }`, { id: site.A.id });
    const calibrated = new Map(a.samples.map((x: { labCode: string; calibration: { medianCalBp: number } }) => [x.labCode, x.calibration.medianCalBp]));
    for (const k of [0, 1, 2]) {
      const regional = run.regionalEvents.find((r: { members: { id: string }[] }) => r.members.some((m) => m.id === site.A.events[k]));
      expect(regional.medianCalBp).toBeLessThan(calibrated.get(`A-J${k + 1}`) as number);
      expect(regional.medianCalBp).toBeGreaterThan(calibrated.get(`A-J${k + 2}`) as number);
    }
    const ordered = [0, 1, 2].map((k) => run.regionalEvents.find((r: { members: { id: string }[] }) => r.members.some((m) => m.id === site.A.events[k])).medianCalBp);
    expect(ordered[0]).toBeGreaterThan(ordered[1]);
    expect(ordered[1]).toBeGreaterThan(ordered[2]);
  });
});

function siteIdOf(key: string): string {
  return site[key].id;
}
