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
import { ColumnChoicesRepository } from './column-choices.repository';
import { ImportSamplesInput, LabSheetColumnChoiceInput } from './dto/import-samples.input';
import {
  CheckedLabSheetRow,
  checkLabSheetRows,
  FieldProblem,
  HeaderChoice,
  headerKey,
  LabSheetHeaderColumn,
  LabSheetProblem,
  labSheetDatings,
  listedProblems,
  readLabSheet,
} from './lab-sheet';
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

/** `ImportRowError` of the schema. */
export interface ImportProblem extends LabSheetProblem {
  scope: 'HEADER' | 'SHEET' | 'ROW';
}

/** `ImportResult` of the schema. */
export interface ImportResult {
  rowCount: number;
  errors: ImportProblem[];
  columns: LabSheetHeaderColumn[];
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
    private readonly columnChoices: ColumnChoicesRepository,
  ) {}

  /**
   * Check every row of a lab sheet for a site and, when asked and nothing is wrong, write all of
   * its samples in one transaction with one `import` audit record per sample (so each sample's
   * history starts where it came from, like a sample made in the form).
   */
  async importSamples(user: AuthUser, input: ImportSamplesInput): Promise<ImportResult> {
    const site = await this.sites.get(user, input.siteId, Permission.StratigraphyWrite);
    const chosen = readChoices(input.columnChoices ?? []);
    const remembered = await this.columnChoices.listForProject(site.projectId);
    const choices = new Map<string, HeaderChoice>([
      ...remembered.map((row): [string, HeaderChoice] => [row.headerKey, { field: row.field as HeaderChoice['field'], source: 'REMEMBERED' }]),
      ...[...chosen].map(([key, { field }]): [string, HeaderChoice] => [key, { field, source: 'CHOSEN' }]),
    ]);
    const reading = readLabSheet(input.csv, choices);
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
      errors: listedProblems(check.problems).map(withScope),
      columns: reading.columns,
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
        // The header choices this sheet was read with are remembered for the project's next sheets,
        // only for headers the sheet has (a stray choice for another sheet is not stored).
        const used = reading.columns.filter((column) => column.source === 'CHOSEN');
        if (used.length > 0) {
          await this.columnChoices.upsert(
            used.map((column) => ({ projectId: site.projectId, headerKey: headerKey(column.header), header: column.header, field: column.field, chosenBy: user.id })),
            tx,
          );
          await this.audit.record(tx, {
            actor: user, projectId: site.projectId, action: 'update', objectType: 'labSheetColumnChoices', objectId: site.projectId,
            after: Object.fromEntries(used.map((column) => [column.header, column.field])),
          });
        }
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

/** The request's header choices by header key; two choices for one header are refused. */
function readChoices(inputs: readonly LabSheetColumnChoiceInput[]): Map<string, { field: HeaderChoice['field'] }> {
  const byKey = new Map<string, { header: string; field: HeaderChoice['field'] }>();
  for (const input of inputs) {
    const key = headerKey(input.header);
    if (key === '') throw badInput('columnChoices', 'a header choice needs a header name');
    const earlier = byKey.get(key);
    if (earlier && earlier.field !== (input.field ?? null)) {
      throw badInput('columnChoices', `header "${input.header}" is given two fields (${earlier.field ?? 'ignore'} and ${input.field ?? 'ignore'})`);
    }
    byKey.set(key, { header: input.header, field: input.field ?? null });
  }
  return byKey;
}

function withScope(problem: LabSheetProblem): ImportProblem {
  return { ...problem, scope: problem.row > 0 ? 'ROW' : problem.field === 'csv' ? 'SHEET' : 'HEADER' };
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
