import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { CalibrationService } from '../calibration/calibration.service';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { requireVersionedUpdate } from '../common/versioned';
import { DatabaseService, Executor } from '../database/database.service';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { UnitRow, UnitsRepository } from '../units/units.repository';
import { stripUndefined } from '../units/units.service';
import { CreateSampleInput, UpdateSampleInput } from './dto/create-sample.input';
import { depthOutsideUnit, inheritanceScaleProblem, normaliseDeltaRSource } from './sample-rules';
import { SampleInsert, SampleRow, SamplesRepository } from './samples.repository';


@Injectable()
export class SamplesService {
  constructor(
    private readonly database: DatabaseService,
    private readonly samples: SamplesRepository,
    private readonly units: UnitsRepository,
    private readonly sites: SitesService,
    private readonly calibration: CalibrationService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  listForSite(siteId: string): Promise<SampleRow[]> {
    return this.samples.listForSite(siteId);
  }

  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<SampleRow> {
    const sample = await this.samples.findById(id);
    if (!sample) throw notFound('sample');
    await this.access.requireAccess({ user, permission, projectId: sample.projectId, objectName: 'sample' });
    return sample;
  }

  async create(user: AuthUser, input: CreateSampleInput): Promise<SampleRow> {
    const site = await this.sites.get(user, input.siteId, Permission.StratigraphyWrite);
    const { siteId: _siteId, ...fields } = input;
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const values = await this.prepare(tx, site, { excluded: false, ...fields });
        await this.checkLabCodeFree(site.projectId, values.labCode, tx);
        const sample = await this.samples.insert({ ...values, projectId: site.projectId, siteId: site.id }, tx);
        await this.audit.record(tx, {
          actor: user, projectId: site.projectId, action: 'create', objectType: 'sample', objectId: sample.id, after: sample,
        });
        return sample;
      }),
    );
  }

  async update(user: AuthUser, id: string, version: number, input: UpdateSampleInput): Promise<SampleRow> {
    const before = await this.get(user, id, Permission.StratigraphyWrite);
    const site = await this.sites.get(user, before.siteId, Permission.StratigraphyWrite);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const { id: _id, projectId: _p, siteId: _s, version: _v, createdAt: _c, updatedAt: _u, calibration: _cal, calibrationError: _e, ...stored } = before;
        const values = await this.prepare(tx, site, { ...stored, ...stripUndefined(input) });
        if (values.labCode !== before.labCode) await this.checkLabCodeFree(site.projectId, values.labCode, tx);
        const after = await requireVersionedUpdate(
          'sample',
          () => this.samples.update(id, version, values, tx),
          async () => (await this.samples.findById(id, tx))?.version,
          version,
        );
        await this.audit.record(tx, {
          actor: user, projectId: site.projectId, action: 'update', objectType: 'sample', objectId: id, before, after,
        });
        return after;
      }),
    );
  }

  async delete(user: AuthUser, id: string): Promise<boolean> {
    const before = await this.get(user, id, Permission.StratigraphyWrite);
    await this.database.transaction(async (tx) => {
      await this.samples.delete(id, tx);
      await this.audit.record(tx, { actor: user, projectId: before.projectId, action: 'delete', objectType: 'sample', objectId: id, before });
    });
    return true;
  }

  /** Check the sample against its site and unit, and compute its calibration. */
  private async prepare(
    tx: Executor,
    site: SiteRow,
    fields: Omit<SampleInsert, 'projectId' | 'siteId'>,
  ): Promise<Omit<SampleInsert, 'projectId' | 'siteId'> & { labCode: string }> {
    const unit = await this.units.findById(fields.unitId, tx);
    if (!unit || unit.siteId !== site.id) throw badInput('unitId', 'the unit must be a unit of this site');
    checkDepthInUnit(fields.depthM ?? null, unit);
    const scaleProblem = inheritanceScaleProblem(fields.inheritanceScaleYears);
    if (scaleProblem) throw badInput('inheritanceScaleYears', scaleProblem);
    const calibration = await this.calibration.calibrateSample({ ...fields, latitude: site.latitude });
    return {
      ...fields,
      deltaRSource: normaliseDeltaRSource(fields.deltaRSource),
      labCode: fields.labCode.trim(),
      calibration,
      calibrationError: null,
    };
  }

  private async checkLabCodeFree(projectId: string, labCode: string, tx: Executor): Promise<void> {
    const taken = await this.samples.existingLabCodes(projectId, [labCode], tx);
    if (taken.has(labCode)) throw badInput('labCode', `lab code ${labCode} is already used by another sample in this project`);
  }
}

/** A sample's depth, when given, lies within its unit. */
export function checkDepthInUnit(depthM: number | null, unit: UnitRow): void {
  const problem = depthOutsideUnit(depthM, unit);
  if (problem) throw badInput('depthM', problem);
}
