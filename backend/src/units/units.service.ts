import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { requireVersionedUpdate } from '../common/versioned';
import { DatabaseService } from '../database/database.service';
import { SitesService } from '../sites/sites.service';
import { checkUnitPlacement } from './column-rules';
import { CreateUnitInput, UpdateUnitInput } from './dto/create-unit.input';
import { UnitRow, UnitsRepository } from './units.repository';

@Injectable()
export class UnitsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly units: UnitsRepository,
    private readonly sites: SitesService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  listForSite(siteId: string): Promise<UnitRow[]> {
    return this.units.listForSite(siteId);
  }

  findById(id: string): Promise<UnitRow | undefined> {
    return this.units.findById(id);
  }

  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<{ unit: UnitRow; projectId: string }> {
    const found = await this.units.findWithProject(id);
    if (!found) throw notFound('unit');
    await this.access.requireAccess({ user, permission, projectId: found.projectId, objectName: 'unit' });
    return found;
  }

  async create(user: AuthUser, input: CreateUnitInput): Promise<UnitRow> {
    const site = await this.sites.get(user, input.siteId, Permission.StratigraphyWrite);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const others = await this.units.listForSite(site.id, tx);
        const violation = checkUnitPlacement(others, input);
        if (violation) throw badInput(violation.field, violation.message);
        const unit = await this.units.insert(input, tx);
        await this.audit.record(tx, {
          actor: user, projectId: site.projectId, action: 'create', objectType: 'unit', objectId: unit.id, after: unit,
        });
        return unit;
      }),
    );
  }

  async update(user: AuthUser, id: string, version: number, input: UpdateUnitInput): Promise<UnitRow> {
    const { unit: before, projectId } = await this.get(user, id, Permission.StratigraphyWrite);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const others = await this.units.listForSite(before.siteId, tx);
        const violation = checkUnitPlacement(others, { ...before, ...stripUndefined(input) });
        if (violation) throw badInput(violation.field, violation.message);
        const after = await requireVersionedUpdate(
          'unit',
          () => this.units.update(id, version, input, tx),
          async () => (await this.units.findById(id, tx))?.version,
          version,
        );
        await this.audit.record(tx, { actor: user, projectId, action: 'update', objectType: 'unit', objectId: id, before, after });
        return after;
      }),
    );
  }

  /** Refused (CONFLICT) while event horizons or samples still refer to the unit (ON DELETE RESTRICT). */
  async delete(user: AuthUser, id: string): Promise<boolean> {
    const { unit: before, projectId } = await this.get(user, id, Permission.StratigraphyWrite);
    await withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        await this.units.delete(id, tx);
        await this.audit.record(tx, { actor: user, projectId, action: 'delete', objectType: 'unit', objectId: id, before });
      }),
    );
    return true;
  }
}

/** Drop keys the client left out, so a partial update does not blank stored values. */
export function stripUndefined<T extends object>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}
