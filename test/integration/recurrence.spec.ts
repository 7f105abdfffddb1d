import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { storeDensity, type StoredAgeModelResults } from '../../backend/src/age-models/age-model-results';
import { normalDensity, summarise } from '../../backend/src/chronology/common/density';
import { SeededRandom } from '../../backend/src/chronology/common/random';
import { RECURRENCE_CAUTION } from '../../backend/src/recurrence/recurrence-caution';
import { JobQueueService } from '../../backend/src/jobs/job-queue.service';
import { JobReaper } from '../../backend/src/jobs/job-reaper';
import { JobRegistry } from '../../backend/src/jobs/job-registry';
import { RunExecutor } from '../../backend/src/jobs/run-executor';
import { RunsRepository } from '../../backend/src/jobs/runs.repository';
import { RecurrenceJob } from '../../backend/src/recurrence/recurrence.job';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SEGMENT = `mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`;
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const PROBABILITY = `query($i: RenewalProbabilityInput!) { renewalProbability(input: $i) { conditionalProbability poissonProbability hazardRatePerYear } }`;
const FIT = `query($i: FitRenewalInput!) { fitRenewal(input: $i) { model meanRecurrenceYears aperiodicity logLikelihood aic } }`;
const START = `mutation($i: StartRecurrenceAnalysisInput!) { startRecurrenceAnalysis(input: $i) { id status seed forecastStartYear windowsYears draws caution } }`;
const CANCEL = `mutation($id: ID!) { cancelRecurrenceAnalysis(id: $id) { id status } }`;
const ANALYSIS = `query($id: ID!) { recurrenceAnalysis(id: $id) { id status progress message seed draws settings
  project { id } segment { id } site { id } hypothesis { id } hypothesisVersion
  eventCount lastEventMedianCalBp openInterval { median low95 high95 }
  intervals { index medianYears low95 high95 }
  meanRecurrence { median low95 high95 } medianRecurrence { median low95 high95 } sdRecurrence { median low95 high95 }
  aperiodicity { median low95 high95 } poisson { windowYears median low95 high95 }
  models { model aic aicc akaikeWeight meanRecurrenceYears aperiodicity logLikelihood deltaAic deltaAicc
    meanRecurrenceRange { median low95 high95 datingOnlyLow95 datingOnlyHigh95 }
    probabilities { windowYears median low95 high95 datingOnlyLow95 datingOnlyHigh95 } }
  modelAveraged { windowYears median low95 high95 datingOnlyLow95 datingOnlyHigh95 } parameterNote
  modelComparisonNote histogram { fromYears toYears count } caution } }`;
const FORECAST = `query($i: RenewalForecastInput!) { renewalForecast(input: $i) {
  meanRecurrence { median low95 high95 } aperiodicity { median low95 high95 }
  probabilities { windowYears median low95 high95 } approximateDraws priorNote caution } }`;
const CURVES = `query($id: ID!) { recurrenceAnalysis(id: $id) { curves { model density { years value } hazard { years value } survival { years value } } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;
let segmentId: string;
const siteIds: Record<string, string> = {};
const runIds: Record<string, string> = {};

/** Invented sites: A and B lie in the segment, C outside it. Each has three events, E1 oldest. */
const SITES = [
  { key: 'A', name: 'Tarn Flat', alongStrikeKm: 30, inSegment: true, ages: [1600, 1000, 450] },
  { key: 'B', name: 'Wren Core', alongStrikeKm: 80, inSegment: true, ages: [1610, 990, 460] },
  { key: 'C', name: 'Sedge Bank', alongStrikeKm: 400, inSegment: false, ages: [1300, 800, 300] },
] as const;
const events: Record<string, string> = {};

/** A SUCCEEDED run in the stored results format, with ordered joint draws of its events (oldest first). */
async function writeSucceededRun(siteId: string, horizonIds: string[], ages: readonly number[], drawCount: number): Promise<string> {
  const sd = 30;
  const rng = new SeededRandom(99);
  const draws: number[] = [];
  for (let d = 0; d < drawCount; d++) for (const age of ages) draws.push(Math.round((age + sd * rng.normal()) * 10) / 10);
  const results: StoredAgeModelResults = {
    events: horizonIds.map((eventHorizonId, i) => {
      const density = normalDensity(ages[i], sd);
      return { eventHorizonId, summary: summarise(density), rhat: 1.001, ess: 2000, density: storeDensity(density) };
    }),
    samples: [],
    eventDraws: { eventHorizonIds: horizonIds, drawCount, draws },
  };
  const [row] = await sql<{ id: string }>(
    `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, results, finished_at)
     values ($1, 'SUCCEEDED', 1, 7, '{}'::jsonb, '{}'::jsonb, 'fixture', $2::jsonb, now()) returning id`,
    [siteId, JSON.stringify(results)],
  );
  return row.id;
}

async function runAnalysis(input: Record<string, unknown>, client = clients.ANALYST) {
  const { startRecurrenceAnalysis } = await client.ok(START, { i: input });
  await server.app.get(RunExecutor).execute(server.app.get(RecurrenceJob), startRecurrenceAnalysis.id);
  return (await client.ok(ANALYSIS, { id: startRecurrenceAnalysis.id })).recurrenceAnalysis;
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Recurrence');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
  const { createSegment } = await clients.RESEARCHER.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'Invented South', startKm: 0, endKm: 200 } });
  segmentId = createSegment.id;

  for (const site of SITES) {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
      i: {
        projectId: fixture.projectId, name: site.name, kind: 'MARSH', latitude: -40, longitude: 175, alongStrikeKm: site.alongStrikeKm,
        ...(site.inSegment ? { segmentId } : {}),
      },
    });
    siteIds[site.key] = createSite.id;
    const units: string[] = [];
    for (const [position, top, base] of [[1, 3, 4], [2, 2, 3], [3, 1, 2], [4, 0, 1]]) {
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
        i: { siteId: createSite.id, position, name: `U${position}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' },
      });
      units.push(createUnit.id);
    }
    const horizons: string[] = [];
    for (const index of [1, 2, 3]) {
      const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
        i: { siteId: createSite.id, name: `E${index}`, unitBelowId: units[index - 1], unitAboveId: units[index], quality: 1 },
      });
      events[`${site.key}${index}`] = createEventHorizon.id;
      horizons.push(createEventHorizon.id);
    }
    runIds[site.key] = await writeSucceededRun(createSite.id, horizons, site.ages, 2000);
  }

  // A preferred hypothesis tying A and B event by event, at version 2, written as the correlation feature stores it.
  const [hypothesis] = await sql<{ id: string }>(
    `insert into hypotheses (project_id, name, preferred, version) values ($1, 'Invented one-to-one', true, 2) returning id`,
    [fixture.projectId],
  );
  for (const index of [1, 2, 3]) {
    await sql(`insert into ties (hypothesis_id, event_a_id, event_b_id, confidence) values ($1, $2, $3, 1)`, [
      hypothesis.id, events[`A${index}`], events[`B${index}`],
    ]);
  }
});

afterAll(async () => {
  await server?.close();
});

describe('renewalProbability', () => {
  it('gives the Poisson figure 1 - exp(-30/300) = 0.0951626 [analytic, CHECKS.md] and the rate 1/mu', async () => {
    const { renewalProbability } = await clients.VIEWER.ok(PROBABILITY, {
      i: { model: 'POISSON', meanRecurrenceYears: 300, aperiodicity: 0, elapsedYears: 120, windowYears: 30 },
    });
    expect(renewalProbability.conditionalProbability).toBeCloseTo(0.0951626, 7);
    expect(renewalProbability.poissonProbability).toBeCloseTo(0.0951626, 7);
    expect(renewalProbability.hazardRatePerYear).toBeCloseTo(1 / 300, 12);
  });

  it('gives a BPT hazard near 1/(2 alpha^2 mu) far past the mean (Matthews et al. 2002)', async () => {
    const { renewalProbability } = await clients.VIEWER.ok(PROBABILITY, {
      i: { model: 'BPT', meanRecurrenceYears: 100, aperiodicity: 0.5, elapsedYears: 5000, windowYears: 30 },
    });
    expect(renewalProbability.hazardRatePerYear).toBeCloseTo(1 / (2 * 0.25 * 100), 3);
    expect(renewalProbability.conditionalProbability).toBeGreaterThan(0);
  });

  it('refuses a non-positive aperiodicity for a renewal model', async () => {
    const error = await clients.VIEWER.errorOf(PROBABILITY, {
      i: { model: 'LOGNORMAL', meanRecurrenceYears: 300, aperiodicity: 0, elapsedYears: 10, windowYears: 30 },
    });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'aperiodicity' });
  });
});

describe('fitRenewal', () => {
  it('refuses a single interval', async () => {
    const error = await clients.VIEWER.errorOf(FIT, { i: { model: 'BPT', intervalsYears: [500] } });
    expect(error.code).toBe('BAD_USER_INPUT');
  });

  it('fits the exponential with the open interval: mu = (400 + 600 + 200) / 2 = 600 [analytic, CHECKS.md]', async () => {
    const { fitRenewal } = await clients.VIEWER.ok(FIT, { i: { model: 'POISSON', intervalsYears: [400, 600], openIntervalYears: 200 } });
    expect(fitRenewal.meanRecurrenceYears).toBeCloseTo(600, 6);
    // ln L = -n ln mu - (sum + t_e) / mu = -2 ln 600 - 2; AIC = 2k - 2 ln L with k = 1 [analytic].
    expect(fitRenewal.logLikelihood).toBeCloseTo(-2 * Math.log(600) - 2, 6);
    expect(fitRenewal.aic).toBeCloseTo(2 + 2 * (2 * Math.log(600) + 2), 6);
    expect(fitRenewal.aperiodicity).toBe(1);
  });
});

describe('renewalForecast', () => {
  const record = { intervalsYears: [420, 610, 380, 550, 490, 600], openIntervalYears: 300, windowsYears: [30, 50, 100], seed: 2 };

  it('gives posterior ranges of the BPT parameters and window probabilities [reference library: scipy grid quadrature, see posterior.spec.ts]', async () => {
    const { renewalForecast } = await clients.VIEWER.ok(FORECAST, { i: { model: 'BPT', ...record } });
    // SciPy quadrature of the censored posterior: mean recurrence 426.6-508.9-638.5, 50-year probability median 0.035, 97.5 % 0.171.
    expect(renewalForecast.meanRecurrence.low95).toBeGreaterThan(426.6 * 0.96);
    expect(renewalForecast.meanRecurrence.high95).toBeLessThan(638.5 * 1.04);
    expect(renewalForecast.probabilities[1]).toMatchObject({ windowYears: 50 });
    expect(renewalForecast.probabilities[1].median).toBeCloseTo(0.035, 1);
    expect(renewalForecast.probabilities[1].high95).toBeCloseTo(0.171, 1);
    expect(renewalForecast.aperiodicity.low95).toBeLessThan(renewalForecast.aperiodicity.high95);
    expect(renewalForecast.caution).toBe(RECURRENCE_CAUTION);
    expect(renewalForecast.priorNote).toMatch(/Jeffreys/);
  });

  it('answers every model, Poisson with aperiodicity 1', async () => {
    for (const model of ['POISSON', 'LOGNORMAL', 'WEIBULL']) {
      const { renewalForecast } = await clients.VIEWER.ok(FORECAST, { i: { model, ...record } });
      expect(renewalForecast.probabilities).toHaveLength(3);
      if (model === 'POISSON') expect(renewalForecast.aperiodicity.median).toBe(1);
    }
  });

  it('refuses fewer than two intervals, and inputs past its bounds, naming the field', async () => {
    expect(await clients.VIEWER.errorOf(FORECAST, { i: { model: 'BPT', ...record, intervalsYears: [500] } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'intervalsYears' });
    expect(await clients.VIEWER.errorOf(FORECAST, { i: { model: 'BPT', ...record, windowsYears: Array(11).fill(50) } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'windowsYears' });
    expect(await clients.VIEWER.errorOf(FORECAST, { i: { model: 'BPT', ...record, intervalsYears: Array(1001).fill(500) } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'intervalsYears' });
    expect(await clients.VIEWER.errorOf(FORECAST, { i: { model: 'BPT', ...record, openIntervalYears: -1 } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'openIntervalYears' });
  });
});

describe('startRecurrenceAnalysis', () => {
  it('lets analysts and admins start; other roles are FORBIDDEN and outsiders NOT_FOUND', async () => {
    const input = { i: { siteId: siteIds.A, draws: 200, seed: 1 } };
    for (const role of ['ANALYST', 'ADMIN'] as const) {
      const { startRecurrenceAnalysis } = await clients[role].ok(START, input);
      expect(startRecurrenceAnalysis.status).toBe('QUEUED');
    }
    for (const role of ['VIEWER', 'RESEARCHER', 'CORRELATOR'] as const) {
      expect((await clients[role].errorOf(START, input)).code).toBe('FORBIDDEN');
    }
    expect((await clients.OUTSIDER.errorOf(START, input)).code).toBe('NOT_FOUND');
    expect((await clients.OUTSIDER.errorOf(START, { i: { segmentId } })).code).toBe('NOT_FOUND');
  });

  it('refuses neither a segment nor a site, both at once, and too many draws', async () => {
    expect(await clients.ANALYST.errorOf(START, { i: {} })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'segmentId' });
    expect((await clients.ANALYST.errorOf(START, { i: { segmentId, siteId: siteIds.A } })).code).toBe('BAD_USER_INPUT');
    expect(await clients.ANALYST.errorOf(START, { i: { siteId: siteIds.A, draws: 20_001 } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'draws' });
  });

  it('refuses a forecast that starts before the last event', async () => {
    const error = await clients.ANALYST.errorOf(START, { i: { siteId: siteIds.A, forecastStartYear: 1500 } });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'forecastStartYear' });
  });

  it('fills the defaults: this year, windows 30/50/100, 2000 draws and a seed', async () => {
    const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START, { i: { siteId: siteIds.A } });
    expect(startRecurrenceAnalysis).toMatchObject({ forecastStartYear: new Date().getUTCFullYear(), windowsYears: [30, 50, 100], draws: 2000, caution: RECURRENCE_CAUTION });
    expect(Number.isInteger(startRecurrenceAnalysis.seed)).toBe(true);
    await clients.ANALYST.ok(CANCEL, { id: startRecurrenceAnalysis.id });
  });
});

describe('a site analysis', () => {
  const input = { siteId: '', forecastStartYear: 2025, windowsYears: [30, 50, 100], draws: 1500, seed: 42 };
  let analysis: Record<string, any>;

  beforeAll(async () => {
    analysis = await runAnalysis({ ...input, siteId: siteIds.A });
  });

  it('succeeds on the site age model draws, citing the run', async () => {
    expect(analysis.status).toBe('SUCCEEDED');
    expect(analysis.progress).toBe(1);
    expect(analysis).toMatchObject({ site: { id: siteIds.A }, segment: null, hypothesis: null, project: { id: fixture.projectId }, eventCount: 3, draws: 1500 });
    expect(analysis.settings.ageModelRunIds).toEqual([runIds.A]);
    const [row] = await sql<{ input_snapshot: { ageModelRunId: string } }>('select input_snapshot from recurrence_analyses where id = $1', [analysis.id]);
    expect(row.input_snapshot.ageModelRunId).toBe(runIds.A);
  });

  it('reports intervals from the youngest, 1000 - 450 and 1600 - 1000 [analytic, fixture]', () => {
    expect(analysis.intervals.map((i: { index: number }) => i.index)).toEqual([0, 1]);
    expect(analysis.intervals[0].medianYears).toBeCloseTo(550, -1);
    expect(analysis.intervals[1].medianYears).toBeCloseTo(600, -1);
    expect(analysis.meanRecurrence.median).toBeCloseTo(575, -1);
    expect(analysis.lastEventMedianCalBp).toBeCloseTo(450, -1);
    expect(analysis.openInterval.median).toBeCloseTo(450 + 75, -1);
  });

  it('gives probabilities in [0, 1], rising with the window, with ordered Monte Carlo ranges', () => {
    for (const rows of [analysis.poisson, ...analysis.models.map((m: { probabilities: unknown }) => m.probabilities)]) {
      expect(rows).toHaveLength(3);
      for (const row of rows) {
        expect(row.low95).toBeGreaterThanOrEqual(0);
        expect(row.high95).toBeLessThanOrEqual(1);
        expect(row.low95).toBeLessThanOrEqual(row.median);
        expect(row.median).toBeLessThanOrEqual(row.high95);
      }
      expect(rows[0].median).toBeLessThan(rows[1].median);
      expect(rows[1].median).toBeLessThan(rows[2].median);
    }
    for (const range of [analysis.meanRecurrence, analysis.medianRecurrence, analysis.sdRecurrence, analysis.aperiodicity, analysis.openInterval, ...analysis.intervals.map((i: { low95: number; medianYears: number; high95: number }) => ({ low95: i.low95, median: i.medianYears, high95: i.high95 }))]) {
      expect(range.low95).toBeLessThanOrEqual(range.median);
      expect(range.median).toBeLessThanOrEqual(range.high95);
    }
    expect(analysis.models.map((m: { model: string }) => m.model)).toEqual(['POISSON', 'BPT', 'LOGNORMAL', 'WEIBULL']);
    expect(analysis.models.reduce((sum: number, m: { akaikeWeight: number }) => sum + m.akaikeWeight, 0)).toBeCloseTo(1, 9);
    expect(analysis.modelComparisonNote).toMatch(/AIC/);
    expect(analysis.histogram.reduce((sum: number, bin: { count: number }) => sum + bin.count, 0)).toBe(2 * 1500);
    expect(analysis.caution).toBe(RECURRENCE_CAUTION);
  });

  it('heads each model with ranges that carry parameter uncertainty, the dating-only range beside, AICc and a model-averaged row', () => {
    for (const model of analysis.models) {
      // With two closed intervals, AICc exists only for the 1-parameter Poisson (n = 3 with the open interval).
      if (model.model === 'POISSON') expect(model.aicc).toBeCloseTo(model.aic + 2 * 1 * 2 / (3 - 1 - 1), 9);
      else expect(model.aicc).toBeNull();
      for (const row of model.probabilities) {
        expect(row.datingOnlyLow95).toBeLessThanOrEqual(row.datingOnlyHigh95);
        // Poisson's posterior is exact Gamma; its range must be wider than plugging in the fit.
        // (The two-parameter plug-in fits of two intervals swing wildly; the prior's aperiodicity limit tames them.)
        if (model.model === 'POISSON') expect(row.high95 - row.low95).toBeGreaterThan(row.datingOnlyHigh95 - row.datingOnlyLow95);
      }
      expect(model.meanRecurrenceRange.high95 - model.meanRecurrenceRange.low95).toBeGreaterThan(
        model.meanRecurrenceRange.datingOnlyHigh95 - model.meanRecurrenceRange.datingOnlyLow95,
      );
    }
    expect(analysis.modelAveraged.map((row: { windowYears: number }) => row.windowYears)).toEqual([30, 50, 100]);
    expect(analysis.parameterNote).toMatch(/posterior/);
  });

  it('serves a density, hazard and survival curve per model', async () => {
    const { recurrenceAnalysis } = await clients.VIEWER.ok(CURVES, { id: analysis.id });
    expect(recurrenceAnalysis.curves).toHaveLength(4);
    for (const curve of recurrenceAnalysis.curves) {
      expect(curve.survival.length).toBeGreaterThan(100);
      expect(curve.hazard.length).toBeGreaterThan(100);
      expect(curve.survival[0].value).toBeGreaterThan(curve.survival[curve.survival.length - 1].value);
    }
  });

  it('gives the same result for the same seed', async () => {
    const again = await runAnalysis({ ...input, siteId: siteIds.A });
    const figures = (a: Record<string, unknown>) => ({ intervals: a.intervals, mean: a.meanRecurrence, models: a.models, poisson: a.poisson });
    expect(again.id).not.toBe(analysis.id);
    expect(figures(again)).toEqual(figures(analysis));
  });

  it('is listed on the project', async () => {
    const { project } = await clients.VIEWER.ok(`query($id: ID!) { project(id: $id) { recurrenceAnalyses { id status } } }`, { id: fixture.projectId });
    expect(project.recurrenceAnalyses.map((a: { id: string }) => a.id)).toContain(analysis.id);
  });

  it('exports CSV starting with the caution and JSON carrying it, to readers only', async () => {
    const headers = { authorization: `Bearer ${clients.VIEWER.token}` };
    const csv = await fetch(`${server.url}/api/recurrence-analyses/${analysis.id}/export.csv`, { headers });
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/);
    const text = await csv.text();
    expect(text.startsWith(RECURRENCE_CAUTION)).toBe(true);
    for (const table of ['intervals', 'statistics', 'models', 'probabilities']) expect(text).toContain(`\r\n${table}\r\n`);

    const json = await fetch(`${server.url}/api/recurrence-analyses/${analysis.id}/export.json`, { headers });
    expect(json.status).toBe(200);
    const body = await json.json();
    expect(body.caution).toBe(RECURRENCE_CAUTION);
    expect(body.analysis).toMatchObject({ id: analysis.id, seed: 42, ageModelRunIds: [runIds.A] });
    expect(body.probabilities).toHaveLength((4 + 1 + 1) * 3); // four models, the model-averaged row, the plain Poisson figure

    const outsider = await fetch(`${server.url}/api/recurrence-analyses/${analysis.id}/export.csv`, { headers: { authorization: `Bearer ${clients.OUTSIDER.token}` } });
    expect(outsider.status).toBe(404);
    const anonymous = await fetch(`${server.url}/api/recurrence-analyses/${analysis.id}/export.json`);
    expect(anonymous.status).toBe(401);
  });
});

describe('a site analysis on draws that put two events in one year', () => {
  it('succeeds, spreading the tied events within their year (issue 12 item 6)', async () => {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
      i: { projectId: fixture.projectId, name: 'Tied Hollow', kind: 'TRENCH', latitude: -40, longitude: 175, alongStrikeKm: 500 },
    });
    const units: string[] = [];
    for (const position of [1, 2, 3, 4]) {
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: createSite.id, position, name: `T${position}`, topDepthM: 4 - position, baseDepthM: 5 - position, facies: 'PEAT' } });
      units.push(createUnit.id);
    }
    const horizons: string[] = [];
    for (const index of [1, 2, 3]) {
      const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
        i: { siteId: createSite.id, name: `T${index}`, unitBelowId: units[index - 1], unitAboveId: units[index], quality: 1 },
      });
      horizons.push(createEventHorizon.id);
    }
    // Grid-year draws, oldest first; in every other draw the two older events share year 1000.
    const draws: number[] = [];
    for (let d = 0; d < 400; d++) draws.push(d % 2 === 0 ? 1000 : 1001 + (d % 7), 1000, 450 + (d % 11));
    const results = {
      events: horizons.map((eventHorizonId, i) => ({ eventHorizonId, summary: summarise(normalDensity([1000, 1000, 450][i], 5)), rhat: 1, ess: 400, density: storeDensity(normalDensity([1000, 1000, 450][i], 5)) })),
      samples: [],
      eventDraws: { eventHorizonIds: horizons, drawCount: 400, draws },
    };
    await sql(
      `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, results, finished_at)
       values ($1, 'SUCCEEDED', 1, 7, '{}'::jsonb, '{}'::jsonb, 'fixture', $2::jsonb, now())`,
      [createSite.id, JSON.stringify(results)],
    );
    const analysis = await runAnalysis({ siteId: createSite.id, forecastStartYear: 2025, windowsYears: [50], draws: 400, seed: 5 });
    expect(analysis.message).toBe('400 draws of 3 events');
    expect(analysis.status).toBe('SUCCEEDED');
    expect(analysis.intervals[1].low95).toBeGreaterThan(0);
    expect(analysis.intervals[1].low95).toBeLessThan(1);
  });
});

describe('a segment analysis', () => {
  it('uses the preferred hypothesis: regional events of the segment sites, with the hypothesis version and runs cited', async () => {
    const analysis = await runAnalysis({ segmentId, forecastStartYear: 2025, draws: 1000, seed: 7 });
    expect(analysis.status).toBe('SUCCEEDED');
    expect(analysis).toMatchObject({ segment: { id: segmentId }, site: null, hypothesisVersion: 2, eventCount: 3 });
    expect(analysis.hypothesis.id).toBeTruthy();
    expect([...analysis.settings.ageModelRunIds].sort()).toEqual([runIds.A, runIds.B].sort());
    // Combined densities of N(450,30) x N(460,30) etc. centre on 455, 995, 1605 [analytic]: intervals near 540 and 610.
    expect(analysis.intervals[0].medianYears).toBeCloseTo(540, -1);
    expect(analysis.intervals[1].medianYears).toBeCloseTo(610, -1);
    expect(analysis.lastEventMedianCalBp).toBeCloseTo(455, -1);
  });

  it('refuses a hypothesis of another project as NOT_FOUND', async () => {
    const other = await createProjectFixture('Recurrence other');
    const [hypothesis] = await sql<{ id: string }>(`insert into hypotheses (project_id, name) values ($1, 'Elsewhere') returning id`, [other.projectId]);
    expect((await clients.ANALYST.errorOf(START, { i: { segmentId, hypothesisId: hypothesis.id } })).code).toBe('NOT_FOUND');
  });
});

describe('pinning to a release', () => {
  it('cites a release while the data are as released, and refuses once they changed', async () => {
    const { createRelease } = await clients.ADMIN.ok(`mutation($i: CreateReleaseInput!) { createRelease(input: $i) { id number } }`, {
      i: { projectId: fixture.projectId, note: 'frozen for the recurrence pin test' },
    });
    const pinned = await clients.ANALYST.ok<{ startRecurrenceAnalysis: { id: string } }>(START, {
      i: { siteId: siteIds.A, draws: 200, seed: 3, releaseId: createRelease.id },
    });
    const [row] = await sql<{ release_id: string }>('select release_id from recurrence_analyses where id = $1', [pinned.startRecurrenceAnalysis.id]);
    expect(row.release_id).toBe(createRelease.id);
    await clients.ADMIN.ok(`mutation($id: ID!, $v: Int!) { updateSite(id: $id, version: $v, input: { notes: "changed after the release" }) { id } }`, {
      id: siteIds.A,
      v: (await sql<{ version: number }>('select version from sites where id = $1', [siteIds.A]))[0].version,
    });
    const refused = await clients.ANALYST.errorOf(START, { i: { siteId: siteIds.A, draws: 200, seed: 3, releaseId: createRelease.id } });
    expect(refused).toMatchObject({ code: 'BAD_USER_INPUT', field: 'releaseId' });
    expect(refused.message).toMatch(new RegExp(`changed since release ${createRelease.number}`));
  });
});

describe('cancelRecurrenceAnalysis', () => {
  it('cancels a queued analysis, which the worker then skips, and refuses cancelling it twice', async () => {
    const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START, { i: { siteId: siteIds.A, draws: 200 } });
    expect((await clients.VIEWER.errorOf(CANCEL, { id: startRecurrenceAnalysis.id })).code).toBe('FORBIDDEN');
    const { cancelRecurrenceAnalysis } = await clients.ANALYST.ok(CANCEL, { id: startRecurrenceAnalysis.id });
    expect(cancelRecurrenceAnalysis.status).toBe('CANCELLED');
    await server.app.get(RunExecutor).execute(server.app.get(RecurrenceJob), startRecurrenceAnalysis.id);
    const { recurrenceAnalysis } = await clients.ANALYST.ok(ANALYSIS, { id: startRecurrenceAnalysis.id });
    expect(recurrenceAnalysis).toMatchObject({ status: 'CANCELLED', intervals: [], models: [], meanRecurrence: null });
    expect((await clients.ANALYST.errorOf(CANCEL, { id: startRecurrenceAnalysis.id })).code).toBe('BAD_USER_INPUT');
  });
});

describe('the job reaper', () => {
  it('queues again a recurrence analysis whose worker went silent, and gives it up after two attempts', async () => {
    const reaper = new JobReaper(server.app.get(JobRegistry), server.app.get(RunsRepository), server.app.get(JobQueueService));
    const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START, { i: { siteId: siteIds.A, draws: 200 } });
    const id = startRecurrenceAnalysis.id;
    const silence = (attempts: number) =>
      sql(`update recurrence_analyses set status = 'RUNNING', attempts = $2, updated_at = now() - interval '1 minute' where id = $1`, [id, attempts]);
    const status = async () => (await sql<{ status: string }>('select status from recurrence_analyses where id = $1', [id]))[0].status;

    await silence(1);
    await reaper.reapOnce();
    expect(await status()).toBe('QUEUED');
    await silence(2);
    await reaper.reapOnce();
    expect(await status()).toBe('FAILED');
  });
});
