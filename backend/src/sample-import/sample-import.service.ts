import { Inject, Injectable } from '@nestjs/common';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { CalibrationService } from '../calibration/calibration.service';
import { SampleDating } from '../chronology/calibration/sample-calibration';
import { withConstraintErrors } from '../common/errors/database-errors';
import { badInput } from '../common/errors/domain-error';
import { APP_CONFIG, AppConfig } from '../config/config';
import { DatabaseService } from '../database/database.service';
import { ComputeTimedOut, runInThread } from '../jobs/compute-runner';
import { StoredCalibration } from '../database/schema';
import { SampleInsert, SamplesRepository } from '../samples/samples.repository';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { UnitsRepository } from '../units/units.repository';
import { ImportSamplesInput } from './dto/import-samples.input';
import { CheckedLabSheetRow, checkLabSheetRows, FieldProblem, LabSheetProblem, labSheetDatings, listedProblems, readLabSheet } from './lab-sheet';
import { labSheetCalibrationCompute } from './lab-sheet-calibration.compute';
import { sampleFormRules } from './sample-form-rules';

/** `ImportPreviewRow` of the schema. */
export interface ImportPreviewRow {
  row: number;
  labCode: string;
  unitName: string;
  medianCalBp: number | null;
  hpd95: StoredCalibration['hpd95'];
  warnings: string[];
}

/** `ImportResult` of the schema. */
export interface ImportResult {
  rowCount: number;
  errors: LabSheetProblem[];
  committed: boolean;
  preview: ImportPreviewRow[];
}

@Injectable()
export class SampleImportService {
  constructor(
    private readonly database: DatabaseService,
    private readonly sites: SitesService,
    private readonly units: UnitsRepository,
    private readonly samples: SamplesRepository,
    private readonly calibration: CalibrationService,
    private readonly audit: AuditService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /**
   * Check every row of a lab sheet for a site and, when asked and nothing is wrong, write all of
   * its samples in one transaction with one `import` audit record per sample (so each sample's
   * history starts where it came from, like a sample made in the form).
   */
  async importSamples(user: AuthUser, input: ImportSamplesInput): Promise<ImportResult> {
    const site = await this.sites.get(user, input.siteId, Permission.StratigraphyWrite);
    const reading = readLabSheet(input.csv);
    const labCodes = [...new Set(reading.samples.flatMap((sample) => (sample.labCode === null ? [] : [sample.labCode])))];
    const [units, calibrated, takenLabCodes] = await Promise.all([
      this.units.listForSite(site.id),
      this.calibrateSheet(labSheetDatings(reading, site.latitude)),
      this.samples.existingLabCodes(site.projectId, labCodes),
    ]);
    const calibrate = (_dating: SampleDating, row: number) => calibrated.get(row) as StoredCalibration | FieldProblem;
    const check = checkLabSheetRows<StoredCalibration>(reading, {
      units, takenLabCodes, latitude: site.latitude, calibrate, fieldRules: sampleFormRules,
    });
    const result: ImportResult = {
      rowCount: check.rowCount,
      errors: listedProblems(check.problems),
      committed: false,
      preview: check.accepted.map(previewRow),
    };
    if (!input.commit || check.problems.length > 0 || check.accepted.length === 0) return result;

    // A lab code taken between the check and this write hits the unique index and aborts it whole.
    const values = check.accepted.map((row) => sampleValues(site, row));
    await withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const written = await this.samples.insertManyReturningIds(values, tx);
        const valuesByLabCode = new Map(values.map((value) => [value.labCode, value]));
        await this.audit.recordMany(
          tx,
          written.map(({ id, labCode }) => {
            // The audit image leaves out the cached calibration, as AuditService does for single writes.
            const { calibration: _calibration, ...entered } = valuesByLabCode.get(labCode) as SampleInsert;
            return { actor: user, projectId: site.projectId, action: 'import', objectType: 'sample', objectId: id, after: { id, ...entered } };
          }),
        );
      }),
    );
    return { ...result, committed: true };
  }

  /**
   * Calibrate a sheet's datings in a thread, off the API's event loop, within
   * IMPORT_CALIBRATION_BUDGET_MS; a sheet that needs longer is refused whole (nothing is stored,
   * nothing is previewed) with a message saying so.
   */
  private async calibrateSheet(datings: { row: number; dating: SampleDating }[]): Promise<Map<number, StoredCalibration | FieldProblem>> {
    if (datings.length === 0) return new Map();
    const lookup = await this.calibration.curveLookup();
    const codes = new Set(datings.flatMap(({ dating }) => (dating.method === 'RADIOCARBON' && dating.curve?.trim() ? [dating.curve.trim()] : [])));
    const curves = [...codes].flatMap((code) => {
      const curve = lookup(code);
      return curve ? [{ code, curve }] : [];
    });
    const budgetMs = this.config.importCalibrationBudgetMs;
    try {
      const output = await runInThread(labSheetCalibrationCompute, { datings, curves }, {
        onProgress: () => undefined,
        shouldCancel: async () => false,
        timeLimitMs: budgetMs,
      });
      return new Map(output.map(({ row, result }) => [row, result]));
    } catch (error) {
      if (error instanceof ComputeTimedOut) {
        throw badInput(
          'csv',
          `calibrating this sheet's ${datings.length.toLocaleString('en')} datings took longer than the import allows ` +
            `(${budgetMs / 1000} s); nothing was imported. Split the sheet into smaller ones and import each.`,
        );
      }
      throw error;
    }
  }
}

function previewRow({ sample, unit, calibration }: CheckedLabSheetRow<StoredCalibration>): ImportPreviewRow {
  return {
    row: sample.row,
    labCode: sample.labCode,
    unitName: unit.name,
    medianCalBp: calibration.medianCalBp,
    hpd95: calibration.hpd95,
    warnings: calibration.warnings,
  };
}

function sampleValues(site: SiteRow, { sample, unit, calibration }: CheckedLabSheetRow<StoredCalibration>): SampleInsert {
  return {
    projectId: site.projectId,
    siteId: site.id,
    unitId: unit.id,
    labCode: sample.labCode,
    method: sample.method,
    material: sample.material,
    depthM: sample.depthM,
    ageRelation: sample.ageRelation,
    c14Age: sample.c14Age,
    c14Error: sample.c14Error,
    delta13C: sample.delta13C,
    curve: sample.curve,
    deltaR: sample.deltaR,
    deltaRError: sample.deltaRError,
    deltaRSource: sample.deltaRSource,
    inheritanceScaleYears: sample.inheritanceScaleYears,
    calendarAgeBp: sample.calendarAgeBp,
    calendarErrorYears: sample.calendarErrorYears,
    measurementYear: sample.measurementYear,
    excluded: sample.excluded,
    exclusionReason: sample.exclusionReason,
    notes: sample.notes,
    calibration,
    calibrationError: null,
  };
}
