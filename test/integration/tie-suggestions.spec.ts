import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const UPLOAD = `mutation($i: UploadCoreLogInput!) { uploadCoreLog(input: $i) { id channels } }`;
const CREATE_HYPOTHESIS = `mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id } }`;
const ADD_TIE = `mutation($i: AddTieInput!) { addTie(input: $i) { id evidence } }`;
const SUGGEST = `query($i: TieSuggestionsInput!) { tieSuggestions(input: $i) { eventA { id } eventB { id } score tied channels } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;

/**
 * Four invented regional events, each with its own bed shape (pulse positions within the bed).
 * Core B lost bed 2 to erosion. Beds are 10-16 cm thick between 20-30 cm of mud.
 */
const SHAPES = [[0.3], [0.2, 0.7], [0.5, 0.85], [0.15, 0.45, 0.8]];
const cores: Record<'A' | 'B', { id: string; events: Record<number, string> }> = { A: { id: '', events: {} }, B: { id: '', events: {} } };

async function buildCore(key: 'A' | 'B', name: string, alongStrikeKm: number, beds: number[], thickness: number, mud: number): Promise<void> {
  const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
    i: { projectId: fixture.projectId, name, kind: 'CORE', latitude: -42, longitude: 176, alongStrikeKm },
  });
  cores[key].id = createSite.id;
  // Units from the base up: mud, bed, mud, bed, ..., mud at the top.
  const layers: { facies: string; thickness: number; bed?: number }[] = [{ facies: 'HEMIPELAGIC_MUD', thickness: mud }];
  for (const bed of [...beds].reverse()) {
    layers.push({ facies: 'TURBIDITE', thickness, bed }, { facies: 'HEMIPELAGIC_MUD', thickness: mud });
  }
  const total = layers.reduce((sum, layer) => sum + layer.thickness, 0);
  let base = total;
  const ids: string[] = [];
  const logRows: string[] = [];
  const spans: { top: number; base: number; bed?: number }[] = [];
  for (const [index, layer] of layers.entries()) {
    const top = Number((base - layer.thickness).toFixed(4));
    const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
      i: { siteId: createSite.id, position: index + 1, name: `${layer.facies === 'TURBIDITE' ? 'T' : 'M'}${index + 1}`, topDepthM: top, baseDepthM: Number(base.toFixed(4)), facies: layer.facies },
    });
    ids.push(createUnit.id);
    spans.push({ top, base, bed: layer.bed });
    base = top;
  }
  for (const [index, layer] of layers.entries()) {
    if (layer.bed === undefined) continue;
    const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
      i: { siteId: createSite.id, name: `T${layer.bed + 1}`, unitBelowId: ids[index - 1], unitAboveId: ids[index], quality: 1 },
    });
    cores[key].events[layer.bed] = createEventHorizon.id;
  }
  // Susceptibility every centimetre: 20 in mud, pulses of 60 in beds, a small fixed ripple as noise.
  for (let d = 0; d < total; d += 0.01) {
    const span = spans.find((s) => d >= s.top && d < s.base);
    let value = 20 + 2 * Math.sin(d * 700);
    if (span?.bed !== undefined) {
      const x = (d - span.top) / (span.base - span.top);
      for (const centre of SHAPES[span.bed]) value += 60 * Math.exp(-0.5 * ((x - centre) / 0.08) ** 2);
    }
    logRows.push(`${d.toFixed(2)},${value.toFixed(2)}`);
  }
  await clients.RESEARCHER.ok(UPLOAD, { i: { siteId: createSite.id, name: 'MSCL', csv: ['depth (m),magnetic susceptibility (SI 1e-5)', ...logRows].join('\n') } });
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Tie suggestions');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
  await buildCore('A', 'Corran Core', 100, [0, 1, 2, 3], 0.12, 0.25);
  await buildCore('B', 'Delby Core', 180, [0, 1, 3], 0.16, 0.3);
});

afterAll(async () => {
  await server?.close();
});

describe('tie suggestions', () => {
  let hypothesisId: string;

  it('proposes the true pairs in order, skipping the bed one core lost, and ties nothing', async () => {
    const { createHypothesis } = await clients.CORRELATOR.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: 'Cores' } });
    hypothesisId = createHypothesis.id;
    const { tieSuggestions } = await clients.VIEWER.ok(SUGGEST, { i: { hypothesisId, siteAId: cores.A.id, siteBId: cores.B.id } });
    const pairs = tieSuggestions.map((s: { eventA: { id: string }; eventB: { id: string } }) => [s.eventA.id, s.eventB.id]);
    expect(pairs).toEqual([0, 1, 3].map((bed) => [cores.A.events[bed], cores.B.events[bed]]));
    for (const s of tieSuggestions) {
      expect(s.score).toBeGreaterThan(0.5);
      expect(s.tied).toBe(false);
      expect(s.channels).toEqual(['magnetic susceptibility']);
    }
    const { hypothesis } = await clients.VIEWER.ok(`query($id: ID!) { hypothesis(id: $id) { ties { id } } }`, { id: hypothesisId });
    expect(hypothesis.ties).toEqual([]);
  });

  it('lets the correlator accept one as a tie with the evidence "log match", shown as tied after', async () => {
    const { addTie } = await clients.CORRELATOR.ok(ADD_TIE, {
      i: { hypothesisId, eventAId: cores.A.events[1], eventBId: cores.B.events[1], confidence: 2, evidence: ['log match'] },
    });
    expect(addTie.evidence).toEqual(['log match']);
    const { tieSuggestions } = await clients.VIEWER.ok(SUGGEST, { i: { hypothesisId, siteAId: cores.A.id, siteBId: cores.B.id } });
    expect(tieSuggestions.filter((s: { tied: boolean }) => s.tied).map((s: { eventA: { id: string } }) => s.eventA.id)).toEqual([cores.A.events[1]]);
  });

  it('refuses one core twice, a site of another project, and hides the project from outsiders', async () => {
    expect(await clients.VIEWER.errorOf(SUGGEST, { i: { hypothesisId, siteAId: cores.A.id, siteBId: cores.A.id } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'siteBId' });
    const other = await createProjectFixture('Elsewhere');
    const { createSite } = await (await new GraphqlClient(server.url).signIn(other.emails.RESEARCHER, PASSWORD)).ok(CREATE_SITE, {
      i: { projectId: other.projectId, name: 'Far Core', kind: 'CORE', latitude: 0, longitude: 0, alongStrikeKm: 0 },
    });
    expect(await clients.VIEWER.errorOf(SUGGEST, { i: { hypothesisId, siteAId: cores.A.id, siteBId: createSite.id } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'siteBId' });
    expect((await clients.OUTSIDER.errorOf(SUGGEST, { i: { hypothesisId, siteAId: cores.A.id, siteBId: cores.B.id } })).code).toBe('NOT_FOUND');
  });
});
