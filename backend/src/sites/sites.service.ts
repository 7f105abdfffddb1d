import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { requireVersionedUpdate } from '../common/versioned';
import { DatabaseService } from '../database/database.service';
import { SegmentsService } from '../segments/segments.service';
import { CreateSiteInput, UpdateSiteInput } from './dto/create-site.input';
import { SiteRow, SitesRepository } from './sites.repository';

@Injectable()
export class SitesService {
  constructor(
    private readonly database: DatabaseService,
    private readonly sites: SitesRepository,
    private readonly segments: SegmentsService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  listForProject(projectId: string): Promise<SiteRow[]> {
    return this.sites.listForProject(projectId);
  }

  listForSegment(segmentId: string): Promise<SiteRow[]> {
    return this.sites.listForSegment(segmentId);
  }

  findById(id: string): Promise<SiteRow | undefined> {
    return this.sites.findById(id);
  }

  /** A site the caller may act on with `permission`; NOT_FOUND for non-members. */
  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<SiteRow> {
    const site = await this.sites.findById(id);
    if (!site) throw notFound('site');
    await this.access.requireAccess({ user, permission, projectId: site.projectId, objectName: 'site' });
    return site;
  }

  async create(user: AuthUser, input: CreateSiteInput): Promise<SiteRow> {
    await this.access.requireAccess({ user, permission: Permission.StratigraphyWrite, projectId: input.projectId });
    await this.checkSegment(input.projectId, input.segmentId, input.alongStrikeKm);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const site = await this.sites.insert(input, tx);
        await this.audit.record(tx, {
          actor: user, projectId: site.projectId, action: 'create', objectType: 'site', objectId: site.id, after: site,
        });
        return site;
      }),
    );
  }

  async update(user: AuthUser, id: string, version: number, input: UpdateSiteInput): Promise<SiteRow> {
    const before = await this.get(user, id, Permission.StratigraphyWrite);
    // The position is checked against the segment the site will have, with what the update leaves as it was.
    await this.checkSegment(
      before.projectId,
      input.segmentId === undefined ? before.segmentId : input.segmentId,
      input.alongStrikeKm ?? before.alongStrikeKm,
    );
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const after = await requireVersionedUpdate(
          'site',
          () => this.sites.update(id, version, input, tx),
          async () => (await this.sites.findById(id, tx))?.version,
          version,
        );
        await this.audit.record(tx, {
          actor: user, projectId: after.projectId, action: 'update', objectType: 'site', objectId: id, before, after,
        });
        return after;
      }),
    );
  }

  /** Deleting a site removes its column, samples, runs and attachments with it (ON DELETE CASCADE). */
  async delete(user: AuthUser, id: string): Promise<boolean> {
    const before = await this.get(user, id, Permission.StratigraphyWrite);
    await this.database.transaction(async (tx) => {
      await this.sites.delete(id, tx);
      await this.audit.record(tx, {
        actor: user, projectId: before.projectId, action: 'delete', objectType: 'site', objectId: id, before,
      });
    });
    return true;
  }

  /**
   * A site's segment must belong to the same project, and the site's along-strike position must
   * lie within the segment's extent (ends included): a segment is known by its km extent, so a
   * site outside it would be counted in that segment's recurrence while drawn beyond it.
   */
  private async checkSegment(projectId: string, segmentId: string | null | undefined, alongStrikeKm: number): Promise<void> {
    if (!segmentId) return;
    const segment = await this.segments.findById(segmentId);
    if (!segment || segment.projectId !== projectId) throw badInput('segmentId', 'no such segment in this project');
    if (alongStrikeKm < segment.startKm || alongStrikeKm > segment.endKm) {
      throw badInput(
        'alongStrikeKm',
        `${alongStrikeKm} km lies outside segment ${segment.name} (${segment.startKm}–${segment.endKm} km along strike); choose a position inside it or another segment`,
      );
    }
  }
}
