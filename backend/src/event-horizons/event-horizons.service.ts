import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { requireVersionedUpdate } from '../common/versioned';
import { DatabaseService, Executor } from '../database/database.service';
import { SitesService } from '../sites/sites.service';
import { UnitsRepository } from '../units/units.repository';
import { CreateEventHorizonInput, UpdateEventHorizonInput } from './dto/create-event-horizon.input';
import { EventHorizonRow, EventHorizonsRepository } from './event-horizons.repository';

@Injectable()
export class EventHorizonsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly eventHorizons: EventHorizonsRepository,
    private readonly units: UnitsRepository,
    private readonly sites: SitesService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  listForSite(siteId: string): Promise<EventHorizonRow[]> {
    return this.eventHorizons.listForSite(siteId);
  }

  findById(id: string): Promise<EventHorizonRow | undefined> {
    return this.eventHorizons.findById(id);
  }

  findByIds(ids: string[]): Promise<EventHorizonRow[]> {
    return this.eventHorizons.findByIds(ids);
  }

  async get(user: AuthUser, id: string, permission = Permission.ProjectRead) {
    const found = await this.eventHorizons.findWithProject(id);
    if (!found) throw notFound('event horizon');
    await this.access.requireAccess({ user, permission, projectId: found.projectId, objectName: 'event horizon' });
    return found;
  }

  async create(user: AuthUser, input: CreateEventHorizonInput): Promise<EventHorizonRow> {
    const site = await this.sites.get(user, input.siteId, Permission.StratigraphyWrite);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        await this.checkBoundingUnits(tx, site.id, input.unitBelowId, input.unitAboveId);
        const row = await this.eventHorizons.insert({ ...input, evidence: input.evidence ?? [] }, tx);
        await this.audit.record(tx, {
          actor: user, projectId: site.projectId, action: 'create', objectType: 'eventHorizon', objectId: row.id, after: row,
        });
        return row;
      }),
    );
  }

  async update(user: AuthUser, id: string, version: number, input: UpdateEventHorizonInput): Promise<EventHorizonRow> {
    const { eventHorizon: before, projectId } = await this.get(user, id, Permission.StratigraphyWrite);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        await this.checkBoundingUnits(tx, before.siteId, input.unitBelowId ?? before.unitBelowId, input.unitAboveId ?? before.unitAboveId);
        const after = await requireVersionedUpdate(
          'event horizon',
          () => this.eventHorizons.update(id, version, input, tx),
          async () => (await this.eventHorizons.findById(id, tx))?.version,
          version,
        );
        await this.audit.record(tx, { actor: user, projectId, action: 'update', objectType: 'eventHorizon', objectId: id, before, after });
        return after;
      }),
    );
  }

  async delete(user: AuthUser, id: string): Promise<boolean> {
    const { eventHorizon: before, projectId } = await this.get(user, id, Permission.StratigraphyWrite);
    await this.database.transaction(async (tx) => {
      await this.eventHorizons.delete(id, tx);
      await this.audit.record(tx, { actor: user, projectId, action: 'delete', objectType: 'eventHorizon', objectId: id, before });
    });
    return true;
  }

  /** An event horizon is the contact between two adjacent units of its own site. */
  private async checkBoundingUnits(tx: Executor, siteId: string, unitBelowId: string, unitAboveId: string): Promise<void> {
    const below = await this.units.findById(unitBelowId, tx);
    if (!below || below.siteId !== siteId) throw badInput('unitBelowId', 'the unit below must be a unit of this site');
    const above = await this.units.findById(unitAboveId, tx);
    if (!above || above.siteId !== siteId) throw badInput('unitAboveId', 'the unit above must be a unit of this site');
    if (above.position !== below.position + 1) {
      throw badInput(
        'unitAboveId',
        `an event horizon lies between adjacent units: "${above.name}" (position ${above.position}) does not directly overlie "${below.name}" (position ${below.position})`,
      );
    }
  }
}
