/**
 * Event size evidence through the API (issue 14, item 5): a segment's down-dip width, measured
 * subsidence and displacement on event horizons, a core event's bed thickness from its unit, and a
 * regional event's along-strike profile with Mw from area and from displacement beside the
 * length-based magnitude. Invented sites on an invented margin.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SEGMENT = `mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id version downDipWidthKm } }`;
const UPDATE_SEGMENT = `mutation($id: ID!, $v: Int!, $i: UpdateSegmentInput!) { updateSegment(id: $id, version: $v, input: $i) { id version downDipWidthKm } }`;
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id version subsidenceM subsidenceErrorM displacementM displacementErrorM bedThicknessM } }`;
const UPDATE_HORIZON = `mutation($id: ID!, $v: Int!, $i: UpdateEventHorizonInput!) { updateEventHorizon(id: $id, version: $v, input: $i) { id version subsidenceM subsidenceErrorM displacementM displacementErrorM } }`;
const CREATE_HYPOTHESIS = `mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id } }`;
const ADD_TIE = `mutation($i: AddTieInput!) { addTie(input: $i) { id } }`;
const HYPOTHESIS = `query($id: ID!) { hypothesis(id: $id) { regionalEvents { id members { id } ruptureLengthKm
  magnitude { mw sigma relation } magnitudeFromArea { mw sigma relation } magnitudeFromDisplacement { mw sigma relation }
  sizeProfile { eventHorizon { id } site { id } alongStrikeKm subsidenceM subsidenceErrorM displacementM displacementErrorM bedThicknessM } } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole, GraphqlClient>;
let segment: { id: string; version: number };
const horizons: Record<string, { id: string; version: number }> = {};

async function siteWithEvent(key: string, kind: string, alongStrikeKm: number, horizonExtra: Record<string, unknown>) {
  const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
    i: { projectId: fixture.projectId, name: `Size ${key}`, kind, latitude: -41, longitude: 174, alongStrikeKm, segmentId: segment.id },
  });
  const units: string[] = [];
  // Unit 2 (above the horizon) is 0.35 m thick: top 1.20 m, base 1.55 m.
  for (const [position, top, base] of [[1, 1.55, 2.5], [2, 1.2, 1.55]]) {
    const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: createSite.id, position, name: `${key}${position}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' } });
    units.push(createUnit.id);
  }
  const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
    i: { siteId: createSite.id, name: `${key}-E1`, unitBelowId: units[0], unitAboveId: units[1], quality: 1, ...horizonExtra },
  });
  horizons[key] = createEventHorizon;
  return createEventHorizon;
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Size evidence');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  const { createSegment } = await clients.RESEARCHER.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'Invented North', startKm: 0, endKm: 300 } });
  segment = createSegment;
});

afterAll(async () => {
  await server?.close();
});

describe('Segment.downDipWidthKm', () => {
  it('starts empty, is set by updateSegment and refuses a width that is not positive, naming the field', async () => {
    expect(segment).toMatchObject({ downDipWidthKm: null });
    const bad = await clients.RESEARCHER.errorOf(UPDATE_SEGMENT, { id: segment.id, v: segment.version, i: { downDipWidthKm: 0 } });
    expect(bad).toMatchObject({ code: 'BAD_USER_INPUT', field: 'downDipWidthKm' });
    const { updateSegment } = await clients.RESEARCHER.ok(UPDATE_SEGMENT, { id: segment.id, v: segment.version, i: { downDipWidthKm: 50 } });
    expect(updateSegment.downDipWidthKm).toBe(50);
    segment = updateSegment;
    const { createSegment } = await clients.RESEARCHER.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'Invented Far', startKm: 400, endKm: 500, downDipWidthKm: 80 } });
    expect(createSegment.downDipWidthKm).toBe(80);
  });
});

describe('EventHorizon size fields', () => {
  it('stores subsidence and displacement with their errors, and refuses an error that is not above 0', async () => {
    const marsh = await siteWithEvent('M', 'MARSH', 20, { subsidenceM: 1.1, subsidenceErrorM: 0.3 });
    expect(marsh).toMatchObject({ subsidenceM: 1.1, subsidenceErrorM: 0.3, displacementM: null, bedThicknessM: null });
    const bad = await clients.RESEARCHER.errorOf(UPDATE_HORIZON, { id: marsh.id, v: marsh.version, i: { subsidenceErrorM: 0 } });
    expect(bad).toMatchObject({ code: 'BAD_USER_INPUT', field: 'subsidenceErrorM' });
    const badDisplacement = await clients.RESEARCHER.errorOf(UPDATE_HORIZON, { id: marsh.id, v: marsh.version, i: { displacementErrorM: -1 } });
    expect(badDisplacement).toMatchObject({ code: 'BAD_USER_INPUT', field: 'displacementErrorM' });
    const { updateEventHorizon } = await clients.RESEARCHER.ok(UPDATE_HORIZON, { id: marsh.id, v: marsh.version, i: { displacementM: 4, displacementErrorM: 1 } });
    expect(updateEventHorizon).toMatchObject({ subsidenceM: 1.1, displacementM: 4, displacementErrorM: 1 });
    horizons.M = updateEventHorizon;
  });

  it('gives a core event the thickness of the unit above it: 1.55 - 1.20 = 0.35 m [analytic]', async () => {
    const core = await siteWithEvent('C', 'CORE', 120, { displacementM: 6, displacementErrorM: 2 });
    expect(core.bedThicknessM).toBeCloseTo(0.35, 12);
  });
});

describe('RegionalEvent size and magnitudes', () => {
  it('shows the along-strike profile and Mw from length, area and displacement side by side', async () => {
    const { createHypothesis } = await clients.CORRELATOR.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: 'Size one-to-one' } });
    await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId: createHypothesis.id, eventAId: horizons.M.id, eventBId: horizons.C.id, confidence: 2, evidence: ['size'] } });
    const { hypothesis } = await clients.VIEWER.ok(HYPOTHESIS, { id: createHypothesis.id });
    const event = hypothesis.regionalEvents.find((r: { members: unknown[] }) => r.members.length === 2);
    expect(event.ruptureLengthKm).toBe(100);
    expect(event.magnitude.relation).toMatch(/minimum rupture length \(site span\)/);
    // Area 100 km x 50 km = 5,000 km^2: Mw = 4.441 + 0.846 log10(5000) = 7.578 [published, secondary: CHECKS.md].
    expect(event.magnitudeFromArea.mw).toBeCloseTo(4.441 + 0.846 * Math.log10(5000), 9);
    expect(event.magnitudeFromArea.sigma).toBe(0.286);
    // Mean displacement (4 + 6) / 2 = 5 m: Mw = 6.93 + 0.82 log10(5) [memory: Wells & Coppersmith 1994].
    expect(event.magnitudeFromDisplacement.mw).toBeCloseTo(6.93 + 0.82 * Math.log10(5), 9);
    expect(event.sizeProfile.map((p: { alongStrikeKm: number }) => p.alongStrikeKm)).toEqual([20, 120]);
    expect(event.sizeProfile[0]).toMatchObject({ subsidenceM: 1.1, subsidenceErrorM: 0.3, displacementM: 4, bedThicknessM: null });
    expect(event.sizeProfile[1].bedThicknessM).toBeCloseTo(0.35, 12);
  });

  it('has no Mw from area once the segment has no width', async () => {
    await clients.RESEARCHER.ok(UPDATE_SEGMENT, { id: segment.id, v: segment.version, i: { downDipWidthKm: null } });
    const { createHypothesis } = await clients.CORRELATOR.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: 'Size again' } });
    await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId: createHypothesis.id, eventAId: horizons.M.id, eventBId: horizons.C.id, confidence: 2, evidence: ['size'] } });
    const { hypothesis } = await clients.VIEWER.ok(HYPOTHESIS, { id: createHypothesis.id });
    const event = hypothesis.regionalEvents.find((r: { members: unknown[] }) => r.members.length === 2);
    expect(event.magnitudeFromArea).toBeNull();
  });
});
