import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { DatabaseService } from '../database/database.service';
import { BundleSegment, BundleSite } from '../exchange/bundle-format';
import { ExchangeService } from '../exchange/exchange.service';
import { CreateReleaseInput } from './dto/create-release.input';
import { diffSnapshots, RecordChange } from './release-diff';
import { ReleaseRow, ReleasesRepository, UserRow } from './releases.repository';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A site as it stood in a release, shaped like a site row so the `Site` type can show it. */
export type ReleaseSiteView = Omit<BundleSite, 'ref' | 'segmentRef'> & { id: string; projectId: string; segmentId: string | null };
export type ReleaseSegmentView = Omit<BundleSegment, 'ref'> & { id: string; projectId: string };

export interface ReleaseDiffView {
  from: ReleaseRow;
  to: ReleaseRow;
  changes: RecordChange[];
}

/**
 * Releases freeze a project's bundle under the next number. Nothing changes a release once
 * written: there is no update or delete, and its content comes only from its snapshot.
 */
@Injectable()
export class ReleasesService {
  constructor(
    private readonly database: DatabaseService,
    private readonly releases: ReleasesRepository,
    private readonly exchange: ExchangeService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  async create(user: AuthUser, input: CreateReleaseInput): Promise<ReleaseRow> {
    await this.access.requireAccess({ user, permission: Permission.ReleaseCreate, projectId: input.projectId });
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const snapshot = await this.exchange.snapshotOf(input.projectId, tx);
        const number = await this.releases.nextNumber(input.projectId, tx);
        const release = await this.releases.insert(
          { projectId: input.projectId, number, note: input.note.trim(), createdById: user.id, snapshot },
          tx,
        );
        await this.audit.record(tx, {
          actor: user,
          projectId: input.projectId,
          action: 'release',
          objectType: 'release',
          objectId: release.id,
          after: { id: release.id, number, note: release.note, sites: snapshot.sites.length, samples: snapshot.samples.length },
        });
        return release;
      }),
    );
  }

  async get(user: AuthUser, id: string): Promise<ReleaseRow> {
    const release = UUID.test(id) ? await this.releases.findById(id) : undefined;
    if (!release) throw notFound('release');
    await this.access.requireAccess({ user, permission: Permission.ProjectRead, projectId: release.projectId, objectName: 'release' });
    return release;
  }

  /** The parent project was already authorised. */
  listForProject(projectId: string): Promise<ReleaseRow[]> {
    return this.releases.listForProject(projectId);
  }

  async diff(user: AuthUser, fromId: string, toId: string): Promise<ReleaseDiffView> {
    const from = await this.get(user, fromId);
    const to = await this.get(user, toId);
    if (from.projectId !== to.projectId) throw badInput('toId', 'both releases must belong to one project');
    return { from, to, changes: diffSnapshots(from.snapshot, to.snapshot) };
  }

  /**
   * What changed in the project's live data since the release was frozen (empty when the data
   * are exactly as released). An analysis may cite a release only while this is empty.
   */
  async changesSince(releaseId: string): Promise<ReturnType<typeof diffSnapshots>> {
    const release = await this.releases.findById(releaseId);
    if (!release) throw notFound('release');
    return diffSnapshots(release.snapshot, await this.exchange.snapshotOf(release.projectId, this.database.db));
  }

  sitesOf(release: ReleaseRow): ReleaseSiteView[] {
    return release.snapshot.sites.map(({ ref, segmentRef, ...site }) => ({ ...site, id: ref, projectId: release.projectId, segmentId: segmentRef }));
  }

  segmentsOf(release: ReleaseRow): ReleaseSegmentView[] {
    return release.snapshot.segments.map(({ ref, ...segment }) => ({ ...segment, id: ref, projectId: release.projectId }));
  }

  /** Who froze the release; a placeholder when that account was since deleted. */
  async createdBy(release: ReleaseRow): Promise<UserRow> {
    const user = release.createdById ? await this.releases.findUser(release.createdById) : undefined;
    return user ?? { id: '00000000-0000-0000-0000-000000000000', email: '', displayName: 'deleted user', passwordHash: null, tokenEpoch: 0, createdAt: release.createdAt, updatedAt: release.createdAt };
  }
}
