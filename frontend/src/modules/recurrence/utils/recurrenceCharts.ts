/**
 * Pure arithmetic behind the recurrence figures: the interval histogram on a density scale so
 * the fitted renewal densities lie over it, the extents of the curves, and the time elapsed
 * since the last event at the forecast start.
 */
import { BP_ZERO_YEAR_CE } from '@/modules/ages/utils/formatAge';

export type HistogramBinLike = { fromYears: number; toYears: number; count: number };
export type CurvePointLike = { years: number; value: number };

/** A histogram bin as a probability density, per year: its height on the fitted densities' axis. */
export type DensityBin = { fromYears: number; toYears: number; density: number };

/**
 * Bin counts turned into a density: count / (total count x bin width). Each bar's area is then
 * its share of the draws, and the bars' total area is 1, as for a fitted probability density,
 * so both can share one vertical axis.
 */
export function histogramAsDensity(bins: readonly HistogramBinLike[]): DensityBin[] {
  const total = bins.reduce((sum, bin) => sum + bin.count, 0);
  return bins.map((bin) => {
    const width = bin.toYears - bin.fromYears;
    return {
      fromYears: bin.fromYears,
      toYears: bin.toYears,
      density: total > 0 && width > 0 ? bin.count / (total * width) : 0,
    };
  });
}

/** The largest value among curves and bars, for a vertical domain starting at 0; 1 when empty. */
export function valuePeak(curves: readonly (readonly CurvePointLike[])[], bars: readonly DensityBin[] = []): number {
  let peak = 0;
  for (const curve of curves) for (const point of curve) if (Number.isFinite(point.value)) peak = Math.max(peak, point.value);
  for (const bar of bars) peak = Math.max(peak, bar.density);
  return peak > 0 ? peak : 1;
}

/** The years axis: from 0 to the furthest bin edge, curve point or marker; 1 when empty. */
export function yearsExtent(
  curves: readonly (readonly CurvePointLike[])[],
  bins: readonly HistogramBinLike[] = [],
  markers: readonly (number | null | undefined)[] = [],
): [0, number] {
  let far = 0;
  for (const curve of curves) for (const point of curve) far = Math.max(far, point.years);
  for (const bin of bins) far = Math.max(far, bin.toYears);
  for (const marker of markers) if (marker !== null && marker !== undefined && Number.isFinite(marker)) far = Math.max(far, marker);
  return [0, far > 0 ? far : 1];
}

/**
 * Years since the last event at the start of the forecast: the forecast year CE minus the
 * last event's calendar year (1950 - cal BP). The analysis' own openInterval median wins when
 * present, as it is the median over draws rather than of one median age.
 */
export function elapsedSinceLastEvent(
  forecastStartYear: number,
  lastEventMedianCalBp: number | null | undefined,
  openIntervalMedian?: number | null,
): number | null {
  if (openIntervalMedian !== null && openIntervalMedian !== undefined) return openIntervalMedian;
  if (lastEventMedianCalBp === null || lastEventMedianCalBp === undefined) return null;
  return forecastStartYear - (BP_ZERO_YEAR_CE - lastEventMedianCalBp);
}

/** A probability as a percentage with one decimal ("12.3 %"); below 0.1 % shown as "< 0.1 %". */
export function formatProbability(probability: number): string {
  if (!Number.isFinite(probability)) return '–';
  const percent = probability * 100;
  if (percent > 0 && percent < 0.1) return '< 0.1 %';
  return `${percent.toFixed(1)} %`;
}

/** The export address of an analysis' numbers. */
export function recurrenceExportUrl(analysisId: string, format: 'csv' | 'json'): string {
  return `/api/recurrence-analyses/${encodeURIComponent(analysisId)}/export.${format}`;
}

/** Status values of a job still in progress, for polling. */
export function isJobActive(status: string): boolean {
  return status === 'QUEUED' || status === 'RUNNING';
}

/** Renewal models by name as written in text (the API's enum values are upper-case codes). */
export const RENEWAL_MODEL_NAMES: Record<'POISSON' | 'BPT' | 'LOGNORMAL' | 'WEIBULL', string> = {
  POISSON: 'Poisson (memoryless)',
  BPT: 'BPT (Brownian passage time)',
  LOGNORMAL: 'Lognormal',
  WEIBULL: 'Weibull',
};

/** Renewal model names as the trade writes them (the API's enum is upper-case). */
export const MODEL_LABELS: Readonly<Record<'POISSON' | 'BPT' | 'LOGNORMAL' | 'WEIBULL', string>> = {
  POISSON: 'Poisson',
  BPT: 'BPT',
  LOGNORMAL: 'Lognormal',
  WEIBULL: 'Weibull',
};

/** A model's screen name; unknown values pass through. */
export function modelLabel(model: string): string {
  return (MODEL_LABELS as Record<string, string>)[model] ?? model;
}

/** What a side-by-side comparison needs of each analysis to put both on the same axes. */
export type ComparableAnalysis = {
  histogram: readonly HistogramBinLike[];
  curves: readonly { density: readonly CurvePointLike[]; hazard: readonly CurvePointLike[]; survival: readonly CurvePointLike[] }[];
  markerYears?: number | null;
};

/** Axes shared by two analyses shown side by side: one years range and one peak per figure. */
export type SharedRecurrenceAxes = { yearsMax: number; densityMax: number; hazardMax: number };

/**
 * The axes both sides of a comparison use, so equal heights and positions mean equal values:
 * the furthest year and the highest density and hazard of either analysis.
 */
export function sharedRecurrenceAxes(analyses: readonly ComparableAnalysis[]): SharedRecurrenceAxes {
  const years = yearsExtent(
    analyses.flatMap((analysis) => analysis.curves.flatMap((curve) => [curve.density, curve.hazard, curve.survival])),
    analyses.flatMap((analysis) => analysis.histogram),
    analyses.map((analysis) => analysis.markerYears),
  )[1];
  return {
    yearsMax: years,
    densityMax: valuePeak(
      analyses.flatMap((analysis) => analysis.curves.map((curve) => curve.density)),
      // Each histogram is a density of its own draws: normalised per analysis, never pooled.
      analyses.flatMap((analysis) => histogramAsDensity(analysis.histogram)),
    ),
    hazardMax: valuePeak(analyses.flatMap((analysis) => analysis.curves.map((curve) => curve.hazard))),
  };
}
