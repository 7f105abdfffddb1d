import { beforeEach, describe, expect, it } from 'vitest';
import { FakeAudit, fakeDatabase, FakeMemberships, FakeTable, refusalOf, userNamed } from '../common/testing/service-fakes';
import type { SegmentsService } from '../segments/segments.service';
import type { SiteRow, SitesRepository } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import type { AgeModelRunRow, AgeModelRunsRepository, DownstreamRunChoiceRow } from './age-model-runs.repository';
import { AgeModelsService } from './age-models.service';

const P = 'project-p';
const Q = 'project-q';

const SITES = [
  { id: 'kelp', projectId: P, name: 'Kelp Terrace' },
  { id: 'ngaio', projectId: P, name: 'Ngaio Swamp' },
  { id: 'far', projectId: Q, name: 'Far Bog' },
] as SiteRow[];

const RUNS = [
  { id: 'kelp-old', siteId: 'kelp', status: 'SUCCEEDED' },
  { id: 'kelp-new', siteId: 'kelp', status: 'SUCCEEDED' },
  { id: 'kelp-failed', siteId: 'kelp', status: 'FAILED' },
  { id: 'kelp-cancelled', siteId: 'kelp', status: 'CANCELLED' },
  { id: 'kelp-queued', siteId: 'kelp', status: 'QUEUED' },
  { id: 'ngaio-run', siteId: 'ngaio', status: 'SUCCEEDED' },
  { id: 'far-run', siteId: 'far', status: 'SUCCEEDED' },
] as AgeModelRunRow[];

type Choice = DownstreamRunChoiceRow & { id: string };

let choices: FakeTable<Choice>;
let audit: FakeAudit;
let service: AgeModelsService;
const researcher = userNamed('rua');
const correlator = userNamed('cora');
const outsider = userNamed('otto');

function runsRepository(): AgeModelRunsRepository {
  return {
    findById: async (id: string) => RUNS.find((run) => run.id === id),
    choiceOf: async (siteId: string) => choices.rows.get(siteId),
    saveChoice: async (values: DownstreamRunChoiceRow) => {
      const row = { ...values, id: values.siteId, chosenAt: new Date('2026-12-05T12:00:00Z') };
      choices.rows.set(row.id, row);
      return row;
    },
    deleteChoice: async (siteId: string) => {
      const row = choices.rows.get(siteId);
      choices.rows.delete(siteId);
      return row;
    },
    moveChoice: async (from: string, to: string) => {
      const row = choices.all().find((choice) => choice.ageModelRunId === from);
      if (!row) return undefined;
      choices.rows.set(row.id, { ...row, ageModelRunId: to });
      return choices.rows.get(row.id);
    },
  } as unknown as AgeModelRunsRepository;
}

beforeEach(() => {
  choices = new FakeTable<Choice>();
  audit = new FakeAudit();
  const access = new FakeMemberships();
  access.set(researcher.id, P, 'RESEARCHER');
  access.set(correlator.id, P, 'CORRELATOR');
  access.set(outsider.id, Q, 'ADMIN');
  const sitesRepository = { findById: async (id: string) => SITES.find((site) => site.id === id) } as unknown as SitesRepository;
  const database = fakeDatabase([choices]);
  const sites = new SitesService(database, sitesRepository, {} as SegmentsService, access.accessService(), audit.service());
  const none = {} as never;
  service = new AgeModelsService(database, runsRepository(), sites, none, none, none, none, none, none, access.accessService(), audit.service());
});

const choose = (runId: string | null, user = researcher, siteId = 'kelp') => service.chooseDownstreamRun(user, { siteId, runId });

describe(`${AgeModelsService.name}.chooseDownstreamRun`, () => {
  it('stores the chosen run for the site and audits the change', async () => {
    await choose('kelp-old');
    expect(choices.all()).toEqual([expect.objectContaining({ siteId: 'kelp', ageModelRunId: 'kelp-old', chosenById: researcher.id })]);
    expect(audit.entries).toEqual([
      expect.objectContaining({ actor: researcher, projectId: P, action: 'update', objectType: 'downstreamRunChoice', objectId: 'kelp', before: null, after: expect.objectContaining({ ageModelRunId: 'kelp-old' }) }),
    ]);
  });

  it('replaces a choice, and clears it (back to the newest) with the removal audited', async () => {
    await choose('kelp-old');
    await choose('kelp-new');
    expect(choices.all().map((c) => c.ageModelRunId)).toEqual(['kelp-new']);
    await choose(null);
    expect(choices.all()).toEqual([]);
    expect(audit.entries.map((e) => e.action)).toEqual(['update', 'update', 'delete']);
    expect(audit.entries[2]).toMatchObject({ before: expect.objectContaining({ ageModelRunId: 'kelp-new' }), after: null });
  });

  it('writes and records nothing when the choice does not change', async () => {
    await choose(null);
    await choose('kelp-old');
    await choose('kelp-old');
    expect(audit.entries).toHaveLength(1);
  });

  it.each([
    ['a run of another site', 'ngaio-run', /not an age model run of site Kelp Terrace/],
    ['a run of another project', 'far-run', /not an age model run of site Kelp Terrace/],
    ['an unknown run', 'no-such-run', /not an age model run of site Kelp Terrace/],
    ['a failed run', 'kelp-failed', /only a successful run.*failed/],
    ['a cancelled run', 'kelp-cancelled', /only a successful run.*cancelled/],
    ['a run not yet ended', 'kelp-queued', /only a successful run.*queued/],
  ])('refuses %s on runId and changes nothing', async (_what, runId, message) => {
    await choose('kelp-old');
    const refused = await refusalOf(() => choose(runId));
    expect(refused).toMatchObject({ code: 'BAD_USER_INPUT', field: 'runId' });
    expect(refused.message).toMatch(message);
    expect(choices.all().map((c) => c.ageModelRunId)).toEqual(['kelp-old']);
    expect(audit.entries).toHaveLength(1);
  });

  it('refuses a role that may not run age models (FORBIDDEN) and a member of another project (NOT_FOUND)', async () => {
    expect((await refusalOf(() => choose('kelp-old', correlator))).code).toBe('FORBIDDEN');
    expect((await refusalOf(() => choose('kelp-old', outsider))).code).toBe('NOT_FOUND');
    expect((await refusalOf(() => choose(null, correlator))).code).toBe('FORBIDDEN');
    expect(choices.all()).toEqual([]);
    expect(audit.entries).toEqual([]);
  });
});

describe(`${AgeModelsService.name}.carryChoice`, () => {
  it("moves a chosen run's choice to its fresh run, audited; a run nobody chose moves nothing", async () => {
    await choose('kelp-old');
    await service.carryChoice(researcher, 'kelp-new', 'kelp-fresh');
    expect(choices.all().map((c) => c.ageModelRunId)).toEqual(['kelp-old']);
    expect(audit.entries).toHaveLength(1);
    await service.carryChoice(researcher, 'kelp-old', 'kelp-fresh');
    expect(choices.all().map((c) => c.ageModelRunId)).toEqual(['kelp-fresh']);
    expect(audit.entries[1]).toMatchObject({ action: 'update', objectType: 'downstreamRunChoice', objectId: 'kelp', projectId: P, after: expect.objectContaining({ ageModelRunId: 'kelp-fresh', carriedByRefresh: true }) });
  });
});
