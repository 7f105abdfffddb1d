import { Injectable } from '@nestjs/common';
import { CalibrationCurve } from '../chronology/calibration/curve';
import { CurveLookup } from '../chronology/calibration/sample-calibration';
import { validateCurveText } from '../chronology/calibration/custom-curve';
import { builtInCurve, isBuiltInCurve } from '../reference-data/reference-data';
import { CalibrationCurvesRepository, CalibrationCurveRow } from './calibration-curves.repository';

/** How long an API or worker process trusts its copy of the installed curves. */
const INSTALLED_CURVES_TTL_MS = 30_000;

export interface CurveInfo {
  code: string;
  name: string;
  marine: boolean;
  builtIn: boolean;
  youngestCalBp: number;
  oldestCalBp: number;
}

/**
 * Every curve a calibration may use: the built-ins from `reference-data/` and the curves an
 * administrator installed (kept in the database, re-read by each process at most every 30 s so
 * that API and worker replicas pick up a new curve without a restart).
 */
@Injectable()
export class CurveRegistryService {
  private installed = new Map<string, CalibrationCurve>();
  private loadedAt = 0;

  constructor(private readonly curves: CalibrationCurvesRepository) {}

  /** A synchronous lookup over built-in and installed curves, fresh within the TTL. */
  async lookup(): Promise<CurveLookup> {
    if (Date.now() - this.loadedAt > INSTALLED_CURVES_TTL_MS) await this.reload();
    return (code) => (isBuiltInCurve(code) ? builtInCurve(code) : this.installed.get(code));
  }

  async reload(): Promise<void> {
    const rows = await this.curves.list();
    this.installed = new Map(rows.map((row) => [row.code, toCurve(row)]));
    this.loadedAt = Date.now();
  }

  async list(): Promise<CurveInfo[]> {
    await this.lookup();
    const builtIns: CurveInfo[] = (['INTCAL20', 'MARINE20'] as const).map((code) => {
      const curve = builtInCurve(code);
      return { code, name: curve.name, marine: curve.marine, builtIn: true, youngestCalBp: curve.startCalBp, oldestCalBp: curve.endCalBp };
    });
    const installed: CurveInfo[] = [...this.installed.values()].map((curve) => ({
      code: curve.code, name: curve.name, marine: curve.marine, builtIn: false, youngestCalBp: curve.startCalBp, oldestCalBp: curve.endCalBp,
    }));
    return [...builtIns, ...installed];
  }
}

function toCurve(row: CalibrationCurveRow): CalibrationCurve {
  return validateCurveText(row.sourceText, { code: row.code, name: row.name, marine: row.marine }).curve;
}
