/**
 * Pure arithmetic behind the calibration chart: which calendar and 14C windows to draw, and the
 * measured age's normal density along the 14C axis.
 */

/** One year of a calendar-age density (as the API sends it). */
export type DensityPoint = { calBp: number; probability: number };

/** A radiocarbon measurement as read against a curve. */
export type RadiocarbonMeasurement = {
  c14Age: number;
  c14Error: number;
  deltaR?: number | null;
  deltaRError?: number | null;
};

/** A measured age on the 14C axis: its centre and its standard deviation, 14C yr. */
export type AgeOnCurveAxis = { age: number; sigma: number };

/**
 * A marine age read against the unshifted curve: the likelihood
 * N(x; mu(t) + DeltaR, sqrt(s^2 + sigma(t)^2 + sigma_DeltaR^2)) is the same as comparing
 * x - DeltaR, with error sqrt(s^2 + sigma_DeltaR^2), to mu(t): the same exponent rearranged, so
 * one unshifted curve serves every sample of an overlay. Terrestrial ages pass unchanged.
 */
export function ageOnCurveAxis({ c14Age, c14Error, deltaR, deltaRError }: RadiocarbonMeasurement): AgeOnCurveAxis {
  return {
    age: c14Age - (deltaR ?? 0),
    sigma: Math.hypot(c14Error, deltaRError ?? 0),
  };
}

export type DensitySample = { value: number; density: number };

/** The normal probability density at x: exp(-(x-mean)^2 / (2 sd^2)) / (sd sqrt(2 pi)). */
export function normalPdf(x: number, mean: number, sd: number): number {
  const z = (x - mean) / sd;
  return Math.exp(-0.5 * z * z) / (sd * Math.sqrt(2 * Math.PI));
}

/**
 * The measured age's normal density sampled at `steps` evenly spaced values over
 * mean +- spanSigmas sd, for drawing along the 14C axis.
 */
export function normalDensityPoints(
  { age, sigma }: AgeOnCurveAxis,
  { spanSigmas = 4, steps = 121 }: { spanSigmas?: number; steps?: number } = {},
): DensitySample[] {
  const from = age - spanSigmas * sigma;
  const step = (2 * spanSigmas * sigma) / (steps - 1);
  return Array.from({ length: steps }, (_, index) => {
    const value = from + index * step;
    return { value, density: normalPdf(value, age, sigma) };
  });
}

export type CalendarWindow = { youngerCalBp: number; olderCalBp: number };

/**
 * The calendar range to draw: every density's extent, padded on each side by `padding` of the
 * span (at least `minSpanYears` wide in all), rounded out to `roundTo` years and never younger
 * than `youngestCalBp`. Null when there is no density at all.
 */
export function calendarWindow(
  densities: readonly (readonly DensityPoint[])[],
  { padding = 0.2, minSpanYears = 300, roundTo = 50, youngestCalBp = -75 } = {},
): CalendarWindow | null {
  let younger = Infinity;
  let older = -Infinity;
  for (const density of densities) {
    for (const point of density) {
      younger = Math.min(younger, point.calBp);
      older = Math.max(older, point.calBp);
    }
  }
  if (!Number.isFinite(younger)) {
    return null;
  }
  const span = Math.max(older - younger, 1);
  let pad = span * padding;
  if (span + 2 * pad < minSpanYears) {
    pad = (minSpanYears - span) / 2;
  }
  return {
    youngerCalBp: Math.max(youngestCalBp, Math.floor((younger - pad) / roundTo) * roundTo),
    olderCalBp: Math.ceil((older + pad) / roundTo) * roundTo,
  };
}

/** A curve's tabulated value with its 1-sigma half-width, 14C yr. */
export type CurveBandValue = { calBp: number; c14Age: number; c14Sigma: number };

/**
 * The 14C range to draw: the curve band inside the calendar window and every measured age's
 * +- 4 sigma, padded by 5 % so nothing touches the frame. Null when there is nothing to show.
 */
export function radiocarbonWindow(
  band: readonly CurveBandValue[],
  measured: readonly AgeOnCurveAxis[],
  window: CalendarWindow | null,
): [number, number] | null {
  let low = Infinity;
  let high = -Infinity;
  for (const point of band) {
    if (window && (point.calBp < window.youngerCalBp || point.calBp > window.olderCalBp)) continue;
    low = Math.min(low, point.c14Age - point.c14Sigma);
    high = Math.max(high, point.c14Age + point.c14Sigma);
  }
  for (const { age, sigma } of measured) {
    low = Math.min(low, age - 4 * sigma);
    high = Math.max(high, age + 4 * sigma);
  }
  if (!Number.isFinite(low)) {
    return null;
  }
  const pad = Math.max((high - low) * 0.05, 1);
  return [low - pad, high + pad];
}

/** The highest probability of a density (its mode's height); 0 for an empty density. */
export function densityPeak(density: readonly DensityPoint[]): number {
  let peak = 0;
  for (const point of density) peak = Math.max(peak, point.probability);
  return peak;
}

/**
 * A density with a zero point added one year beyond each end, so a filled area closes on the
 * baseline instead of ending in a cliff where the API trimmed the negligible tails.
 */
export function closeDensity(density: readonly DensityPoint[]): DensityPoint[] {
  if (density.length === 0) return [];
  const sorted = [...density].sort((a, b) => a.calBp - b.calBp);
  return [
    { calBp: sorted[0]!.calBp - 1, probability: 0 },
    ...sorted,
    { calBp: sorted[sorted.length - 1]!.calBp + 1, probability: 0 },
  ];
}

/** A highest-density range with its share of the probability. */
export type ShareRange = { olderCalBp: number; youngerCalBp: number; probability: number };

/**
 * The ranges worth listing, oldest first, and the probability left in slivers: on the 1-year
 * grid a density that dips under the cut-off and back can leave a "range" of a single year
 * ("2507–2507 cal BP, 0.3 %"), which reads as a precise date. Such slivers (under one year
 * wide) are not listed; their summed share is reported instead.
 */
export function listedRanges(ranges: readonly ShareRange[]): { ranges: ShareRange[]; sliverShare: number } {
  const listed: ShareRange[] = [];
  let sliverShare = 0;
  for (const range of ranges) {
    if (Math.abs(range.olderCalBp - range.youngerCalBp) < 1) sliverShare += range.probability;
    else listed.push(range);
  }
  listed.sort((a, b) => Math.max(b.olderCalBp, b.youngerCalBp) - Math.max(a.olderCalBp, a.youngerCalBp));
  return { ranges: listed, sliverShare };
}
