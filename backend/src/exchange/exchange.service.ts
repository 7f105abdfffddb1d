import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { CalibrationService } from '../calibration/calibration.service';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { DatabaseService, Executor } from '../database/database.service';
import { validateBundle } from './bundle';
import { buildBundle } from './bundle-builder';
import { ProjectBundle } from './bundle-format';
import { CsvTable, isCsvTable, tableCsv } from './csv-tables';
import { ExchangeRepository, ProjectRow } from './exchange.repository';
import { sitesFeatureCollection, SiteFeatureCollection } from './geojson';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

@Injectable()
export class ExchangeService {
  constructor(
    private readonly database: DatabaseService,
    private readonly exchange: ExchangeRepository,
    private readonly calibration: CalibrationService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  /** The bundle of a project as it stands, read in the given transaction (releases) or on its own. */
  async bundleOf(projectId: string, executor?: Executor): Promise<ProjectBundle> {
    const records = await this.exchange.loadProjectRecords(projectId, executor);
    if (!records) throw notFound('project');
    return buildBundle(records, new Date());
  }

  /** Read one consistent snapshot of a project inside the open transaction; call it first in that transaction. */
  async snapshotOf(projectId: string, tx: Executor): Promise<ProjectBundle> {
    await this.exchange.useSnapshotIsolation(tx);
    return this.bundleOf(projectId, tx);
  }

  async exportBundle(user: AuthUser, projectId: string): Promise<{ bundle: ProjectBundle; project: ProjectRow }> {
    await this.requireRead(user, projectId);
    const bundle = await this.database.transaction((tx) => this.snapshotOf(projectId, tx));
    const project = (await this.exchange.findProject(projectId))!;
    return { bundle, project };
  }

  async exportCsv(user: AuthUser, projectId: string, table: string): Promise<{ csv: string; table: CsvTable }> {
    if (!isCsvTable(table)) throw notFound(`export table ${table}`);
    await this.requireRead(user, projectId);
    return { csv: tableCsv(await this.bundleOf(projectId), table), table };
  }

  async sitesGeoJson(user: AuthUser, projectId: string): Promise<SiteFeatureCollection> {
    await this.requireRead(user, projectId);
    const bundle = await this.bundleOf(projectId);
    const segmentName = new Map(bundle.segments.map((s) => [s.ref, s.name]));
    return sitesFeatureCollection(
      bundle.sites.map((s) => ({
        id: s.ref,
        name: s.name,
        kind: s.kind,
        latitude: s.latitude,
        longitude: s.longitude,
        alongStrikeKm: s.alongStrikeKm,
        segment: s.segmentRef ? (segmentName.get(s.segmentRef) ?? null) : null,
      })),
    );
  }

  /**
   * Import a bundle as a new project; the caller becomes its ADMIN. The whole bundle is validated
   * before anything is written, then written in one transaction. Samples are calibrated afresh;
   * one that cannot be (a curve this server lacks) is stored with its calibration error.
   */
  async importBundle(user: AuthUser, input: unknown): Promise<ProjectRow> {
    const result = validateBundle(input);
    if (!result.ok) {
      const [first] = result.problems;
      const summary = result.problems.slice(0, 10).map((p) => `${p.path || 'bundle'} ${p.message}`).join('; ');
      throw badInput(first.path || 'bundle', `the bundle is not valid: ${summary}`, { problems: result.problems });
    }
    const { bundle } = result;
    const calibrate = await this.calibration.sampleCalibrator();
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const project = await this.exchange.insertBundle(
          bundle,
          user.id,
          (sample, latitude) => {
            const outcome = calibrate({ ...sample, latitude });
            return 'field' in outcome ? { calibration: null, calibrationError: outcome.message } : { calibration: outcome, calibrationError: null };
          },
          tx,
        );
        await this.audit.record(tx, {
          actor: user,
          projectId: project.id,
          action: 'import',
          objectType: 'project',
          objectId: project.id,
          after: { project, counts: Object.fromEntries(countsOf(bundle)) },
        });
        return project;
      }),
    );
  }

  private async requireRead(user: AuthUser, projectId: string): Promise<void> {
    if (!UUID.test(projectId)) throw notFound('project');
    await this.access.requireAccess({ user, permission: Permission.ProjectRead, projectId });
  }
}

function countsOf(bundle: ProjectBundle): [string, number][] {
  return (['segments', 'sites', 'units', 'eventHorizons', 'samples', 'hypotheses', 'ties'] as const).map((t) => [t, bundle[t].length]);
}
