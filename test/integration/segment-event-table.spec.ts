/**
 * Which events count in a segment's record (issue 14, item 4) and two hypotheses side by side
 * (item 6), through the API: the event table, the counting rule, the stored table and the
 * comparison exports. Invented scenario: a segment 0-200 km with three sites.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { storeDensity, type StoredAgeModelResults } from '../../backend/src/age-models/age-model-results';
import { normalDensity, summarise } from '../../backend/src/chronology/common/density';
import { SeededRandom } from '../../backend/src/chronology/common/random';
import { RECURRENCE_CAUTION } from '../../backend/src/recurrence/recurrence-caution';
import { RunExecutor } from '../../backend/src/jobs/run-executor';
import { RecurrenceJob } from '../../backend/src/recurrence/recurrence.job';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SEGMENT = `mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`;
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const TABLE_FIELDS = `segmentName hypothesisId hypothesisName hypothesisVersion
  rule { minimumSpanShare includeUntied qualityWeights confidenceWeights }
  rows { regionalEventId label segmentNames spanShare throughGoing untied tieConfidences qualities medianCalBp counted inclusionProbability reason
    members { eventHorizonId eventName siteName alongStrikeKm segmentName quality } }
  countedEvents expectedEvents weighted note`;
const TABLE = `query($i: SegmentEventTableInput!) { segmentEventTable(input: $i) { ${TABLE_FIELDS} } }`;
const START = `mutation($i: StartRecurrenceAnalysisInput!) { startRecurrenceAnalysis(input: $i) { id } }`;
const ANALYSIS = `query($id: ID!) { recurrenceAnalysis(id: $id) { id status message eventCount
  meanRecurrence { median low95 high95 } recordEvents { median low95 high95 }
  intervals { index medianYears low95 high95 shareOfDraws }
  eventTable { ${TABLE_FIELDS} } } }`;
const COMPARISON = `query($a: ID!, $b: ID!) { recurrenceComparison(analysisAId: $a, analysisBId: $b) {
  analysisA { id hypothesis { name } } analysisB { id hypothesis { name } } settingDifferences note caution
  events { regionalEventId label difference a { counted inclusionProbability } b { counted inclusionProbability } }
  statistics { quantity a { median } b { median } medianDifference rangesOverlap }
  probabilities { model windowYears a { median } b { median } medianDifference rangesOverlap } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;
let segmentId: string;
let hypothesisId: string;
let splitHypothesisId: string;
const horizons: Record<string, string> = {};

/**
 * Sites A (30 km), B (80 km) and D (150 km) lie in the segment (0-200 km). Regional events, by
 * ties: R1 (2000 cal BP) at A, B, D; R2 (1500) at A and B only, a partial rupture spanning 25 %;
 * R3 (1000) and R4 (500) at A, B, D. D also has an untied event U (750).
 */
const SITES = [
  { key: 'A', name: 'Tarn Flat', km: 30, events: { R1: 2000, R2: 1500, R3: 1000, R4: 500 } },
  { key: 'B', name: 'Wren Core', km: 80, events: { R1: 2005, R2: 1495, R3: 995, R4: 505 } },
  { key: 'D', name: 'Gull Spit', km: 150, events: { R1: 1995, R3: 1005, U: 750, R4: 495 } },
] as const;

async function writeSucceededRun(siteId: string, horizonIds: string[], ages: readonly number[]): Promise<void> {
  const sd = 20;
  const rng = new SeededRandom(5);
  const drawCount = 200;
  const draws: number[] = [];
  for (let d = 0; d < drawCount; d++) for (const age of ages) draws.push(Math.round(age + sd * rng.normal()));
  const results: StoredAgeModelResults = {
    events: horizonIds.map((eventHorizonId, i) => {
      const density = normalDensity(ages[i], sd);
      return { eventHorizonId, summary: summarise(density), rhat: 1.001, ess: 2000, density: storeDensity(density) };
    }),
    samples: [],
    eventDraws: { eventHorizonIds: horizonIds, drawCount, draws },
  };
  await sql(
    `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, results, finished_at)
     values ($1, 'SUCCEEDED', 1, 7, '{}'::jsonb, '{}'::jsonb, 'fixture', $2::jsonb, now())`,
    [siteId, JSON.stringify(results)],
  );
}

async function hypothesis(name: string, preferred: boolean, ties: [string, string, number][]): Promise<string> {
  const [row] = await sql<{ id: string }>(`insert into hypotheses (project_id, name, preferred, version) values ($1, $2, $3, 1) returning id`, [
    fixture.projectId,
    name,
    preferred,
  ]);
  for (const [a, b, confidence] of ties) {
    await sql(`insert into ties (hypothesis_id, event_a_id, event_b_id, confidence) values ($1, $2, $3, $4)`, [row.id, horizons[a], horizons[b], confidence]);
  }
  return row.id;
}

async function runAnalysis(input: Record<string, unknown>) {
  const { startRecurrenceAnalysis } = await clients.ANALYST.ok(START, { i: { segmentId, forecastStartYear: 2000, draws: 300, seed: 11, windowsYears: [50], ...input } });
  await server.app.get(RunExecutor).execute(server.app.get(RecurrenceJob), startRecurrenceAnalysis.id);
  return (await clients.ANALYST.ok(ANALYSIS, { id: startRecurrenceAnalysis.id })).recurrenceAnalysis;
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Event counting');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
  const { createSegment } = await clients.RESEARCHER.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'Invented Middle', startKm: 0, endKm: 200 } });
  segmentId = createSegment.id;
  for (const site of SITES) {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
      i: { projectId: fixture.projectId, name: site.name, kind: 'MARSH', latitude: -41, longitude: 174, alongStrikeKm: site.km, segmentId },
    });
    const entries = Object.entries(site.events).sort((p, q) => q[1] - p[1]); // oldest first
    const units: string[] = [];
    for (let position = 1; position <= entries.length + 1; position++) {
      const top = entries.length + 1 - position;
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
        i: { siteId: createSite.id, position, name: `U${position}`, topDepthM: top, baseDepthM: top + 1, facies: 'PEAT' },
      });
      units.push(createUnit.id);
    }
    const ids: string[] = [];
    for (const [index, [event]] of entries.entries()) {
      const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
        i: { siteId: createSite.id, name: event, unitBelowId: units[index], unitAboveId: units[index + 1], quality: event === 'R2' ? 3 : 1 },
      });
      horizons[`${site.key}${event}`] = createEventHorizon.id;
      ids.push(createEventHorizon.id);
    }
    await writeSucceededRun(createSite.id, ids, entries.map(([, age]) => age));
  }
  hypothesisId = await hypothesis('Invented through-going', true, [
    ['AR1', 'BR1', 1], ['BR1', 'DR1', 1],
    ['AR2', 'BR2', 2],
    ['AR3', 'BR3', 1], ['BR3', 'DR3', 1],
    ['AR4', 'BR4', 1], ['BR4', 'DR4', 1],
  ]);
  // A second reading: R3 at D is a separate earthquake (its tie to B removed).
  splitHypothesisId = await hypothesis('Invented split R3', false, [
    ['AR1', 'BR1', 1], ['BR1', 'DR1', 1],
    ['AR2', 'BR2', 2],
    ['AR3', 'BR3', 1],
    ['AR4', 'BR4', 1], ['BR4', 'DR4', 1],
  ]);
});

afterAll(async () => {
  await server?.close();
});

describe('segmentEventTable', () => {
  it('shows each regional event with its sites, span and ties, and leaves untied events out by default', async () => {
    const { segmentEventTable: table } = await clients.VIEWER.ok(TABLE, { i: { segmentId } });
    expect(table.hypothesisId).toBe(hypothesisId);
    expect(table.rule).toEqual({ minimumSpanShare: 0, includeUntied: false, qualityWeights: null, confidenceWeights: null });
    // Young to old: R4, U, R3, R2, R1.
    expect(table.rows.map((row: { label: string }) => row.label)).toEqual([
      'Tarn Flat R4 + Wren Core R4 + Gull Spit R4',
      'Gull Spit U',
      'Tarn Flat R3 + Wren Core R3 + Gull Spit R3',
      'Tarn Flat R2 + Wren Core R2',
      'Tarn Flat R1 + Wren Core R1 + Gull Spit R1',
    ]);
    const [r4, untied, , r2] = table.rows;
    // R4 spans 30-150 km of 0-200: 60 %, from the first to the last site; R2 spans 30-80: 25 %.
    expect(r4).toMatchObject({ spanShare: 0.6, throughGoing: true, untied: false, tieConfidences: [1, 1], counted: true, inclusionProbability: 1, segmentNames: ['Invented Middle'] });
    expect(r2).toMatchObject({ spanShare: 0.25, throughGoing: false, tieConfidences: [2], qualities: [3, 3], counted: true });
    expect(untied).toMatchObject({ untied: true, counted: false, inclusionProbability: 0, spanShare: 0 });
    expect(untied.reason).toMatch(/untied/i);
    expect(table.countedEvents).toBe(4);
    expect(table.note).toMatch(/too long/);
  });

  it('applies a share rule and weights, and refuses rules it cannot use naming the field', async () => {
    const { segmentEventTable: table } = await clients.VIEWER.ok(TABLE, {
      i: { segmentId, countingRule: { minimumSpanShare: 0.5, includeUntied: true, confidenceWeights: [1, 0.5, 0.25, 0] } },
    });
    const counted = Object.fromEntries(table.rows.map((row: { label: string; inclusionProbability: number }) => [row.label.split(' + ')[0], row.inclusionProbability]));
    expect(counted).toEqual({ 'Tarn Flat R4': 1, 'Gull Spit U': 1, 'Tarn Flat R3': 1, 'Tarn Flat R2': 0, 'Tarn Flat R1': 1 });
    expect(table.weighted).toBe(false);

    expect(await clients.VIEWER.errorOf(TABLE, { i: { segmentId, countingRule: { minimumSpanShare: 1.5 } } })).toMatchObject({
      code: 'BAD_USER_INPUT',
      field: 'countingRule.minimumSpanShare',
    });
    expect(await clients.VIEWER.errorOf(TABLE, { i: { segmentId, countingRule: { qualityWeights: [1, 0.5, 0.2] } } })).toMatchObject({
      code: 'BAD_USER_INPUT',
      field: 'countingRule.qualityWeights',
    });
    expect(await clients.VIEWER.errorOf(TABLE, { i: { segmentId, countingRule: { confidenceWeights: [1, 1, 2, 1] } } })).toMatchObject({
      code: 'BAD_USER_INPUT',
      field: 'countingRule.confidenceWeights',
    });
    expect((await clients.OUTSIDER.errorOf(TABLE, { i: { segmentId } })).code).toBe('NOT_FOUND');
  });
});

describe('segment analyses under a counting rule', () => {
  let byDefault: Awaited<ReturnType<typeof runAnalysis>>;

  beforeAll(async () => {
    byDefault = await runAnalysis({});
  });

  it('leaves untied events out by default, so the recurrence is longer than when they count [analytic: 500 vs 375 years]', async () => {
    expect(byDefault.status).toBe('SUCCEEDED');
    expect(byDefault.eventCount).toBe(4);
    // R1, R2, R3, R4 about 500 years apart.
    expect(byDefault.meanRecurrence.median).toBeGreaterThan(470);
    expect(byDefault.meanRecurrence.median).toBeLessThan(530);
    const withUntied = await runAnalysis({ countingRule: { includeUntied: true } });
    expect(withUntied.eventCount).toBe(5);
    // U at 750 splits the youngest interval: (2000 - 500) / 4 = 375.
    expect(withUntied.meanRecurrence.median).toBeGreaterThan(350);
    expect(withUntied.meanRecurrence.median).toBeLessThan(400);
  });

  it('excludes a partial event by a share rule', async () => {
    const analysis = await runAnalysis({ countingRule: { minimumSpanShare: 0.5 } });
    expect(analysis.eventCount).toBe(3);
    // R1, R3, R4: intervals 1000 and 500.
    expect(analysis.meanRecurrence.median).toBeGreaterThan(720);
    expect(analysis.meanRecurrence.median).toBeLessThan(780);
    expect(analysis.eventTable.rows.find((row: { label: string }) => row.label.includes('R2')).counted).toBe(false);
  });

  it('stores the table it used, with its rule, and reads it back and exports it', async () => {
    expect(byDefault.eventTable.rule.includeUntied).toBe(false);
    expect(byDefault.eventTable.rows).toHaveLength(5);
    expect(byDefault.eventTable.rows.filter((row: { counted: boolean }) => row.counted)).toHaveLength(4);
    const headers = { authorization: `Bearer ${clients.VIEWER.token}` };
    const json = await (await fetch(`${server.url}/api/recurrence-analyses/${byDefault.id}/export.json`, { headers })).json();
    expect(json.eventTable.rows.map((row: { regionalEventId: string }) => row.regionalEventId)).toEqual(
      byDefault.eventTable.rows.map((row: { regionalEventId: string }) => row.regionalEventId),
    );
    const csv = await (await fetch(`${server.url}/api/recurrence-analyses/${byDefault.id}/export.csv`, { headers })).text();
    expect(csv).toContain('\r\nevent table\r\n');
    expect(csv).toContain('Gull Spit U');
  });

  it('draws weighted events into some records only, and says so', async () => {
    // R2's tie has confidence 2: weight 0.5.
    const analysis = await runAnalysis({ countingRule: { confidenceWeights: [1, 0.5, 0.5, 0.5] } });
    expect(analysis.status).toBe('SUCCEEDED');
    expect(analysis.eventTable.weighted).toBe(true);
    expect(analysis.eventTable.note).toMatch(/independently/);
    expect(analysis.recordEvents).toMatchObject({ low95: 3, high95: 4 });
    // The interval ending at R2 (index 2 from the youngest) is held in about half the draws [binomial 300 x 0.5, SD 8.7].
    const share = analysis.intervals.find((interval: { index: number }) => interval.index === 2).shareOfDraws;
    expect(Math.abs(share * 300 - 150)).toBeLessThan(4 * 8.7);
  });

  it('refuses a rule that leaves too few events, and a rule for a site analysis, naming the field', async () => {
    expect(await clients.ANALYST.errorOf(START, { i: { segmentId, countingRule: { minimumSpanShare: 0.9 } } })).toMatchObject({
      code: 'BAD_USER_INPUT',
      field: 'countingRule',
    });
    const [site] = await sql<{ id: string }>(`select id from sites where project_id = $1 limit 1`, [fixture.projectId]);
    expect(await clients.ANALYST.errorOf(START, { i: { siteId: site.id, countingRule: { includeUntied: true } } })).toMatchObject({
      code: 'BAD_USER_INPUT',
      field: 'countingRule',
    });
  });
});

describe('two hypotheses side by side', () => {
  it('aligns the tables by event, names the differences, and exports both hypotheses', async () => {
    const a = await runAnalysis({ hypothesisId });
    const b = await runAnalysis({ hypothesisId: splitHypothesisId, countingRule: {} });
    const { recurrenceComparison: comparison } = await clients.VIEWER.ok(COMPARISON, { a: a.id, b: b.id });
    expect(comparison.analysisA.hypothesis.name).toBe('Invented through-going');
    expect(comparison.analysisB.hypothesis.name).toBe('Invented split R3');
    expect(comparison.settingDifferences).toEqual([]);
    expect(comparison.caution).toBe(RECURRENCE_CAUTION);
    const differences = Object.fromEntries(comparison.events.map((e: { label: string; difference: string }) => [e.label, e.difference]));
    // Under B, R3 is A+B only and D's R3 is untied (out by default).
    expect(differences['Tarn Flat R3 + Wren Core R3 + Gull Spit R3']).toBe('ONLY_IN_A');
    expect(differences['Tarn Flat R3 + Wren Core R3']).toBe('ONLY_IN_B');
    expect(differences['Gull Spit R3']).toBe('ONLY_IN_B');
    expect(differences['Tarn Flat R1 + Wren Core R1 + Gull Spit R1']).toBe('SAME');
    expect(comparison.probabilities.length).toBeGreaterThan(0);
    for (const p of comparison.probabilities) expect(p.medianDifference).toBeCloseTo(p.b.median - p.a.median, 12);

    const headers = { authorization: `Bearer ${clients.VIEWER.token}` };
    const csv = await fetch(`${server.url}/api/recurrence-analyses/${a.id}/compare/${b.id}/export.csv`, { headers });
    expect(csv.status).toBe(200);
    const text = await csv.text();
    expect(text.startsWith(RECURRENCE_CAUTION)).toBe(true);
    expect(text).toContain('Invented through-going');
    expect(text).toContain('Invented split R3');
    expect(text).toContain('only in A');
    const json = await (await fetch(`${server.url}/api/recurrence-analyses/${a.id}/compare/${b.id}/export.json`, { headers })).json();
    expect(json.a.hypothesisName).toBe('Invented through-going');
    expect(json.b.hypothesisName).toBe('Invented split R3');
    expect(json.events.some((e: { difference: string }) => e.difference === 'ONLY_IN_B')).toBe(true);
    const outsider = await fetch(`${server.url}/api/recurrence-analyses/${a.id}/compare/${b.id}/export.csv`, { headers: { authorization: `Bearer ${clients.OUTSIDER.token}` } });
    expect(outsider.status).not.toBe(200);
  });
});
