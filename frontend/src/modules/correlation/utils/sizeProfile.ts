/**
 * The along-strike size profile of a regional event: each member site's measured coseismic
 * subsidence or displacement (with its 1-sigma error) or, at a core, the event bed's thickness
 * (no error: it is a measured depth difference). Pure helpers for the chart under the space-time
 * view.
 */

export type SizeQuantity = 'subsidence' | 'displacement' | 'bedThickness';

export const SIZE_QUANTITIES: readonly { value: SizeQuantity; label: string; axis: string }[] = [
  { value: 'subsidence', label: 'Subsidence', axis: 'coseismic subsidence, m (± 1σ; negative: uplift)' },
  { value: 'displacement', label: 'Displacement', axis: 'coseismic displacement, m (± 1σ)' },
  { value: 'bedThickness', label: 'Bed thickness', axis: 'event bed thickness, m' },
];

export type SizePoint = {
  eventHorizon: { id: string; name: string };
  site: { id: string; name: string };
  alongStrikeKm?: number | null;
  subsidenceM?: number | null;
  subsidenceErrorM?: number | null;
  displacementM?: number | null;
  displacementErrorM?: number | null;
  bedThicknessM?: number | null;
};

export type ProfilePoint = {
  km: number;
  value: number;
  /** 1-sigma error; null when none was measured. */
  error: number | null;
  siteName: string;
  eventName: string;
};

/** The points of one quantity, along strike; members without it or without a position are left out. */
export function profileSeries(points: readonly SizePoint[], quantity: SizeQuantity): ProfilePoint[] {
  const read = (point: SizePoint): [number | null | undefined, number | null | undefined] =>
    quantity === 'subsidence'
      ? [point.subsidenceM, point.subsidenceErrorM]
      : quantity === 'displacement'
        ? [point.displacementM, point.displacementErrorM]
        : [point.bedThicknessM, null];
  return points
    .flatMap((point): ProfilePoint[] => {
      const [value, error] = read(point);
      if (value == null || point.alongStrikeKm == null) return [];
      return [{ km: point.alongStrikeKm, value, error: error ?? null, siteName: point.site.name, eventName: point.eventHorizon.name }];
    })
    .sort((a, b) => a.km - b.km);
}

/** The quantities a profile has any value of. */
export function quantitiesOf(points: readonly SizePoint[]): SizeQuantity[] {
  return SIZE_QUANTITIES.map((q) => q.value).filter((quantity) => profileSeries(points, quantity).length > 0);
}

/** The value axis' extent: the error bars and zero included, so a bar is never cut off and sign shows. */
export function valueExtent(series: readonly ProfilePoint[]): [number, number] {
  let low = 0;
  let high = 0;
  for (const point of series) {
    const error = point.error ?? 0;
    low = Math.min(low, point.value - error);
    high = Math.max(high, point.value + error);
  }
  if (high === low) high = low + 1;
  const pad = (high - low) * 0.08;
  return [low - (low < 0 ? pad : 0), high + pad];
}
