/**
 * Checking a curve file an administrator installs (SHCal20, Hogg et al. 2020, Radiocarbon
 * 62(4):759-778, or any curve in the same five-column layout), and stating what it covers so the
 * administrator can confirm it before it is stored.
 */
import { CalibrationCurve, CurveFormatError, curveC14Range, curveFromPoints, parseCurvePoints } from './curve';

export interface CurveMeta {
  readonly code: string;
  readonly name: string;
  readonly marine: boolean;
}

/** What an installed curve covers, in the units researchers check a curve by. */
export interface CurveCoverage {
  readonly youngestCalBp: number;
  readonly oldestCalBp: number;
  readonly minC14: number;
  readonly maxC14: number;
  /** Tabulated rows read from the file (before interpolation to the 1-year grid). */
  readonly rows: number;
}

/**
 * Parse a curve file and grid it, or throw CurveFormatError saying what is wrong (with the line
 * where there is one). Beyond the layout checks of `parseCurvePoints`, the file must cover at least
 * two whole calendar years, since calibration works on a 1-year grid.
 */
export function validateCurveText(
  text: string,
  meta: CurveMeta,
): { curve: CalibrationCurve; coverage: CurveCoverage } {
  const points = parseCurvePoints(text);
  const youngest = Math.ceil(points[0].calBp);
  const oldest = Math.floor(points[points.length - 1].calBp);
  if (oldest - youngest < 1) {
    throw new CurveFormatError(
      `the curve covers ${points[0].calBp} to ${points[points.length - 1].calBp} cal BP, ` +
        'less than two whole calendar years',
    );
  }
  const curve = curveFromPoints(points, meta);
  const { min, max } = curveC14Range(curve);
  return {
    curve,
    coverage: {
      youngestCalBp: curve.startCalBp,
      oldestCalBp: curve.endCalBp,
      minC14: min,
      maxC14: max,
      rows: points.length,
    },
  };
}
