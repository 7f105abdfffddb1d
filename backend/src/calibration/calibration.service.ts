import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { CalibrationResult, calibrateRadiocarbon } from '../chronology/calibration/calibrate';
import { CalendarDensity } from '../chronology/common/density';
import { DensityGrid, thinToGrid } from '../chronology/common/density-views';
import { calibrateLuminescence } from '../chronology/calibration/calendar-ages';
import { CurveFormatError } from '../chronology/calibration/curve';
import { validateCurveText } from '../chronology/calibration/custom-curve';
import { CalibrationInputError } from '../chronology/calibration/errors';
import { calibrationForSample, CurveLookup, SampleDating } from '../chronology/calibration/sample-calibration';
import { badInput, forbidden } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { StoredCalibration } from '../database/schema';
import { toStored } from './stored-calibration';
import { CalibrationCurvesRepository } from './calibration-curves.repository';
import { CalibrateInput, CalibrateLuminescenceInput, InstallCurveInput } from './dto/calibrate.input';
import { CurveInfo, CurveRegistryService } from './curve-registry.service';
import { UsersService } from '../users/users.service';

/**
 * A calibration as the API returns it: the summaries, and its density made only when a field asks
 * for it (`Calibration.density`, `Calibration.densityGrid`): a sample's density is recomputed from
 * its dating, which the summaries shown in a site's sample table do not need.
 */
export interface CalibrationView {
  curve: string | null;
  medianCalBp: number;
  meanCalBp: number;
  sdYears: number;
  hpd68: StoredCalibration['hpd68'];
  hpd95: StoredCalibration['hpd95'];
  warnings: string[];
  /** The calendar density, computed at most once for this view. */
  calendarDensity(): Promise<CalendarDensity>;
}

@Injectable()
export class CalibrationService {
  constructor(
    private readonly database: DatabaseService,
    private readonly registry: CurveRegistryService,
    private readonly curves: CalibrationCurvesRepository,
    private readonly users: UsersService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  async calibrate(input: CalibrateInput): Promise<CalibrationView> {
    const lookup = await this.registry.lookup();
    const curve = lookup(input.curve);
    if (!curve) throw badInput('curve', `curve ${input.curve} is not installed; an operator of the server can install it from its published file`);
    return toView(asUserInput(() => calibrateRadiocarbon({ ...input, curve })), input.curve);
  }

  calibrateLuminescence(input: CalibrateLuminescenceInput): CalibrationView {
    return toView(asUserInput(() => calibrateLuminescence(input)), null);
  }

  /** The stored calibration of a sample's dating; BAD_USER_INPUT naming the field when it cannot be calibrated. */
  async calibrateSample(dating: SampleDating): Promise<StoredCalibration> {
    const lookup = await this.registry.lookup();
    return toStored(asUserInput(() => calibrationForSample(dating, lookup)), dating.method === 'RADIOCARBON' ? dating.curve ?? null : null);
  }

  /**
   * The calendar density of a stored sample, recomputed from its dating (densities are not
   * stored). Throws BAD_USER_INPUT when the dating can no longer be calibrated (e.g. a curve removed).
   */
  async densityOfSample(dating: SampleDating): Promise<CalendarDensity> {
    const lookup = await this.registry.lookup();
    return asUserInput(() => calibrationForSample(dating, lookup)).density;
  }

  /**
   * A marine sample calibrated at each Delta-R of a grid with no Delta-R error: each density
   * (normalised) with the log of its likelihood's mass, for a shared reservoir offset.
   */
  async reservoirGridOfSample(dating: SampleDating, deltaRs: readonly number[]): Promise<({ density: CalendarDensity; logMass: number } | null)[]> {
    const lookup = await this.registry.lookup();
    return deltaRs.map((deltaR) => {
      try {
        const result = calibrationForSample({ ...dating, deltaR, deltaRError: 0 }, lookup);
        return { density: result.density, logMass: Math.log(result.likelihoodMass ?? 1) };
      } catch (error) {
        // Beyond the curve at this offset: no likelihood there (see calibratedGrid).
        if (error instanceof CalibrationInputError) return null;
        throw error;
      }
    });
  }

  /** A stored sample's calibration as the API shows it: the stored summaries plus the recomputed density. */
  viewOfSample(stored: StoredCalibration, dating: SampleDating): CalibrationView {
    let density: Promise<CalendarDensity> | undefined;
    return { ...stored, calendarDensity: () => (density ??= this.densityOfSample(dating)) };
  }

  /** The built-in and installed curves by code (for computations handed to a thread). */
  curveLookup(): Promise<CurveLookup> {
    return this.registry.lookup();
  }

  /** The same, for bulk imports: returns the problem instead of throwing. */
  async sampleCalibrator(): Promise<(dating: SampleDating) => StoredCalibration | { field: string; message: string }> {
    const lookup = await this.registry.lookup();
    return (dating) => {
      try {
        return toStored(calibrationForSample(dating, lookup), dating.method === 'RADIOCARBON' ? dating.curve ?? null : null);
      } catch (error) {
        if (error instanceof CalibrationInputError) return { field: error.field, message: error.message };
        throw error;
      }
    };
  }

  listCurves(): Promise<CurveInfo[]> {
    return this.registry.list();
  }

  /** Tabulated curve values (every year, or thinned to at most ~2000 points) for the calibration view. */
  async curveBand(code: string, youngerCalBp: number, olderCalBp: number) {
    const curve = (await this.registry.lookup())(code);
    if (!curve) throw badInput('curve', `curve ${code} is not installed`);
    const from = Math.max(curve.startCalBp, Math.min(youngerCalBp, olderCalBp));
    const to = Math.min(curve.endCalBp, Math.max(youngerCalBp, olderCalBp));
    const step = Math.max(1, Math.ceil((to - from) / 2000));
    const points: { calBp: number; c14Age: number; c14Sigma: number }[] = [];
    for (let t = from; t <= to; t += step) {
      const i = t - curve.startCalBp;
      points.push({ calBp: t, c14Age: curve.mu[i], c14Sigma: curve.sigma[i] });
    }
    return points;
  }

  /**
   * Install or replace a curve from its published file. Installed curves serve every project on
   * the server, so this is an operator's action (`OPERATOR_EMAILS`), not a project role's.
   */
  async installCurve(user: AuthUser, input: InstallCurveInput): Promise<CurveInfo> {
    if (!(await this.users.operator(user))) {
      throw forbidden('an installed calibration curve is used by every project on this server: only an operator of the server (OPERATOR_EMAILS) may install one');
    }
    if (input.code === 'INTCAL20' || input.code === 'MARINE20') {
      throw badInput('code', `${input.code} is built in and cannot be replaced`);
    }
    let parsed: ReturnType<typeof validateCurveText>;
    try {
      parsed = validateCurveText(input.text, { code: input.code, name: input.name, marine: input.marine });
    } catch (error) {
      if (error instanceof CurveFormatError) throw badInput('text', error.message);
      throw error;
    }
    await this.database.transaction(async (tx) => {
      const row = await this.curves.upsert(
        {
          code: input.code,
          name: input.name,
          marine: input.marine,
          sourceText: input.text,
          youngestCalBp: parsed.coverage.youngestCalBp,
          oldestCalBp: parsed.coverage.oldestCalBp,
          installedById: user.id,
        },
        tx,
      );
      await this.audit.record(tx, {
        actor: user, projectId: null, action: 'install', objectType: 'calibrationCurve', objectId: row.id,
        after: { code: row.code, name: row.name, marine: row.marine, coverage: parsed.coverage },
      });
    });
    await this.registry.reload();
    return {
      code: input.code, name: input.name, marine: input.marine, builtIn: false,
      youngestCalBp: parsed.coverage.youngestCalBp, oldestCalBp: parsed.coverage.oldestCalBp,
    };
  }
}

function asUserInput<T>(compute: () => T): T {
  try {
    return compute();
  } catch (error) {
    if (error instanceof CalibrationInputError) throw badInput(error.field, error.message);
    throw error;
  }
}

/** Probabilities at or below this share of the (unit) mass are left out of a density as the API lists it. */
export const DENSITY_LISTING_THRESHOLD = 1e-6;

/** `Calibration.density`: the 1-year grid's years above the listing threshold, as points. */
export function densityPoints({ startCalBp, probabilities }: CalendarDensity): { calBp: number; probability: number }[] {
  const points: { calBp: number; probability: number }[] = [];
  probabilities.forEach((probability, i) => {
    if (probability > DENSITY_LISTING_THRESHOLD) points.push({ calBp: startCalBp + i, probability });
  });
  return points;
}

/**
 * Values a calibration's `densityGrid` holds at most: 1-year bins while the density spans up to
 * 2,000 years, pooled bins beyond (the widest error, 20,000 years, spreads a density over ~55,000
 * years: 2.9 MB as points, ~20 kB as this grid).
 */
export const CALIBRATION_GRID_POINTS = 2000;

/** `Calibration.densityGrid`: the listed span of a density (above the listing threshold) as a drawing grid. */
export function densityGridOf({ startCalBp, probabilities }: CalendarDensity): DensityGrid {
  let first = probabilities.findIndex((p) => p > DENSITY_LISTING_THRESHOLD);
  if (first < 0) first = 0;
  let last = probabilities.length - 1;
  while (last > first && !(probabilities[last] > DENSITY_LISTING_THRESHOLD)) last--;
  return thinToGrid({ startCalBp: startCalBp + first, probabilities: probabilities.slice(first, last + 1) }, CALIBRATION_GRID_POINTS);
}

function toView(result: CalibrationResult, curve: string | null): CalibrationView {
  return { ...toStored(result, curve), calendarDensity: () => Promise.resolve(result.density) };
}
