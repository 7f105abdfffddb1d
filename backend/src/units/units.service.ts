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
        const { makeRoom, ...values } = input;
        const existing = await this.units.listForSite(site.id, tx);
        const others = makeRoom ? shiftedFrom(existing, values.position) : existing;
        const violation = checkUnitPlacement(others, values);
        if (violation) throw badInput(violation.field, violation.message);
        const moved = makeRoom && existing.some((u) => u.position >= values.position)
          ? await this.units.shiftUp(site.id, values.position, tx)
          : [];
        const unit = await this.units.insert(values, tx);
        await this.audit.recordMany(tx, [
          { actor: user, projectId: site.projectId, action: 'create', objectType: 'unit', objectId: unit.id, after: unit },
          ...moved.map((after) => {
            const before = existing.find((u) => u.id === after.id);
            return {
              actor: user, projectId: site.projectId, action: 'update' as const, objectType: 'unit', objectId: after.id,
              before: before && { position: before.position, version: before.version },
              after: { position: after.position, version: after.version, reason: `renumbered to make room for "${unit.name}"` },
            };
          }),
        ]);
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

/** The column as it would stand once every unit at `position` or above moved up one. */
export function shiftedFrom<T extends { position: number }>(units: readonly T[], position: number): T[] {
  return units.map((u) => (u.position >= position ? { ...u, position: u.position + 1 } : u));
}

/** Drop keys the client left out, so a partial update does not blank stored values. */
export function stripUndefined<T extends object>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}
