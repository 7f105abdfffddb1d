import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { requireVersionedUpdate } from '../common/versioned';
import { DatabaseService } from '../database/database.service';
import { CreateSegmentInput, UpdateSegmentInput } from './dto/create-segment.input';
import { SegmentRow, SegmentsRepository } from './segments.repository';

@Injectable()
export class SegmentsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly segments: SegmentsRepository,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  listForProject(projectId: string): Promise<SegmentRow[]> {
    return this.segments.listForProject(projectId);
  }

  findById(id: string): Promise<SegmentRow | undefined> {
    return this.segments.findById(id);
  }

  /** A segment the caller may act on with `permission`; NOT_FOUND for non-members. */
  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<SegmentRow> {
    const segment = await this.segments.findById(id);
    if (!segment) throw notFound('segment');
    await this.access.requireAccess({ user, permission, projectId: segment.projectId, objectName: 'segment' });
    return segment;
  }

  async create(user: AuthUser, input: CreateSegmentInput): Promise<SegmentRow> {
    await this.access.requireAccess({ user, permission: Permission.StratigraphyWrite, projectId: input.projectId });
    checkExtent(input.startKm, input.endKm);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const segment = await this.segments.insert(input, tx);
        await this.audit.record(tx, {
          actor: user, projectId: segment.projectId, action: 'create', objectType: 'segment', objectId: segment.id, after: segment,
        });
        return segment;
      }),
    );
  }

  async update(user: AuthUser, id: string, version: number, input: UpdateSegmentInput): Promise<SegmentRow> {
    const before = await this.get(user, id, Permission.StratigraphyWrite);
    checkExtent(input.startKm ?? before.startKm, input.endKm ?? before.endKm);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const after = await requireVersionedUpdate(
          'segment',
          () => this.segments.update(id, version, input, tx),
          async () => (await this.segments.findById(id, tx))?.version,
          version,
        );
        await this.audit.record(tx, {
          actor: user, projectId: after.projectId, action: 'update', objectType: 'segment', objectId: id, before, after,
        });
        return after;
      }),
    );
  }

  async delete(user: AuthUser, id: string): Promise<boolean> {
    const before = await this.get(user, id, Permission.StratigraphyWrite);
    await this.database.transaction(async (tx) => {
      await this.segments.delete(id, tx);
      await this.audit.record(tx, {
        actor: user, projectId: before.projectId, action: 'delete', objectType: 'segment', objectId: id, before,
      });
    });
    return true;
  }
}

function checkExtent(startKm: number, endKm: number): void {
  if (!(endKm > startKm)) throw badInput('endKm', `endKm (${endKm}) must be greater than startKm (${startKm})`);
}
