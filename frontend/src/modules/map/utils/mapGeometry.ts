import { geoMercator, type GeoProjection } from 'd3';

/** A WGS84 position, degrees. */
export type LonLat = readonly [longitude: number, latitude: number];

export type MapSite = { id: string; longitude: number; latitude: number; alongStrikeKm: number };

export type LonLatBounds = { west: number; south: number; east: number; north: number };

/** The smallest span (degrees) a map shows, so one site or a tight cluster keeps its surroundings. */
export const MIN_SPAN_DEGREES = 1.5;

/** With no sites at all, the whole world between the polar circles. */
const WORLD: LonLatBounds = { west: -180, south: -66, east: 180, north: 72 };

/**
 * The sites' bounding box grown by `padFraction` of its span on every side and widened to at
 * least MIN_SPAN_DEGREES about its centre. Longitudes are taken as given (a project straddling
 * the antimeridian would need them unwrapped first).
 */
export function siteBounds(sites: readonly { longitude: number; latitude: number }[], padFraction = 0.15): LonLatBounds {
  if (sites.length === 0) return WORLD;
  let west = Infinity;
  let east = -Infinity;
  let south = Infinity;
  let north = -Infinity;
  for (const { longitude, latitude } of sites) {
    west = Math.min(west, longitude);
    east = Math.max(east, longitude);
    south = Math.min(south, latitude);
    north = Math.max(north, latitude);
  }
  const widen = (low: number, high: number): [number, number] => {
    const span = Math.max((high - low) * (1 + 2 * padFraction), MIN_SPAN_DEGREES);
    const centre = (low + high) / 2;
    return [centre - span / 2, centre + span / 2];
  };
  const [w, e] = widen(west, east);
  const [s, n] = widen(south, north);
  return { west: Math.max(w, -180), east: Math.min(e, 180), south: Math.max(s, -85), north: Math.min(n, 85) };
}

/** The corners and edge midpoints of a box as a GeoJSON MultiPoint, for fitting a projection to it. */
function boundsOutline({ west, south, east, north }: LonLatBounds): GeoJSON.MultiPoint {
  const midLon = (west + east) / 2;
  const midLat = (south + north) / 2;
  return {
    type: 'MultiPoint',
    coordinates: [
      [west, south],
      [west, north],
      [east, south],
      [east, north],
      [midLon, south],
      [midLon, north],
      [west, midLat],
      [east, midLat],
    ],
  };
}

/**
 * A Mercator projection (conformal, so the sites' track keeps its shape at the regional scale of
 * a margin) fitted inside a `width` x `height` frame less `margin` pixels on each side to the
 * padded bounds of the sites and of any further points (`alsoShow`: the ends of segment bands,
 * which can reach past the outermost sites).
 */
export function fitMapProjection(
  sites: readonly MapSite[],
  width: number,
  height: number,
  margin = 24,
  alsoShow: readonly LonLat[] = [],
): GeoProjection {
  const inner: [[number, number], [number, number]] = [
    [margin, margin],
    [Math.max(margin + 1, width - margin), Math.max(margin + 1, height - margin)],
  ];
  const points = [...sites, ...alsoShow.map(([longitude, latitude]) => ({ longitude, latitude }))];
  return geoMercator().fitExtent(inner, boundsOutline(siteBounds(points)));
}

/** How far (degrees) beyond the typical spread a site may lie and still be fitted into view. */
export const FAR_SITE_FACTOR = 6;
/** Sites within this many degrees of the project's centre always count as near. */
export const NEAR_DEGREES = 3;

/**
 * The sites the map fits, and the far ones it leaves out of the first view: a site farther from
 * the sites' median position than FAR_SITE_FACTOR times their median distance from it (and more
 * than NEAR_DEGREES) is far. One mistyped or distant site then does not shrink a margin's sites
 * into a cluster; the map says how many are out of view and can fit them all.
 */
export function nearAndFarSites<T extends { longitude: number; latitude: number }>(sites: readonly T[]): { near: T[]; far: T[] } {
  if (sites.length < 3) return { near: [...sites], far: [] };
  const median = (values: number[]) => {
    const sorted = [...values].sort((a, b) => a - b);
    const middle = Math.floor(sorted.length / 2);
    return sorted.length % 2 === 1 ? (sorted[middle] ?? 0) : ((sorted[middle - 1] ?? 0) + (sorted[middle] ?? 0)) / 2;
  };
  const centreLon = median(sites.map((site) => site.longitude));
  const centreLat = median(sites.map((site) => site.latitude));
  const shrink = Math.cos((centreLat * Math.PI) / 180);
  const distanceOf = (site: T) => Math.hypot((site.longitude - centreLon) * shrink, site.latitude - centreLat);
  const limit = Math.max(FAR_SITE_FACTOR * median(sites.map(distanceOf)), NEAR_DEGREES);
  const near: T[] = [];
  const far: T[] = [];
  for (const site of sites) (distanceOf(site) <= limit ? near : far).push(site);
  return { near, far };
}

/** A site's place on the track: its along-strike position and its WGS84 position. */
export type TrackPoint = { km: number; position: LonLat };

/**
 * The sites' track along strike: one point per along-strike position (sites at the same km
 * averaged), ordered by km. Segments are drawn along it, since a segment is known by its km
 * extent, not by coordinates.
 */
export function siteTrack(sites: readonly MapSite[]): TrackPoint[] {
  const byKm = new Map<number, { lon: number; lat: number; count: number }>();
  for (const site of sites) {
    const entry = byKm.get(site.alongStrikeKm) ?? { lon: 0, lat: 0, count: 0 };
    entry.lon += site.longitude;
    entry.lat += site.latitude;
    entry.count += 1;
    byKm.set(site.alongStrikeKm, entry);
  }
  return [...byKm.entries()]
    .sort(([a], [b]) => a - b)
    .map(([km, { lon, lat, count }]) => ({ km, position: [lon / count, lat / count] as const }));
}

/**
 * The position at an along-strike km on the track, by linear interpolation between the two
 * track points around it, or linear extrapolation from the two at the nearer end (the km scale
 * of a margin is close to linear in degrees over a few hundred km). Null with no track.
 */
export function positionAtKm(track: readonly TrackPoint[], km: number): LonLat | null {
  const first = track[0];
  if (!first) return null;
  if (track.length === 1) return first.position;
  let index = track.findIndex((point) => point.km >= km);
  if (index <= 0) index = index === 0 ? 1 : track.length - 1;
  const a = track[index - 1];
  const b = track[index];
  if (!a || !b) return first.position;
  const t = (km - a.km) / (b.km - a.km);
  return [a.position[0] + t * (b.position[0] - a.position[0]), a.position[1] + t * (b.position[1] - a.position[1])];
}

/**
 * A segment's extent as a line along the track: the position at its start km, the track points
 * strictly inside, the position at its end km. Empty with no track or an empty extent.
 */
export function segmentTrackLine(track: readonly TrackPoint[], startKm: number, endKm: number): LonLat[] {
  const low = Math.min(startKm, endKm);
  const high = Math.max(startKm, endKm);
  const start = positionAtKm(track, low);
  const end = positionAtKm(track, high);
  if (!start || !end || high === low) return [];
  return [start, ...track.filter((point) => point.km > low && point.km < high).map((point) => point.position), end];
}

/**
 * The track smoothed by local linear regression (Cleveland 1979, LOESS with a Gaussian kernel
 * of `bandwidthKm`): at each track km, longitude and latitude are read from a weighted straight-
 * line fit against km. Onshore and offshore sites alternate along a margin, so the raw track
 * zigzags across the coast; the smoothed one follows the margin. A straight track is kept
 * exactly, ends included, which a plain moving average would pull inwards. The default
 * bandwidth is a sixth of the track's length.
 */
export function smoothTrack(track: readonly TrackPoint[], bandwidthKm?: number): TrackPoint[] {
  if (track.length < 3) return [...track];
  const span = (track[track.length - 1]?.km ?? 0) - (track[0]?.km ?? 0);
  const h = bandwidthKm ?? Math.max(span / 6, 1);
  return track.map(({ km }) => {
    let sw = 0;
    let swx = 0;
    let swxx = 0;
    let swLon = 0;
    let swLat = 0;
    let swxLon = 0;
    let swxLat = 0;
    for (const point of track) {
      const x = point.km - km;
      const w = Math.exp(-0.5 * (x / h) ** 2);
      sw += w;
      swx += w * x;
      swxx += w * x * x;
      swLon += w * point.position[0];
      swLat += w * point.position[1];
      swxLon += w * x * point.position[0];
      swxLat += w * x * point.position[1];
    }
    // The intercept of the weighted fit y = a + b x at x = 0 (normal equations solved for a).
    const determinant = sw * swxx - swx * swx;
    if (Math.abs(determinant) < 1e-12) return { km, position: [swLon / sw, swLat / sw] as const };
    const lon = (swxx * swLon - swx * swxLon) / determinant;
    const lat = (swxx * swLat - swx * swxLat) / determinant;
    return { km, position: [lon, lat] as const };
  });
}
