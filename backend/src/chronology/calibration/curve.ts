/**
 * Calibration curves: parsing the published five-column layout (IntCal20, Reimer et al. 2020,
 * Radiocarbon 62(4):725-757; Marine20, Heaton et al. 2020, Radiocarbon 62(4):779-820; SHCal20,
 * Hogg et al. 2020, Radiocarbon 62(4):759-778) and interpolating it linearly to a 1-year calendar
 * grid, the grid every calibration in Stratochron is computed on.
 */

/** A calibration curve on a 1-year grid: index i is the calendar age `startCalBp + i` (cal BP). */
export interface CalibrationCurve {
  /** The code the API uses: `INTCAL20`, `MARINE20`, `SHCAL20` or a project's own code. */
  readonly code: string;
  readonly name: string;
  /** Marine curves take a local reservoir offset Delta-R; atmospheric curves must not. */
  readonly marine: boolean;
  /** Youngest calendar age covered (cal BP). */
  readonly startCalBp: number;
  /** Oldest calendar age covered (cal BP). */
  readonly endCalBp: number;
  /** Curve 14C age mu(t) (14C yr BP) per calendar year. */
  readonly mu: Float64Array;
  /** Curve 1-sigma sigma(t) (14C yr) per calendar year. */
  readonly sigma: Float64Array;
}

/** One tabulated point of a curve as published. */
export interface CurvePoint {
  readonly calBp: number;
  readonly c14Age: number;
  readonly c14Sigma: number;
}

/** A curve file that cannot be used, with the 1-based line of the first problem. */
export class CurveFormatError extends Error {
  constructor(
    message: string,
    readonly line?: number,
  ) {
    super(line === undefined ? message : `line ${line}: ${message}`);
    this.name = 'CurveFormatError';
  }
}

/**
 * Parse a curve file: comma-, tab- or whitespace-separated, first three columns calendar age
 * (cal BP), 14C age and its 1-sigma; further columns (Delta14C, reservoir age) are ignored.
 * Lines starting with `#` and one header line of words are skipped. Rows may run either way in
 * time but must be strictly monotonic in calendar age, with finite ages and positive sigmas.
 */
export function parseCurvePoints(text: string): CurvePoint[] {
  const points: CurvePoint[] = [];
  const lines = text.split(/\r?\n/);
  for (let n = 0; n < lines.length; n++) {
    const line = lines[n].trim();
    if (line === '' || line.startsWith('#')) continue;
    const cells = line.split(/[,\t ]+/);
    if (cells.length < 3) throw new CurveFormatError('expected at least three columns: cal BP, 14C age, sigma', n + 1);
    const [calBp, c14Age, c14Sigma] = cells.slice(0, 3).map(Number);
    if (points.length === 0 && [calBp, c14Age, c14Sigma].some(Number.isNaN)) continue; // header
    if (![calBp, c14Age, c14Sigma].every(Number.isFinite)) {
      throw new CurveFormatError('calendar age, 14C age and sigma must be numbers', n + 1);
    }
    if (!(c14Sigma > 0)) throw new CurveFormatError(`sigma must be positive, got ${c14Sigma}`, n + 1);
    points.push({ calBp, c14Age, c14Sigma });
  }
  if (points.length < 2) throw new CurveFormatError('a curve needs at least two rows');
  const ascending = points[1].calBp > points[0].calBp;
  for (let i = 1; i < points.length; i++) {
    const step = points[i].calBp - points[i - 1].calBp;
    if (ascending ? step <= 0 : step >= 0) {
      throw new CurveFormatError(
        `calendar ages must be strictly ordered; ${points[i].calBp} follows ${points[i - 1].calBp}`,
      );
    }
  }
  return ascending ? points : points.reverse();
}

/**
 * Interpolate tabulated points (ascending cal BP) linearly to whole calendar years. The curve
 * covers ceil(first) .. floor(last) cal BP.
 */
export function curveFromPoints(
  points: readonly CurvePoint[],
  meta: { code: string; name: string; marine: boolean },
): CalibrationCurve {
  const startCalBp = Math.ceil(points[0].calBp);
  const endCalBp = Math.floor(points[points.length - 1].calBp);
  const length = endCalBp - startCalBp + 1;
  const mu = new Float64Array(length);
  const sigma = new Float64Array(length);
  let k = 0;
  for (let i = 0; i < length; i++) {
    const t = startCalBp + i;
    while (k < points.length - 2 && points[k + 1].calBp < t) k++;
    const a = points[k];
    const b = points[k + 1];
    const f = (t - a.calBp) / (b.calBp - a.calBp);
    mu[i] = a.c14Age + f * (b.c14Age - a.c14Age);
    sigma[i] = a.c14Sigma + f * (b.c14Sigma - a.c14Sigma);
  }
  return { ...meta, startCalBp, endCalBp, mu, sigma };
}

/** Parse and grid a curve file in one step. */
export function parseCurve(text: string, meta: { code: string; name: string; marine: boolean }): CalibrationCurve {
  return curveFromPoints(parseCurvePoints(text), meta);
}

/** The range of 14C ages a curve spans, for error messages and the coverage statement. */
export function curveC14Range(curve: CalibrationCurve): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (const m of curve.mu) {
    if (m < min) min = m;
    if (m > max) max = m;
  }
  return { min, max };
}
