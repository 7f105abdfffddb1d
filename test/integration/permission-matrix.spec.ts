import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PNG as PngImage } from 'pngjs';
import { buildSchema, getNamedType, isObjectType, type GraphQLField } from 'graphql';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../backend/src/access/permissions';
import { storeDensity, type StoredAgeModelResults } from '../../backend/src/age-models/age-model-results';
import { normalDensity, summarise } from '../../backend/src/chronology/common/density';
import { SeededRandom } from '../../backend/src/chronology/common/random';
import { S3Fake, startS3Fake } from '../../backend/src/fakes/s3-fake';
import { SmtpFake, startSmtpFake } from '../../backend/src/fakes/smtp-fake';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, createUser, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

/**
 * Every mutation of schema.graphql tried by every role of a project, by someone outside it and
 * without a token. The documents are generated from the schema; the expectations are written out
 * here, per mutation the roles allowed, from SPEC.md's role descriptions, independently of the
 * server's role table (ROLE_PERMISSIONS) that the matrix tests. A new mutation without a line
 * here fails the first test.
 */

/** OPERATOR: an operator of the server (OPERATOR_EMAILS) who is not a member of the project. */
type Actor = Role | 'OUTSIDER' | 'OPERATOR';
const ACTORS: readonly Actor[] = [...ROLES, 'OUTSIDER', 'OPERATOR'];
const OPERATOR_EMAIL = `operator-${randomUUID().slice(0, 8)}@matrix.test`;

/**
 * Who may call a mutation. `roles`: a member of the objects' project with one of these roles
 * (others in the project: FORBIDDEN; outsiders: NOT_FOUND, the project is hidden).
 * `signedIn`: anyone with a token. `public`: no token needed. `operator`: an operator of the
 * server only (everyone else: FORBIDDEN). An operator is otherwise an outsider of the project.
 */
type Access = { roles: readonly Role[] } | 'signedIn' | 'public' | 'operator';
type Variables = Record<string, unknown>;

interface MatrixCase {
  access: Access;
  /** Valid variables for one call; destructive mutations make a fresh target per call. */
  variables: () => Promise<Variables>;
  /** The error an allowed caller gets from the action itself (after the access check); none: success. */
  allowedError?: 'BAD_USER_INPUT';
  /** Undo a side effect that would change later rows of the matrix. */
  cleanup?: (variables: Variables) => Promise<void>;
}

const schema = buildSchema(readFileSync(join(__dirname, '..', '..', 'schema.graphql'), 'utf8'));
const mutationFields = schema.getMutationType()!.getFields();

/** `mutation($a: T!) { name(a: $a) { __typename } }` for one field of the schema's Mutation type. */
function documentFor(field: GraphQLField<unknown, unknown>): string {
  const declared = field.args.map((arg) => `$${arg.name}: ${String(arg.type)}`).join(', ');
  const passed = field.args.map((arg) => `${arg.name}: $${arg.name}`).join(', ');
  const selection = isObjectType(getNamedType(field.type)) ? ' { __typename }' : '';
  return `mutation${declared ? `(${declared})` : ''} { ${field.name}${passed ? `(${passed})` : ''}${selection} }`;
}

function mayCall(access: Access, actor: Actor): boolean {
  if (access === 'public' || access === 'signedIn') return true;
  if (access === 'operator') return actor === 'OPERATOR';
  if (actor === 'OUTSIDER' || actor === 'OPERATOR') return false;
  return access.roles.includes(actor);
}

/** The error code a refused actor gets. */
function refusal(access: Access, actor: Actor): 'FORBIDDEN' | 'NOT_FOUND' {
  const outside = actor === 'OUTSIDER' || actor === 'OPERATOR';
  return outside && typeof access === 'object' ? 'NOT_FOUND' : 'FORBIDDEN';
}

const REFUSED = ['FORBIDDEN', 'NOT_FOUND', 'UNAUTHENTICATED'];

// A 1x1 PNG written by pngjs (PNG specification, RFC 2083 section 3).
const PNG = (() => {
  const image = new PngImage({ width: 1, height: 1 });
  image.data.set([200, 40, 40, 255]);
  return PngImage.sync.write(image);
})();

let smtp: SmtpFake;
let s3: S3Fake;
let s3Dir: string;
let server: TestServer;
let fixture: ProjectFixture;
let anonymous: GraphqlClient;
const clients = {} as Record<Actor, GraphqlClient>;

let segmentId: string;
/** Site with three events and a SUCCEEDED age model run (for recurrence). */
let runSiteId: string;
const runEvents: string[] = [];
/** Site whose unit, event horizon and sample the update mutations change. */
let editSiteId: string;
let editUnitIds: string[];
let editEventId: string;
let editSampleId: string;
let hypothesisId: string;

let counter = 0;
const unique = (label: string) => `${label} ${++counter}-${randomUUID().slice(0, 6)}`;

const gql = {
  segment: `mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`,
  site: `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`,
  unit: `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`,
  horizon: `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`,
  sample: `mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }`,
  hypothesis: `mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id } }`,
  tie: `mutation($i: AddTieInput!) { addTie(input: $i) { id } }`,
  recurrence: `mutation($i: StartRecurrenceAnalysisInput!) { startRecurrenceAnalysis(input: $i) { id } }`,
};

async function newSegment(): Promise<string> {
  return (await clients.RESEARCHER.ok(gql.segment, { i: { projectId: fixture.projectId, name: unique('Segment'), startKm: 0, endKm: 50 } })).createSegment.id;
}

function siteInput(extra: Variables = {}): Variables {
  return { projectId: fixture.projectId, name: unique('Site'), kind: 'MARSH', latitude: -41, longitude: 174, alongStrikeKm: 25, ...extra };
}

async function newSite(extra: Variables = {}): Promise<string> {
  return (await clients.RESEARCHER.ok(gql.site, { i: siteInput(extra) })).createSite.id;
}

/** Units from the bottom up, one metre each. */
async function newUnits(siteId: string, count: number): Promise<string[]> {
  const ids: string[] = [];
  for (let position = 1; position <= count; position++) {
    const { createUnit } = await clients.RESEARCHER.ok(gql.unit, {
      i: { siteId, position, name: `U${position}`, topDepthM: count - position, baseDepthM: count - position + 1, facies: 'PEAT' },
    });
    ids.push(createUnit.id);
  }
  return ids;
}

async function newHorizon(siteId: string, below: string, above: string, name = 'E1'): Promise<string> {
  return (await clients.RESEARCHER.ok(gql.horizon, { i: { siteId, name, unitBelowId: below, unitAboveId: above, quality: 1 } })).createEventHorizon.id;
}

function sampleInput(): Variables {
  return {
    siteId: editSiteId, unitId: editUnitIds[0], labCode: unique('MX').replace(' ', '-'), method: 'RADIOCARBON', material: 'IN_SITU_PLANT',
    depthM: 1.5, ageRelation: 'DATES_DEPOSIT', c14Age: 1200, c14Error: 30, curve: 'INTCAL20',
  };
}

async function newHypothesis(): Promise<string> {
  return (await clients.ADMIN.ok(gql.hypothesis, { i: { projectId: fixture.projectId, name: unique('Hypothesis') } })).createHypothesis.id;
}

async function versionOf(table: 'segments' | 'sites' | 'units' | 'event_horizons' | 'samples', id: string): Promise<number> {
  const [row] = await sql<{ version: number }>(`select version from ${table} where id = $1`, [id]);
  return row.version;
}

/** A user who is a VIEWER of the fixture project, to have their role changed or be removed. */
async function throwawayMember(): Promise<string> {
  const [user] = await sql<{ id: string }>(
    `insert into users (email, display_name, password_hash) values ($1, 'Throwaway', 'x') returning id`,
    [`throwaway-${randomUUID().slice(0, 8)}@fixture.test`],
  );
  await sql(`insert into memberships (project_id, user_id, role) values ($1, $2, 'VIEWER')`, [fixture.projectId, user.id]);
  return user.id;
}

/** A SUCCEEDED run in the stored results format (as recurrence.spec.ts seeds one), events oldest first. */
async function writeSucceededRun(siteId: string, horizonIds: string[], ages: number[]): Promise<void> {
  const drawCount = 200;
  const rng = new SeededRandom(5);
  const draws: number[] = [];
  for (let d = 0; d < drawCount; d++) for (const age of ages) draws.push(Math.round(age + 30 * rng.normal()));
  const results: StoredAgeModelResults = {
    events: horizonIds.map((eventHorizonId, i) => {
      const density = normalDensity(ages[i], 30);
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

let coreSiteId: string | undefined;

/** A CORE site two metres deep (made once), for core-log uploads. */
async function coreSite(): Promise<string> {
  if (!coreSiteId) {
    coreSiteId = await newSite({ kind: 'CORE' });
    await newUnits(coreSiteId, 2);
  }
  return coreSiteId;
}

const CORE_LOG_CSV = 'depth (m),susceptibility (SI)\n0.10,12.5\n0.20,13.0\n0.30,11.8\n';

async function newCoreLog(): Promise<string> {
  const { uploadCoreLog } = await clients.RESEARCHER.ok(
    `mutation($i: UploadCoreLogInput!) { uploadCoreLog(input: $i) { id } }`,
    { i: { siteId: await coreSite(), name: unique('Log'), csv: CORE_LOG_CSV } },
  );
  return uploadCoreLog.id;
}

async function uploadAttachment(): Promise<string> {
  const response = await fetch(`${server.url}/api/attachments?siteId=${editSiteId}&fileName=matrix.png`, {
    method: 'POST',
    headers: { authorization: `Bearer ${clients.RESEARCHER.token}`, 'content-type': 'application/octet-stream' },
    body: PNG,
  });
  expect(response.status).toBe(201);
  return ((await response.json()) as { id: string }).id;
}

// Who may do what, from SPEC.md "Who uses it" (an admin may do everything in the project; a
// viewer "reads everything in a project, changes nothing").
/** "Researcher ... enters sites, stratigraphic units, event horizons and dated samples; imports lab result sheets; attaches ..." */
const stratigraphy: Access = { roles: ['ADMIN', 'RESEARCHER'] };
/** The researcher's site age models (the site's dates turned into event ages). */
const ageModels: Access = { roles: ['ADMIN', 'RESEARCHER'] };
/** "Correlator: links events across sites and cores into regional events, keeps competing correlation hypotheses". */
const correlation: Access = { roles: ['ADMIN', 'CORRELATOR'] };
/** "Hazard analyst: pulls recurrence statistics and conditional probabilities". */
const recurrence: Access = { roles: ['ADMIN', 'ANALYST'] };
/** "Project admin: invites members, assigns roles, freezes releases for publication" (and project settings). */
const adminOnly: Access = { roles: ['ADMIN'] };
/** Asking for stale results to be re-run: every role that computes something; not a viewer. */
const everyoneButViewers: Access = { roles: ['ADMIN', 'RESEARCHER', 'CORRELATOR', 'ANALYST'] };

const CASES: Record<string, MatrixCase> = {
  signIn: { access: 'public', variables: async () => ({ email: fixture.emails.VIEWER, password: PASSWORD }) },
  createProject: {
    access: 'signedIn',
    variables: async () => ({ input: { name: unique('Matrix project') } }),
    // The caller becomes ADMIN of the new project, which would let them install curves later.
    cleanup: async ({ input }) => {
      await sql(`delete from memberships where project_id in (select id from projects where name = $1)`, [(input as { name: string }).name]);
    },
  },

  createSegment: { access: stratigraphy, variables: async () => ({ input: { projectId: fixture.projectId, name: unique('Segment'), startKm: 0, endKm: 40 } }) },
  updateSegment: { access: stratigraphy, variables: async () => ({ id: segmentId, version: await versionOf('segments', segmentId), input: { notes: unique('note') } }) },
  deleteSegment: { access: stratigraphy, variables: async () => ({ id: await newSegment() }) },

  createSite: { access: stratigraphy, variables: async () => ({ input: siteInput() }) },
  updateSite: { access: stratigraphy, variables: async () => ({ id: editSiteId, version: await versionOf('sites', editSiteId), input: { notes: unique('note') } }) },
  deleteSite: { access: stratigraphy, variables: async () => ({ id: await newSite() }) },

  createUnit: {
    access: stratigraphy,
    variables: async () => ({ input: { siteId: await newSite(), position: 1, name: 'U1', topDepthM: 0, baseDepthM: 1, facies: 'PEAT' } }),
  },
  updateUnit: {
    access: stratigraphy,
    variables: async () => ({ id: editUnitIds[1], version: await versionOf('units', editUnitIds[1]), input: { notes: unique('note') } }),
  },
  deleteUnit: { access: stratigraphy, variables: async () => ({ id: (await newUnits(await newSite(), 1))[0] }) },

  createEventHorizon: {
    access: stratigraphy,
    variables: async () => {
      const siteId = await newSite();
      const [below, above] = await newUnits(siteId, 2);
      return { input: { siteId, name: 'E1', unitBelowId: below, unitAboveId: above, quality: 2 } };
    },
  },
  updateEventHorizon: {
    access: stratigraphy,
    variables: async () => ({ id: editEventId, version: await versionOf('event_horizons', editEventId), input: { notes: unique('note') } }),
  },
  deleteEventHorizon: {
    access: stratigraphy,
    variables: async () => {
      const siteId = await newSite();
      const [below, above] = await newUnits(siteId, 2);
      return { id: await newHorizon(siteId, below, above) };
    },
  },

  createSample: { access: stratigraphy, variables: async () => ({ input: sampleInput() }) },
  updateSample: {
    access: stratigraphy,
    variables: async () => ({ id: editSampleId, version: await versionOf('samples', editSampleId), input: { notes: unique('note') } }),
  },
  deleteSample: { access: stratigraphy, variables: async () => ({ id: (await clients.RESEARCHER.ok(gql.sample, { i: sampleInput() })).createSample.id }) },
  importSamples: { access: stratigraphy, variables: async () => ({ input: { siteId: editSiteId, csv: 'lab_code\n', commit: false } }) },
  // The text is not a curve file: an operator passes the access check and is refused on the text
  // (BAD_USER_INPUT), so the matrix installs nothing into the database other files share.
  installCalibrationCurve: {
    access: 'operator',
    allowedError: 'BAD_USER_INPUT',
    variables: async () => ({ input: { code: 'SHCAL20', name: 'Matrix check', marine: false, text: 'not a curve file' } }),
  },

  startAgeModelRun: { access: ageModels, variables: async () => ({ input: { siteId: editSiteId, iterations: 500 } }) },
  cancelAgeModelRun: {
    access: ageModels,
    variables: async () => {
      const [run] = await sql<{ id: string }>(
        `insert into age_model_runs (site_id, seed, settings, input_snapshot, input_fingerprint) values ($1, 3, '{}'::jsonb, '{}'::jsonb, 'fixture') returning id`,
        [editSiteId],
      );
      return { id: run.id };
    },
  },
  // Choosing which run feeds the ladder is the age models' owners' call: whoever may start them.
  chooseDownstreamRun: {
    access: ageModels,
    variables: async () => {
      const [run] = await sql<{ id: string }>(`select id from age_model_runs where site_id = $1 and status = 'SUCCEEDED' limit 1`, [runSiteId]);
      return { input: { siteId: runSiteId, runId: run.id } };
    },
    // Later rows (recurrence) read the run used downstream: follow the newest again.
    cleanup: async () => {
      await sql(`delete from downstream_run_choices where site_id = $1`, [runSiteId]);
    },
  },

  createHypothesis: { access: correlation, variables: async () => ({ input: { projectId: fixture.projectId, name: unique('Hypothesis') } }) },
  updateHypothesis: { access: correlation, variables: async () => ({ id: hypothesisId, input: { description: unique('description') } }) },
  deleteHypothesis: { access: correlation, variables: async () => ({ id: await newHypothesis() }) },
  setPreferredHypothesis: { access: correlation, variables: async () => ({ id: hypothesisId }) },
  addTie: {
    access: correlation,
    variables: async () => ({ input: { hypothesisId: await newHypothesis(), eventAId: runEvents[0], eventBId: editEventId, confidence: 2 } }),
  },
  removeTie: {
    access: correlation,
    variables: async () => {
      const { addTie } = await clients.ADMIN.ok(gql.tie, { i: { hypothesisId: await newHypothesis(), eventAId: runEvents[0], eventBId: editEventId, confidence: 3 } });
      return { id: addTie.id };
    },
  },
  // The tied run site has no dated samples, so an allowed caller passes the access check and is
  // refused on the columns (BAD_USER_INPUT): nothing is queued.
  startJointAgeModelRun: { access: correlation, allowedError: 'BAD_USER_INPUT', variables: async () => ({ input: { hypothesisId, chains: 2, iterations: 500 } }) },
  cancelJointAgeModelRun: {
    access: correlation,
    variables: async () => {
      const [run] = await sql<{ id: string }>(
        `insert into joint_age_model_runs (project_id, hypothesis_id, hypothesis_version, seed, settings, input_snapshot) values ($1, $2, 1, 3, '{}'::jsonb, '{}'::jsonb) returning id`,
        [fixture.projectId, hypothesisId],
      );
      return { id: run.id };
    },
  },

  startRecurrenceAnalysis: { access: recurrence, variables: async () => ({ input: { siteId: runSiteId, draws: 100, seed: 11 } }) },
  cancelRecurrenceAnalysis: {
    access: recurrence,
    variables: async () => ({ id: (await clients.ANALYST.ok(gql.recurrence, { i: { siteId: runSiteId, draws: 100, seed: 12 } })).startRecurrenceAnalysis.id }),
  },

  inviteMember: { access: adminOnly, variables: async () => ({ input: { projectId: fixture.projectId, email: `invitee-${randomUUID().slice(0, 8)}@fixture.test`, role: 'VIEWER' } }) },
  acceptInvitation: { access: 'public', variables: async () => ({ input: { token: 'no-such-invitation-token', password: 'matrix-password-1' } }) },
  requestPasswordReset: { access: 'public', variables: async () => ({ email: `nobody-${randomUUID().slice(0, 8)}@fixture.test` }) },
  resetPassword: { access: 'public', variables: async () => ({ input: { token: 'no-such-reset-token', password: 'matrix-password-1' } }) },
  setMemberRole: { access: adminOnly, variables: async () => ({ input: { projectId: fixture.projectId, userId: await throwawayMember(), role: 'ANALYST' } }) },
  removeMember: { access: adminOnly, variables: async () => ({ projectId: fixture.projectId, userId: await throwawayMember() }) },

  refreshStaleResults: { access: everyoneButViewers, variables: async () => ({ projectId: fixture.projectId }) },
  setRefreshSettings: { access: adminOnly, variables: async () => ({ input: { projectId: fixture.projectId, automatic: false } }) },
  createRelease: { access: adminOnly, variables: async () => ({ input: { projectId: fixture.projectId, note: unique('Matrix release') } }) },
  deleteAttachment: { access: stratigraphy, variables: async () => ({ id: await uploadAttachment() }) },
  uploadCoreLog: { access: stratigraphy, variables: async () => ({ input: { siteId: await coreSite(), name: unique('Log'), csv: CORE_LOG_CSV } }) },
  deleteCoreLog: { access: stratigraphy, variables: async () => ({ id: await newCoreLog() }) },
};

const MUTATIONS = Object.keys(mutationFields);
const guarded = MUTATIONS.filter((name) => CASES[name] && CASES[name].access !== 'public');
const open = MUTATIONS.filter((name) => CASES[name]?.access === 'public');
const pairs = guarded.flatMap((name) =>
  ACTORS.map((actor) => ({
    name,
    actor,
    outcome: mayCall(CASES[name].access, actor) ? 'allowed' : refusal(CASES[name].access, actor),
  })),
);

async function call(client: GraphqlClient, name: string): Promise<{ code?: string; message?: string; variables: Variables }> {
  const matrixCase = CASES[name];
  const variables = await matrixCase.variables();
  const result = await client.request(documentFor(mutationFields[name]), variables);
  await matrixCase.cleanup?.(variables);
  const error = result.errors?.[0];
  return { code: error ? (error.extensions?.code ?? 'NO_CODE') : undefined, message: error?.message, variables };
}

beforeAll(async () => {
  smtp = await startSmtpFake({ smtpPort: 0, httpPort: 0 });
  s3Dir = await mkdtemp(join(tmpdir(), 'stratochron-matrix-s3-'));
  s3 = await startS3Fake({ port: 0, dataDir: s3Dir });
  server = await startTestServer({
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(smtp.smtpPort),
    MAIL_FAKE_URL: smtp.listingUrl,
    S3_ENDPOINT: s3.endpoint,
    S3_REGION: 'us-east-1',
    S3_BUCKET: 'matrix-test',
    S3_ACCESS_KEY_ID: 'fake-access-key',
    S3_SECRET_ACCESS_KEY: 'fake-secret-key',
    S3_FORCE_PATH_STYLE: 'true',
    OPERATOR_EMAILS: OPERATOR_EMAIL,
  });
  fixture = await createProjectFixture('Permission matrix');
  anonymous = new GraphqlClient(server.url);
  for (const role of ROLES) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
  await createUser(OPERATOR_EMAIL, 'Matrix operator');
  clients.OPERATOR = await anonymous.signIn(OPERATOR_EMAIL, PASSWORD);

  segmentId = await newSegment();
  runSiteId = await newSite({ segmentId, alongStrikeKm: 10 });
  const runUnits = await newUnits(runSiteId, 4);
  for (const index of [0, 1, 2]) runEvents.push(await newHorizon(runSiteId, runUnits[index], runUnits[index + 1], `E${index + 1}`));
  await writeSucceededRun(runSiteId, runEvents, [1500, 950, 400]);

  editSiteId = await newSite({ segmentId, alongStrikeKm: 30 });
  editUnitIds = await newUnits(editSiteId, 2);
  editEventId = await newHorizon(editSiteId, editUnitIds[0], editUnitIds[1]);
  editSampleId = (await clients.RESEARCHER.ok(gql.sample, { i: sampleInput() })).createSample.id;
  hypothesisId = await newHypothesis();
  await clients.ADMIN.ok(gql.tie, { i: { hypothesisId, eventAId: runEvents[0], eventBId: editEventId, confidence: 1 } });
});

afterAll(async () => {
  await server?.close();
  await smtp?.close();
  await s3?.close();
  if (s3Dir) await rm(s3Dir, { recursive: true, force: true });
});

describe('the permission matrix', () => {
  it('has an expectation for exactly the mutations of schema.graphql', () => {
    expect(Object.keys(CASES).sort()).toEqual([...MUTATIONS].sort());
  });

  // What each role's screens may offer, written out from the same SPEC.md descriptions.
  const EXPECTED_PERMISSIONS: Record<Role, string[]> = {
    ADMIN: ['PROJECT_READ', 'AUDIT_READ', 'STRATIGRAPHY_WRITE', 'AGE_MODEL_RUN', 'CORRELATION_WRITE', 'RECURRENCE_RUN', 'MEMBERS_MANAGE', 'RELEASE_CREATE', 'PROJECT_SETTINGS', 'RESULTS_REFRESH'],
    RESEARCHER: ['PROJECT_READ', 'AUDIT_READ', 'STRATIGRAPHY_WRITE', 'AGE_MODEL_RUN', 'RESULTS_REFRESH'],
    CORRELATOR: ['PROJECT_READ', 'AUDIT_READ', 'CORRELATION_WRITE', 'RESULTS_REFRESH'],
    ANALYST: ['PROJECT_READ', 'AUDIT_READ', 'RECURRENCE_RUN', 'RESULTS_REFRESH'],
    VIEWER: ['PROJECT_READ', 'AUDIT_READ'],
  };

  it.each(ROLES)('Project.myPermissions of a %s', async (role) => {
    const { project } = await clients[role].ok(`query($id: ID!) { project(id: $id) { myPermissions } }`, { id: fixture.projectId });
    expect([...project.myPermissions].sort()).toEqual([...EXPECTED_PERMISSIONS[role]].sort());
  });

  it('Project.myPermissions is not shown outside the project', async () => {
    const result = await clients.OUTSIDER.request(`query($id: ID!) { project(id: $id) { myPermissions } }`, { id: fixture.projectId });
    expect(result.errors?.[0]?.extensions?.code).toBe('NOT_FOUND');
  });

  it.each(pairs)('$name by $actor: $outcome', async ({ name, actor, outcome }) => {
    const { code, message } = await call(clients[actor], name);
    if (outcome === 'allowed') {
      expect(REFUSED, `${name} by ${actor} was refused: ${message}`).not.toContain(code);
      expect(code, message).toBe(CASES[name].allowedError);
    } else {
      expect(code, message ?? `${name} by ${actor} succeeded`).toBe(outcome);
    }
  });

  it.each(guarded)('%s without a token: UNAUTHENTICATED', async (name) => {
    expect((await call(anonymous, name)).code).toBe('UNAUTHENTICATED');
  });

  it.each(open)('%s without a token: not UNAUTHENTICATED (public)', async (name) => {
    const { code, message } = await call(anonymous, name);
    expect(REFUSED, message).not.toContain(code);
  });
});
