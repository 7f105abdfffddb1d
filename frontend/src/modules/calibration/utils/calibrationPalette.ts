import type { CurveCode } from '@/gql/graphql';

/**
 * Colours of the calibration chart, written as SVG attributes so an exported figure matches
 * the screen: sediment tones for samples, a silt grey for the land curves and a sea blue for
 * the marine one.
 */
export const SERIES_COLOURS: readonly string[] = ['#a0522d', '#2f6f8f', '#b8862b', '#5e4633', '#6b7a3a', '#8b3a2a', '#52606d', '#7d6a9a'];

export const CURVE_BAND_COLOURS: Record<CurveCode, { fill: string; line: string }> = {
  INTCAL20: { fill: '#b9b4aa', line: '#6f6a61' },
  MARINE20: { fill: '#9fc0cf', line: '#2f6f8f' },
  SHCAL20: { fill: '#c3c0a4', line: '#6d6a4a' },
};

export const CHART_INK = {
  axis: '#6b665d',
  grid: '#e6e2db',
  text: '#2b2823',
  muted: '#6b665d',
  frame: '#d6d1c8',
} as const;

/** The colour of the n-th series, cycling through the palette. */
export function seriesColour(index: number): string {
  return SERIES_COLOURS[index % SERIES_COLOURS.length]!;
}
