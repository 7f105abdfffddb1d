import { beforeEach, describe, expect, it } from 'vitest';
import type { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import type { AuthUser } from '../auth/auth-user';
import type { CalibrationService } from '../calibration/calibration.service';
import { notFound } from '../common/errors/domain-error';
import { FakeAudit, fakeDatabase, FakeMemberships, FakeTable, refusalOf, userNamed } from '../common/testing/service-fakes';
import type { SiteRow } from '../sites/sites.repository';
import type { SitesService } from '../sites/sites.service';
import type { UnitRow, UnitsRepository } from '../units/units.repository';
import type { CreateSampleInput } from './dto/create-sample.input';
import type { SampleRow, SamplesRepository } from './samples.repository';
import { SamplesService } from './samples.service';

const P = 'project-p';
const SITES: SiteRow[] = [
  { id: 'site-a', projectId: P, name: 'Alder Marsh', latitude: -41 } as SiteRow,
  { id: 'site-b', projectId: P, name: 'Birch Marsh', latitude: -41 } as SiteRow,
];
/** Unit u1 of site A spans 1-2 m, u2 of site B 0-1 m. */
const UNITS: UnitRow[] = [
  { id: 'u1', siteId: 'site-a', name: 'Peat', topDepthM: 1, baseDepthM: 2 } as UnitRow,
  { id: 'u2', siteId: 'site-b', name: 'Sand', topDepthM: 0, baseDepthM: 1 } as UnitRow,
];
const CALIBRATED = { marker: 'calibrated by the fake' };

let samples: FakeTable<SampleRow>;
let audit: FakeAudit;
let service: SamplesService;
const researcher = userNamed('rene');
const viewer = userNamed('vic');
let nextId = 0;

function repository(): SamplesRepository {
  return {
    findById: async (id: string) => samples.rows.get(id),
    existingLabCodes: async (projectId: string, codes: string[]) =>
      new Set(samples.all().filter((row) => row.projectId === projectId && codes.includes(row.labCode)).map((row) => row.labCode)),
    insert: async (values: Partial<SampleRow>) => {
      const row = { ...values, id: `sample-${++nextId}`, version: 1 } as SampleRow;
      samples.rows.set(row.id, row);
      return row;
    },
    update: async (id: string, version: number, values: Partial<SampleRow>) => {
      const row = samples.rows.get(id);
      if (!row || row.version !== version) return undefined;
      const updated = { ...row, ...values, version: version + 1 } as SampleRow;
      samples.rows.set(id, updated);
      return updated;
    },
    delete: async (id: string) => {
      samples.rows.delete(id);
    },
  } as unknown as SamplesRepository;
}

/** `SitesService.get` as the service relies on it: the site, after the real access check. */
function sitesService(access: AccessService): SitesService {
  return {
    get: async (user: AuthUser, id: string, permission: Permission) => {
      const site = SITES.find((s) => s.id === id);
      if (!site) throw notFound('site');
      await access.requireAccess({ user, permission, projectId: site.projectId, objectName: 'site' });
      return site;
    },
  } as unknown as SitesService;
}

function input(extra: Partial<CreateSampleInput> = {}): CreateSampleInput {
  return {
    siteId: 'site-a', unitId: 'u1', labCode: 'LAB-1', method: 'RADIOCARBON', material: 'IN_SITU_PLANT', depthM: 1.5,
    ageRelation: 'DATES_DEPOSIT', c14Age: 1200, c14Error: 30, curve: 'INTCAL20', ...extra,
  } as CreateSampleInput;
}

beforeEach(() => {
  samples = new FakeTable<SampleRow>();
  audit = new FakeAudit();
  const memberships = new FakeMemberships();
  memberships.set(researcher.id, P, 'RESEARCHER');
  memberships.set(viewer.id, P, 'VIEWER');
  const access = memberships.accessService();
  const units = { findById: async (id: string) => UNITS.find((u) => u.id === id) } as unknown as UnitsRepository;
  const calibration = { calibrateSample: async () => CALIBRATED } as unknown as CalibrationService;
  service = new SamplesService(fakeDatabase([samples]), repository(), units, sitesService(access), calibration, access, audit.service());
});

describe(SamplesService.name, () => {
  it('stores a sample of its site with its calibration and trimmed lab code, and audits it', async () => {
    const sample = await service.create(researcher, input({ labCode: '  LAB-1 ' }));
    expect(samples.all()).toEqual([expect.objectContaining({ id: sample.id, projectId: P, siteId: 'site-a', unitId: 'u1', labCode: 'LAB-1', calibration: CALIBRATED })]);
    expect(audit.entries).toEqual([expect.objectContaining({ action: 'create', objectType: 'sample', objectId: sample.id, projectId: P })]);
  });

  it.each([
    ['a unit of another site', { unitId: 'u2' }, 'unitId'],
    ['a depth outside its unit', { depthM: 3.5 }, 'depthM'],
  ])('refuses %s, naming the field, and stores nothing', async (_what, extra, field) => {
    expect(await refusalOf(() => service.create(researcher, input(extra)))).toMatchObject({ code: 'BAD_USER_INPUT', field });
    expect(samples.all()).toEqual([]);
    expect(audit.entries).toEqual([]);
  });

  it('refuses a lab code already used in the project, on create and when an edit changes it', async () => {
    await service.create(researcher, input({ labCode: 'LAB-1' }));
    const second = await service.create(researcher, input({ labCode: 'LAB-2' }));
    expect(await refusalOf(() => service.create(researcher, input({ labCode: 'LAB-1' })))).toMatchObject({ code: 'BAD_USER_INPUT', field: 'labCode' });
    expect(await refusalOf(() => service.update(researcher, second.id, 1, { labCode: 'LAB-1' }))).toMatchObject({ code: 'BAD_USER_INPUT', field: 'labCode' });
    expect(samples.rows.get(second.id)!.labCode).toBe('LAB-2');
    // Keeping its own code is no clash.
    expect((await service.update(researcher, second.id, 1, { labCode: 'LAB-2', depthM: 1.2 })).depthM).toBe(1.2);
  });

  it('refuses an edit of a version someone else has changed (CONFLICT), keeping their change', async () => {
    const sample = await service.create(researcher, input());
    await service.update(researcher, sample.id, 1, { depthM: 1.1 });
    expect((await refusalOf(() => service.update(researcher, sample.id, 1, { depthM: 1.9 }))).code).toBe('CONFLICT');
    expect(samples.rows.get(sample.id)).toMatchObject({ version: 2, depthM: 1.1 });
  });

  it('refuses a viewer (FORBIDDEN) on create, edit and delete', async () => {
    const sample = await service.create(researcher, input());
    expect((await refusalOf(() => service.create(viewer, input({ labCode: 'LAB-9' })))).code).toBe('FORBIDDEN');
    expect((await refusalOf(() => service.update(viewer, sample.id, 1, { depthM: 1.2 }))).code).toBe('FORBIDDEN');
    expect((await refusalOf(() => service.delete(viewer, sample.id))).code).toBe('FORBIDDEN');
    expect(samples.all()).toHaveLength(1);
  });
});
