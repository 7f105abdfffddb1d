import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { DatabaseService } from '../database/database.service';
import { BundleEventHorizon, BundleSample, BundleSegment, BundleSite, BundleUnit } from '../exchange/bundle-format';
import { ExchangeService } from '../exchange/exchange.service';
import { CreateReleaseInput } from './dto/create-release.input';
import { diffSnapshots, RecordChange } from './release-diff';
import { ReleaseRow, ReleasesRepository, UserRow } from './releases.repository';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** `ReleasedSegment`: a segment as it stood in a release. */
export type ReleasedSegmentView = Omit<BundleSegment, 'ref'> & { id: string };
export type ReleasedUnitView = Omit<BundleUnit, 'ref' | 'siteRef'> & { id: string };
export type ReleasedEventHorizonView = Omit<BundleEventHorizon, 'ref' | 'siteRef' | 'unitBelowRef' | 'unitAboveRef'> & {
  id: string;
  unitBelowId: string;
  unitAboveId: string;
};
export type ReleasedSampleView = Omit<BundleSample, 'ref' | 'siteRef' | 'unitRef'> & { id: string; unitId: string };
/** `ReleasedSite`: a site as it stood in a release, with its column and samples, all from the snapshot. */
export type ReleasedSiteView = Omit<BundleSite, 'ref' | 'segmentRef'> & {
  id: string;
  segment: ReleasedSegmentView | null;
  units: ReleasedUnitView[];
  eventHorizons: ReleasedEventHorizonView[];
  samples: ReleasedSampleView[];
};

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

  /** The frozen sites with everything below them, read from the snapshot alone. */
  sitesOf(release: ReleaseRow): ReleasedSiteView[] {
    const { snapshot } = release;
    const segments = new Map(this.segmentsOf(release).map((segment) => [segment.id, segment]));
    const bySite = <T extends { siteRef: string }>(rows: T[]) => {
      const grouped = new Map<string, T[]>();
      for (const row of rows) {
        const list = grouped.get(row.siteRef);
        if (list) list.push(row);
        else grouped.set(row.siteRef, [row]);
      }
      return grouped;
    };
    const units = bySite(snapshot.units);
    const horizons = bySite(snapshot.eventHorizons);
    const samples = bySite(snapshot.samples);
    return snapshot.sites.map(({ ref, segmentRef, ...site }) => {
      const siteUnits = (units.get(ref) ?? []).sort((a, b) => a.position - b.position);
      const position = new Map(siteUnits.map((unit) => [unit.ref, unit.position]));
      const positionOf = (unitRef: string) => position.get(unitRef) ?? Number.MAX_SAFE_INTEGER;
      return {
        ...site,
        id: ref,
        segment: segmentRef ? (segments.get(segmentRef) ?? null) : null,
        units: siteUnits.map(({ ref: id, siteRef: _site, ...unit }) => ({ ...unit, id })),
        eventHorizons: (horizons.get(ref) ?? [])
          .sort((a, b) => positionOf(a.unitBelowRef) - positionOf(b.unitBelowRef) || a.name.localeCompare(b.name))
          .map(({ ref: id, siteRef: _site, unitBelowRef, unitAboveRef, ...horizon }) => ({ ...horizon, id, unitBelowId: unitBelowRef, unitAboveId: unitAboveRef })),
        samples: (samples.get(ref) ?? [])
          .sort((a, b) => positionOf(a.unitRef) - positionOf(b.unitRef) || a.labCode.localeCompare(b.labCode))
          .map(({ ref: id, siteRef: _site, unitRef, ...sample }) => ({ ...sample, id, unitId: unitRef })),
      };
    });
  }

  segmentsOf(release: ReleaseRow): ReleasedSegmentView[] {
    return release.snapshot.segments.map(({ ref, ...segment }) => ({ ...segment, id: ref }));
  }

  /** Who froze the release; a placeholder when that account was since deleted. */
  async createdBy(release: ReleaseRow): Promise<UserRow> {
    const user = release.createdById ? await this.releases.findUser(release.createdById) : undefined;
    return user ?? { id: '00000000-0000-0000-0000-000000000000', email: '', displayName: 'deleted user', passwordHash: null, tokenEpoch: 0, createdAt: release.createdAt, updatedAt: release.createdAt };
  }
}
