/**
 * The invented true history behind the demo projects: the Velmora Margin (an invented subduction
 * zone, three segments, eleven megathrust earthquakes in the last 6,000 years) and the Brannoch
 * Fault (an invented crustal fault, three surface-rupturing earthquakes). Nothing here is a real
 * place, record or data set.
 *
 * Everything the generator writes follows from these numbers: which site records which event,
 * how thick the deposits between events are, what a dated sample's true calendar age is. Keeping
 * the truth fixed and separate lets tests (and later model runs) compare what the models recover
 * with what really happened; the seed only changes the noise of the field and lab measurements.
 */

import type { SiteKind } from '../database/schema/enums';

export type { SiteKind } from '../database/schema/enums';

/** A fault or subduction-zone segment with its along-strike extent. */
export interface DemoSegment {
  readonly key: string;
  readonly name: string;
  readonly startKm: number;
  readonly endKm: number;
  readonly notes: string;
}

/** One earthquake of the true history. */
export interface TrueEvent {
  readonly key: string;
  /** True calendar age, cal BP (years before AD 1950). */
  readonly calBp: number;
  /** Keys of the segments that ruptured. */
  readonly segmentKeys: readonly string[];
  /** Along-strike extent of the rupture, km. */
  readonly alongStrikeFromKm: number;
  readonly alongStrikeToKm: number;
}

/** A tidal channel (or similar) that cut away part of a site's record and was then filled. */
export interface ErosionEpisode {
  /** The event whose evidence the erosion removed (for the record; the ages decide what goes). */
  readonly trueEventKey: string;
  /** Oldest deposit age removed, cal BP: the cut reaches down to material of this age. */
  readonly erodedOldCalBp: number;
  /** When the cut happened, cal BP: the base age of the fill. */
  readonly cutCalBp: number;
  /** When the fill was complete, cal BP. Material between this age and `erodedOldCalBp` is gone. */
  readonly fillTopCalBp: number;
  readonly fillThicknessM: number;
  readonly reason: string;
}

/** A deposit that buries the recording part of a site and itself records no events. */
export interface CappingDeposit {
  readonly label: string;
  readonly thicknessM: number;
  readonly notes: string;
}

/** Extra samples a site carries beyond the bracketing ones, to show the complications. */
export type SiteComplication =
  /** Detrital charcoal in the post-event deposit of horizon `horizonRank` (1 = youngest), with an inherited age. */
  | { readonly kind: 'INHERITED_CHARCOAL'; readonly horizonRank: number; readonly inheritance: 'MODEST' | 'OUTLIER' }
  /** A root grown down from the modern surface into the deposit below horizon `horizonRank`. */
  | { readonly kind: 'INTRUSIVE_ROOT'; readonly horizonRank: number };

/** Where a site is, what it records and how fast it accumulated: the generator's input for one site. */
export interface SiteLayout {
  readonly key: string;
  readonly kind: SiteKind;
  readonly segmentKey: string;
  readonly alongStrikeKm: number;
  /** Distance from the margin's reference coastline, km: positive landward, negative seaward. */
  readonly acrossStrikeKm: number;
  readonly elevationM: number | null;
  readonly waterDepthM: number | null;
  /** The span of time the site's column can record events in, cal BP. */
  readonly recordYoungCalBp: number;
  readonly recordOldCalBp: number;
  /**
   * Background accumulation, mm per year: peat (marsh, outcrop), gyttja (lake), soil (trench),
   * hemipelagic mud (core). In cores, mud thickness is this rate times the time between beds.
   */
  readonly accumulationMmPerYr: number;
  /** Lakes: what an earthquake leaves in the basin (a shaking turbidite, or a tsunami sand in a coastal lake). */
  readonly eventBed?: 'TURBIDITE' | 'SAND_SHEET';
  /** Trenches: date the youngest colluvial wedge by luminescence (measured in this year) instead of plant remains. */
  readonly luminescenceYear?: number;
  /** Cores whose top was lost in coring: the column starts at `recordYoungCalBp` at 0 m. */
  readonly topLost?: boolean;
  readonly erosion?: ErosionEpisode;
  readonly cap?: CappingDeposit;
  readonly complications?: readonly SiteComplication[];
}

/** The reference line of a margin: its along-strike origin and the directions it runs in. */
export interface MarginGeometry {
  /** Point at along-strike km 0 on the reference coastline. */
  readonly originLatitude: number;
  readonly originLongitude: number;
  /** Bearing (degrees from north) in which along-strike km increase. */
  readonly strikeAzimuthDeg: number;
  /** Bearing of the landward normal (positive across-strike distances). */
  readonly landwardAzimuthDeg: number;
}

// ---------------------------------------------------------------------------------------------
// Velmora Margin

export const VELMORA_SEGMENTS: readonly DemoSegment[] = [
  { key: 'NORTH', name: 'North', startKm: 0, endKm: 180, notes: 'From the Skarrow headland to the Tolvane bend.' },
  { key: 'CENTRAL', name: 'Central', startKm: 180, endKm: 400, notes: 'Straight reach of the margin opposite the Merrowick lowland.' },
  { key: 'SOUTH', name: 'South', startKm: 400, endKm: 600, notes: 'South of the Caddrick re-entrant to the Orsbeck spur.' },
];

const WHOLE_MARGIN = { segmentKeys: ['NORTH', 'CENTRAL', 'SOUTH'], alongStrikeFromKm: 0, alongStrikeToKm: 600 } as const;
const SOUTH_ONLY = { segmentKeys: ['SOUTH'], alongStrikeFromKm: 400, alongStrikeToKm: 600 } as const;
const NORTH_ONLY = { segmentKeys: ['NORTH'], alongStrikeFromKm: 0, alongStrikeToKm: 180 } as const;

/**
 * The eleven true earthquakes, youngest first. Intervals (yr): 305, 520, 180, 610, 740, 420, 350,
 * 880, 560, 470; mean 503.5, sample SD 207.7, so the aperiodicity (coefficient of variation) is
 * 0.41, the "aperiodicity near 0.4" the product brief asks for (the BPT aperiodicity alpha is the
 * coefficient of variation of the intervals: Matthews, Ellsworth & Reasenberg 2002, BSSA 92(6)).
 * V4 and V8 broke only the South segment and V5 only the North; the rest broke the whole margin.
 */
export const VELMORA_TRUE_EVENTS: readonly TrueEvent[] = [
  { key: 'V1', calBp: 385, ...WHOLE_MARGIN },
  { key: 'V2', calBp: 690, ...WHOLE_MARGIN },
  { key: 'V3', calBp: 1210, ...WHOLE_MARGIN },
  { key: 'V4', calBp: 1390, ...SOUTH_ONLY },
  { key: 'V5', calBp: 2000, ...NORTH_ONLY },
  { key: 'V6', calBp: 2740, ...WHOLE_MARGIN },
  { key: 'V7', calBp: 3160, ...WHOLE_MARGIN },
  { key: 'V8', calBp: 3510, ...SOUTH_ONLY },
  { key: 'V9', calBp: 4390, ...WHOLE_MARGIN },
  { key: 'V10', calBp: 4950, ...WHOLE_MARGIN },
  { key: 'V11', calBp: 5420, ...WHOLE_MARGIN },
];

/**
 * The margin's reference coastline starts in the open western North Atlantic (no real
 * subduction zone there) and runs south-south-west; land lies to the east.
 */
export const VELMORA_GEOMETRY: MarginGeometry = {
  originLatitude: 38.42,
  originLongitude: -51.35,
  strikeAzimuthDeg: 200,
  landwardAzimuthDeg: 110,
};

/** The regional reservoir offset applied to every marine sample of the margin (14C yr). */
export const VELMORA_DELTA_R = { deltaR: 150, deltaRError: 40 } as const;

/** The eight land sites and six offshore cores, north to south within each group. */
export const VELMORA_SITE_LAYOUT: readonly SiteLayout[] = [
  // Land
  {
    key: 'skarrow-marsh', kind: 'MARSH', segmentKey: 'NORTH', alongStrikeKm: 28, acrossStrikeKm: 2.5,
    elevationM: 1.6, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 2300, accumulationMmPerYr: 1.1,
  },
  {
    key: 'ithvar-lake', kind: 'LAKE', segmentKey: 'NORTH', alongStrikeKm: 92, acrossStrikeKm: 31,
    elevationM: 146, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 2300, accumulationMmPerYr: 0.8,
    eventBed: 'TURBIDITE',
  },
  {
    key: 'tollhaven-trench', kind: 'TRENCH', segmentKey: 'NORTH', alongStrikeKm: 163, acrossStrikeKm: 12,
    elevationM: 58, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 1500, accumulationMmPerYr: 0.3,
    luminescenceYear: 2019,
    complications: [{ kind: 'INHERITED_CHARCOAL', horizonRank: 1, inheritance: 'OUTLIER' }],
  },
  {
    key: 'merrowick-marsh', kind: 'MARSH', segmentKey: 'CENTRAL', alongStrikeKm: 232, acrossStrikeKm: 1.8,
    elevationM: 1.3, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 3300, accumulationMmPerYr: 1.0,
    erosion: {
      trueEventKey: 'V2',
      erodedOldCalBp: 860,
      cutCalBp: 560,
      fillTopCalBp: 520,
      fillThicknessM: 0.34,
      reason: 'a tidal channel migrated across the site and cut out the peat and mud that held the V2 contact',
    },
  },
  {
    key: 'dunlossa-bluff', kind: 'OUTCROP', segmentKey: 'CENTRAL', alongStrikeKm: 301, acrossStrikeKm: 0.6,
    elevationM: 6.5, waterDepthM: null, recordYoungCalBp: 3900, recordOldCalBp: 5700, accumulationMmPerYr: 0.9,
    cap: {
      label: 'Dune sand',
      thicknessM: 2.6,
      notes: 'Aeolian sand that buried the old lowland once the shore built out; it records no events.',
    },
  },
  {
    key: 'caddrick-trench', kind: 'TRENCH', segmentKey: 'CENTRAL', alongStrikeKm: 368, acrossStrikeKm: 9,
    elevationM: 41, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 1500, accumulationMmPerYr: 0.3,
    luminescenceYear: 2022,
    complications: [{ kind: 'INHERITED_CHARCOAL', horizonRank: 2, inheritance: 'MODEST' }],
  },
  {
    key: 'pellisand-lake', kind: 'LAKE', segmentKey: 'SOUTH', alongStrikeKm: 452, acrossStrikeKm: 1.2,
    elevationM: 3.4, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 3700, accumulationMmPerYr: 0.7,
    eventBed: 'SAND_SHEET',
  },
  {
    key: 'orsbeck-marsh', kind: 'MARSH', segmentKey: 'SOUTH', alongStrikeKm: 548, acrossStrikeKm: 3.1,
    elevationM: 1.9, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 1600, accumulationMmPerYr: 1.2,
    complications: [{ kind: 'INTRUSIVE_ROOT', horizonRank: 3 }],
  },
  // Offshore
  {
    key: 'hallow-channel-core', kind: 'CORE', segmentKey: 'NORTH', alongStrikeKm: 55, acrossStrikeKm: -64,
    elevationM: null, waterDepthM: 2870, recordYoungCalBp: 0, recordOldCalBp: 3300, accumulationMmPerYr: 0.22,
  },
  {
    key: 'tolvane-canyon-core', kind: 'CORE', segmentKey: 'NORTH', alongStrikeKm: 150, acrossStrikeKm: -58,
    elevationM: null, waterDepthM: 2410, recordYoungCalBp: 0, recordOldCalBp: 2300, accumulationMmPerYr: 0.26,
  },
  {
    key: 'merrow-fan-core', kind: 'CORE', segmentKey: 'CENTRAL', alongStrikeKm: 258, acrossStrikeKm: -81,
    elevationM: null, waterDepthM: 3240, recordYoungCalBp: 0, recordOldCalBp: 6000, accumulationMmPerYr: 0.18,
  },
  {
    key: 'caddrick-channel-core', kind: 'CORE', segmentKey: 'CENTRAL', alongStrikeKm: 340, acrossStrikeKm: -70,
    elevationM: null, waterDepthM: 2960, recordYoungCalBp: 0, recordOldCalBp: 1600, accumulationMmPerYr: 0.3,
  },
  {
    key: 'pellis-canyon-core', kind: 'CORE', segmentKey: 'SOUTH', alongStrikeKm: 482, acrossStrikeKm: -55,
    elevationM: null, waterDepthM: 2250, recordYoungCalBp: 0, recordOldCalBp: 3300, accumulationMmPerYr: 0.24,
  },
  {
    key: 'orsbeck-basin-core', kind: 'CORE', segmentKey: 'SOUTH', alongStrikeKm: 577, acrossStrikeKm: -76,
    elevationM: null, waterDepthM: 3105, recordYoungCalBp: 1800, recordOldCalBp: 6000, accumulationMmPerYr: 0.2,
    topLost: true,
  },
];

// ---------------------------------------------------------------------------------------------
// Brannoch Fault (the second demo project)

export const BRANNOCH_SEGMENTS: readonly DemoSegment[] = [
  { key: 'BRANNOCH', name: 'Brannoch main strand', startKm: 0, endKm: 46, notes: 'Reverse fault along the foot of the Brannoch hills.' },
];

/** Three surface-rupturing earthquakes, youngest first; intervals 2,690 and 3,190 years. */
export const BRANNOCH_TRUE_EVENTS: readonly TrueEvent[] = [
  { key: 'B1', calBp: 1930, segmentKeys: ['BRANNOCH'], alongStrikeFromKm: 0, alongStrikeToKm: 46 },
  { key: 'B2', calBp: 4620, segmentKeys: ['BRANNOCH'], alongStrikeFromKm: 0, alongStrikeToKm: 46 },
  { key: 'B3', calBp: 7810, segmentKeys: ['BRANNOCH'], alongStrikeFromKm: 0, alongStrikeToKm: 46 },
];

/** Inland of the Velmora coast; the fault strikes east-north-east. */
export const BRANNOCH_GEOMETRY: MarginGeometry = {
  originLatitude: 36.92,
  originLongitude: -48.7,
  strikeAzimuthDeg: 70,
  landwardAzimuthDeg: 160,
};

export const BRANNOCH_SITE_LAYOUT: readonly SiteLayout[] = [
  {
    key: 'arnsey-burn-trench', kind: 'TRENCH', segmentKey: 'BRANNOCH', alongStrikeKm: 14, acrossStrikeKm: 0.1,
    elevationM: 312, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 9000, accumulationMmPerYr: 0.12,
  },
  {
    key: 'fallowmere-trench', kind: 'TRENCH', segmentKey: 'BRANNOCH', alongStrikeKm: 33, acrossStrikeKm: -0.2,
    elevationM: 287, waterDepthM: null, recordYoungCalBp: 0, recordOldCalBp: 8600, accumulationMmPerYr: 0.14,
  },
];

// ---------------------------------------------------------------------------------------------
// Geometry

/** Mean Earth radius, km (IUGG mean radius R1 [memory]). */
const EARTH_RADIUS_KM = 6371.0088;

/**
 * The point reached from (latitude, longitude) along a great circle with the given initial
 * bearing and distance: the spherical-trigonometry "destination point" formula
 * (lat2 = asin(sin lat1 cos d + cos lat1 sin d cos b), lon2 = lon1 + atan2(sin b sin d cos lat1,
 * cos d - sin lat1 sin lat2)) [common practice; any text on spherical trigonometry].
 */
export function destinationPoint(
  latitude: number,
  longitude: number,
  bearingDeg: number,
  distanceKm: number,
): { latitude: number; longitude: number } {
  const rad = Math.PI / 180;
  const phi1 = latitude * rad;
  const lambda1 = longitude * rad;
  const theta = bearingDeg * rad;
  const delta = distanceKm / EARTH_RADIUS_KM;
  const phi2 = Math.asin(Math.sin(phi1) * Math.cos(delta) + Math.cos(phi1) * Math.sin(delta) * Math.cos(theta));
  const lambda2 =
    lambda1 +
    Math.atan2(Math.sin(theta) * Math.sin(delta) * Math.cos(phi1), Math.cos(delta) - Math.sin(phi1) * Math.sin(phi2));
  const lon = ((((lambda2 / rad + 540) % 360) + 360) % 360) - 180;
  return { latitude: phi2 / rad, longitude: lon };
}

/** WGS84 coordinates of a point given by along-strike and across-strike distance on a margin. */
export function siteCoordinates(
  geometry: MarginGeometry,
  alongStrikeKm: number,
  acrossStrikeKm: number,
): { latitude: number; longitude: number } {
  const { originLatitude, originLongitude, strikeAzimuthDeg } = geometry;
  const onLine = destinationPoint(originLatitude, originLongitude, strikeAzimuthDeg, alongStrikeKm);
  const bearing = acrossStrikeKm >= 0 ? geometry.landwardAzimuthDeg : geometry.landwardAzimuthDeg + 180;
  return destinationPoint(onLine.latitude, onLine.longitude, bearing, Math.abs(acrossStrikeKm));
}

/**
 * The true events a site would record if nothing were lost: ruptures whose along-strike extent
 * covers the site and whose age lies inside the site's recording window. Youngest first.
 */
export function recordableEvents(layout: SiteLayout, events: readonly TrueEvent[]): TrueEvent[] {
  return events
    .filter(
      (e) =>
        e.alongStrikeFromKm <= layout.alongStrikeKm &&
        layout.alongStrikeKm <= e.alongStrikeToKm &&
        e.calBp > layout.recordYoungCalBp &&
        e.calBp < layout.recordOldCalBp,
    )
    .sort((a, b) => a.calBp - b.calBp);
}
