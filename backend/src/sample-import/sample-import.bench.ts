/**
 * Speed of lab-sheet checking, for the bench script to print. Not a test: timing depends on the
 * machine, so nothing here asserts a figure.
 */
import { CalibrationInputError } from '../chronology/calibration/errors';
import { calibrationForSample, CurveLookup, SampleDating } from '../chronology/calibration/sample-calibration';
import { SeededRandom } from '../chronology/common/random';
import { builtInCurve, isBuiltInCurve } from '../reference-data/reference-data';
import { checkLabSheet, FieldProblem, LAB_SHEET_COLUMNS, LabSheetCalibration, LabSheetUnit } from './lab-sheet';
import { sampleFormRules } from './sample-form-rules';

export interface LabSheetBenchFigures {
  readonly rows: number;
  readonly sheetMegabytes: number;
  /** Wall-clock seconds to read, check and calibrate every row. */
  readonly seconds: number;
  readonly rowsPerSecond: number;
  /** CPU seconds of this process over the same span. */
  readonly cpuSeconds: number;
}

const UNITS: LabSheetUnit[] = Array.from({ length: 12 }, (_, i) => ({
  id: `unit-${i + 1}`, name: `unit ${i + 1}`, position: i + 1, topDepthM: 11 - i, baseDepthM: 12 - i,
}));

/**
 * An invented sheet of `rows` samples: mostly radiocarbon on IntCal20 (some Marine20 with a
 * Delta-R), a tenth luminescence, spread over 500-12,000 14C yr BP and twelve units.
 */
export function inventedLabSheet(rows: number, seed = 31_415): string {
  const random = new SeededRandom(seed);
  const lines = [LAB_SHEET_COLUMNS.join(',')];
  for (let i = 0; i < rows; i++) {
    const unit = 1 + random.integer(12);
    const depth = (12 - unit + 0.05 + 0.9 * random.uniform()).toFixed(3);
    const cells: Record<string, string> = { labCode: `BENCH-${i + 1}`, unit: String(unit), depthM: depth };
    if (i % 10 === 9) {
      Object.assign(cells, {
        method: 'LUMINESCENCE', material: 'OTHER', calendarAgeBp: String(Math.round(300 + 9_000 * random.uniform())),
        calendarErrorYears: String(Math.round(40 + 400 * random.uniform())), measurementYear: '2021',
      });
    } else {
      const marine = i % 10 === 4;
      Object.assign(cells, {
        method: 'RADIOCARBON', material: marine ? 'SHELL' : 'DETRITAL_CHARCOAL', ageRelation: marine ? 'DATES_DEPOSIT' : 'OLDER_THAN_DEPOSIT',
        c14Age: String(Math.round(500 + 11_500 * random.uniform())), c14Error: String(Math.round(20 + 60 * random.uniform())),
        curve: marine ? 'MARINE20' : 'INTCAL20', ...(marine ? { deltaR: '-35', deltaRError: '60' } : {}),
        delta13C: (-28 + 4 * random.uniform()).toFixed(1), notes: 'bench row, "quoted", with a comma',
      });
    }
    lines.push(LAB_SHEET_COLUMNS.map((column) => csvCell(cells[column] ?? '')).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}

function csvCell(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

const builtInOnly: CurveLookup = (code) => (isBuiltInCurve(code) ? builtInCurve(code) : undefined);

function calibrate(dating: SampleDating): LabSheetCalibration | FieldProblem {
  try {
    return calibrationForSample(dating, builtInOnly);
  } catch (error) {
    if (error instanceof CalibrationInputError) return { field: error.field, message: error.message };
    throw error;
  }
}

/**
 * Read and check a 10,000-row sheet as `importSamples` does before writing: CSV parsing, cell
 * types, units, depths, duplicate lab codes, the sample form's class-validator rules and a full
 * calibration per row. Curves are loaded and a small sheet checked first, so the figure is the
 * steady cost rather than file parsing and JIT warm-up. The database write is not included.
 */
export function benchLabSheetImport(rows = 10_000): LabSheetBenchFigures {
  const csv = inventedLabSheet(rows);
  const context = { units: UNITS, takenLabCodes: new Set<string>(), latitude: -41, calibrate, fieldRules: sampleFormRules };
  checkLabSheet(inventedLabSheet(300, 1), context);
  const cpuStarted = process.cpuUsage();
  const started = process.hrtime.bigint();
  const check = checkLabSheet(csv, context);
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  const cpu = process.cpuUsage(cpuStarted);
  if (check.problems.length > 0 || check.accepted.length !== rows) {
    throw new Error(`benchmark sheet did not check clean: ${JSON.stringify(check.problems.slice(0, 3))}`);
  }
  return {
    rows,
    sheetMegabytes: Buffer.byteLength(csv) / 1e6,
    seconds,
    rowsPerSecond: rows / seconds,
    cpuSeconds: (cpu.user + cpu.system) / 1e6,
  };
}
