/**
 * The demo scenario generator: turns the invented true history of truth.ts into the data a
 * research team would have entered — site columns, event horizons, dated samples with the ages a
 * laboratory would report, and correlation hypotheses — plus the truth behind every item, so
 * tests and model runs can compare what is recovered with what happened.
 *
 * Plain data out, no database: the seeding code inserts what this returns. Deterministic for a
 * seed (every draw comes from one SeededRandom in a fixed order).
 *
 * How a radiocarbon age is made from a true calendar age t (the forward form of the calibration
 * likelihood, Stuiver & Polach 1977, Radiocarbon 19(3); IntCal20, Reimer et al. 2020; Marine20,
 * Heaton et al. 2020, both Radiocarbon 62(4)):
 *   c14 = mu(t) + sigma(t) z1 + s z2            land material, IntCal20
 *   c14 = mu(t) + sigma(t) z1 + s z2 + dR       marine material, Marine20, dR ~ N(Delta-R, sigma_Delta-R)
 * with z standard normal and s the laboratory's quoted 1-sigma, then rounded as the laboratory
 * reports. A calibration with N(x; mu(t) + Delta-R, sqrt(s^2 + sigma(t)^2 + sigma_Delta-R^2)) is
 * then exactly the right model for these ages. Luminescence ages count years back from the
 * measurement year, not from 1950 [common practice].
 */
import type { AgeRelation, DatingMethod, Facies, SampleMaterial } from '../database/schema/enums';
import { CalibrationCurve } from '../chronology/calibration/curve';
import { SeededRandom } from '../chronology/common/random';
import {
  BRANNOCH_PROJECT,
  DEMO_PEOPLE,
  DemoLaboratory,
  DemoPerson,
  DemoProject,
  HYPOTHESIS_WORDING,
  LAND_RADIOCARBON_LAB,
  LUMINESCENCE_LAB,
  MARINE_RADIOCARBON_LAB,
  SITE_WORDING,
  VELMORA_PROJECT,
} from './names';
import {
  BRANNOCH_GEOMETRY,
  BRANNOCH_SEGMENTS,
  BRANNOCH_SITE_LAYOUT,
  BRANNOCH_TRUE_EVENTS,
  DemoSegment,
  MarginGeometry,
  SiteKind,
  SiteLayout,
  TrueEvent,
  VELMORA_DELTA_R,
  VELMORA_GEOMETRY,
  VELMORA_SEGMENTS,
  VELMORA_SITE_LAYOUT,
  VELMORA_TRUE_EVENTS,
  recordableEvents,
  siteCoordinates,
} from './truth';

/** The seed the shipped demo is built from. */
export const DEMO_SEED = 4219;

// The vocabularies are the database's (types only: the generator stays free of the database).
export type { AgeRelation, DatingMethod, Facies, SampleMaterial } from '../database/schema/enums';
export type BuiltInCurveCode = 'INTCAL20' | 'MARINE20';
/** 1 is certain, 4 possible (horizons); 1 is the strongest tie. */
export type Rank = 1 | 2 | 3 | 4;

export interface DemoCurves {
  readonly intcal20: CalibrationCurve;
  readonly marine20: CalibrationCurve;
}

export interface DemoUnit {
  readonly key: string;
  /** 1 is the oldest unit at the base; a higher position is shallower. */
  readonly position: number;
  readonly name: string;
  readonly topDepthM: number;
  readonly baseDepthM: number;
  readonly facies: Facies;
  readonly notes: string;
  /** The researcher's logged thickness (m) of mud this unit's base eroded, or null (a core's turbidites only). */
  readonly basalErosionM: number | null;
  /**
   * True ages of the unit's top and base (equal for an instantaneous bed), the event it is the first
   * deposit of, and the true thickness (m) of mud its base eroded (0 when none).
   */
  readonly truth: { readonly topCalBp: number; readonly baseCalBp: number; readonly trueEventKey: string | null; readonly erodedM: number };
}

export interface DemoEventHorizon {
  readonly key: string;
  /** Site-local name, youngest first: E1, E2, ... on land, T1, T2, ... for turbidites in cores. */
  readonly name: string;
  /** The unit holding the pre-event deposits. */
  readonly unitBelowKey: string;
  /** The first post-event deposit, directly above. */
  readonly unitAboveKey: string;
  readonly quality: Rank;
  readonly evidence: readonly string[];
  readonly notes: string;
  /** The true earthquake this horizon records. */
  readonly trueEventKey: string;
}

export interface SampleTruth {
  /** True calendar age of the dated material, cal BP. */
  readonly calBp: number;
  /** True age of the deposit at the sample's depth, cal BP. Equal to calBp for material that dates its deposit. */
  readonly depositCalBp: number;
  /** How much older than its deposit the material is (inherited age), years; 0 if not. */
  readonly inheritanceYears: number;
  /** How much younger than its deposit the material is (intrusion), years; 0 if not. */
  readonly intrusionYears: number;
  /** The reservoir offset this sample really had, 14C yr (marine samples only). */
  readonly deltaR: number | null;
  /** An age that no reasonable prior for its relation explains: a model should flag it. */
  readonly outlier: boolean;
}

export interface DemoSample {
  readonly labCode: string;
  readonly method: DatingMethod;
  readonly material: SampleMaterial;
  readonly unitKey: string;
  /** Depth below the site's datum (surface or core top), m; inside the unit's top and base. */
  readonly depthM: number;
  readonly ageRelation: AgeRelation;
  /** RADIOCARBON: conventional age and 1-sigma, 14C yr BP, rounded as the laboratory reports. */
  readonly c14Age: number | null;
  readonly c14Error: number | null;
  readonly curve: BuiltInCurveCode | null;
  readonly deltaR: number | null;
  readonly deltaRError: number | null;
  readonly delta13C: number | null;
  /** LUMINESCENCE: age in years before `measurementYear` (not before 1950) and its 1-sigma. */
  readonly calendarAgeBp: number | null;
  readonly calendarErrorYears: number | null;
  readonly measurementYear: number | null;
  readonly notes: string;
  readonly truth: SampleTruth;
}

export interface MissingEvent {
  readonly trueEventKey: string;
  readonly reason: string;
}

export interface DemoSite {
  readonly key: string;
  readonly name: string;
  readonly kind: SiteKind;
  readonly segmentKey: string;
  readonly latitude: number;
  readonly longitude: number;
  readonly alongStrikeKm: number;
  readonly elevationM: number | null;
  readonly waterDepthM: number | null;
  readonly notes: string;
  /** Oldest first (position 1 first). */
  readonly units: readonly DemoUnit[];
  /** Youngest first. */
  readonly eventHorizons: readonly DemoEventHorizon[];
  /** Shallowest first. */
  readonly samples: readonly DemoSample[];
  readonly truth: {
    readonly acrossStrikeKm: number;
    readonly recordYoungCalBp: number;
    readonly recordOldCalBp: number;
    readonly accumulationMmPerYr: number;
    /** Events inside the rupture extent and the recording window that left no horizon here. */
    readonly missingEvents: readonly MissingEvent[];
  };
}

export interface HorizonRef {
  readonly siteKey: string;
  readonly horizonKey: string;
}

export interface DemoTie {
  readonly eventAKey: HorizonRef;
  readonly eventBKey: HorizonRef;
  readonly confidence: Rank;
  readonly evidence: readonly string[];
}

export interface DemoHypothesis {
  readonly name: string;
  readonly description: string;
  readonly preferred: boolean;
  readonly ties: readonly DemoTie[];
}

export interface DemoProjectData {
  readonly project: DemoProject;
  readonly segments: readonly DemoSegment[];
  readonly trueEvents: readonly TrueEvent[];
  readonly sites: readonly DemoSite[];
  readonly hypotheses: readonly DemoHypothesis[];
}

/** A project of which only some demo accounts are members. */
export interface DemoSecondProject extends DemoProjectData {
  readonly members: readonly { readonly email: string; readonly role: DemoPerson['role'] }[];
}

export interface DemoScenario extends DemoProjectData {
  readonly seed: number;
  /** The demo accounts; all are members of the Velmora project with these roles. */
  readonly people: readonly DemoPerson[];
  readonly secondProject: DemoSecondProject;
}

/**
 * Build the whole demo: the Velmora Margin project and the small Brannoch Fault project.
 * `curves` must be the IntCal20 and Marine20 curves on their 1-year grids (builtInCurve).
 */
export function generateDemoScenario(seed: number = DEMO_SEED, curves: DemoCurves): DemoScenario {
  const rng = new SeededRandom(seed);
  const context: GenerationContext = { rng, curves, labCodes: new LabCodeIssuer(rng) };

  const sites = VELMORA_SITE_LAYOUT.map((layout) =>
    buildSite(context, layout, VELMORA_TRUE_EVENTS, VELMORA_GEOMETRY, VELMORA_SEGMENTS.length),
  );
  const hypotheses: DemoHypothesis[] = [
    { ...HYPOTHESIS_WORDING.preferred, preferred: true, ties: chainTies(sites, (_site, horizon) => horizon.trueEventKey) },
    {
      ...HYPOTHESIS_WORDING.alternative,
      preferred: false,
      ties: chainTies(sites, (site, horizon) =>
        site.segmentKey === 'SOUTH'
          ? (SOUTHERN_DOUBLET_READING[horizon.trueEventKey] ?? horizon.trueEventKey)
          : horizon.trueEventKey,
      ),
    },
  ];

  const brannochSites = BRANNOCH_SITE_LAYOUT.map((layout) =>
    buildSite(context, layout, BRANNOCH_TRUE_EVENTS, BRANNOCH_GEOMETRY, BRANNOCH_SEGMENTS.length),
  );
  const secondProject: DemoSecondProject = {
    project: { ...BRANNOCH_PROJECT },
    members: [{ email: 'admin@demo.test', role: 'ADMIN' }],
    segments: BRANNOCH_SEGMENTS.map((s) => ({ ...s })),
    trueEvents: BRANNOCH_TRUE_EVENTS.map(copyEvent),
    sites: brannochSites,
    hypotheses: [
      {
        ...HYPOTHESIS_WORDING.brannoch,
        preferred: true,
        ties: chainTies(brannochSites, (_site, horizon) => horizon.trueEventKey),
      },
    ],
  };

  return {
    seed,
    project: { ...VELMORA_PROJECT },
    people: DEMO_PEOPLE.map((p) => ({ ...p })),
    segments: VELMORA_SEGMENTS.map((s) => ({ ...s })),
    trueEvents: VELMORA_TRUE_EVENTS.map(copyEvent),
    sites,
    hypotheses,
    secondProject,
  };
}

/**
 * The competing reading of the South segment: the older of the 1.2/1.4 ka pair (V4) is taken as
 * the margin-wide rupture and the younger (V3) as South-only; the 2.7 ka event (V6) in the south
 * is a separate rupture. Keys map a southern horizon's true event to the group it joins.
 */
const SOUTHERN_DOUBLET_READING: Readonly<Record<string, string>> = { V3: 'V3-south', V4: 'V3', V6: 'V6-south' };

function copyEvent(e: TrueEvent): TrueEvent {
  return { ...e, segmentKeys: [...e.segmentKeys] };
}

interface GenerationContext {
  readonly rng: SeededRandom;
  readonly curves: DemoCurves;
  readonly labCodes: LabCodeIssuer;
}

// ---------------------------------------------------------------------------------------------
// Columns

/** What an event left at the base of a deposit. */
interface EventMark {
  readonly trueEventKey: string;
  readonly evidence: string[];
  readonly quality: Rank;
  readonly bedThicknessM: number;
}

/** A deposit in true time, before it is placed in depth. Spans run oldest first. */
interface Span {
  readonly facies: Facies;
  readonly label: string;
  readonly baseCalBp: number;
  readonly topCalBp: number;
  readonly thicknessM: number;
  readonly notes: string;
  /** Set when this deposit is the first one laid down after an earthquake. */
  readonly event?: EventMark;
  /** A turbidite's erosion of the mud below it: the true thickness removed and the logged estimate (null when missed). */
  readonly erosion?: { readonly trueM: number; readonly loggedM: number | null };
}

/** Thinnest unit the generator writes, m: thinner beds would vanish when depths are logged to the millimetre. */
const MIN_UNIT_THICKNESS_M = 0.008;

function background(
  facies: Facies,
  label: string,
  baseCalBp: number,
  topCalBp: number,
  mmPerYr: number,
  minimumM: number,
  notes: string,
): Span {
  return {
    facies,
    label,
    baseCalBp,
    topCalBp,
    thicknessM: Math.max(minimumM, ((baseCalBp - topCalBp) * mmPerYr) / 1000),
    notes,
  };
}

/** A margin-wide rupture (or a whole-fault one) shakes and drops the coast harder than a one-segment rupture. */
function isMajor(event: TrueEvent, segmentCount: number): boolean {
  return event.segmentKeys.length === segmentCount;
}

function uniformBetween(rng: SeededRandom, low: number, high: number): number {
  return low + (high - low) * rng.uniform();
}

/**
 * Coastal marsh or lowland outcrop: each earthquake drops the marsh soil (peat) into the
 * intertidal zone, sometimes under a tsunami sand, and tidal mud fills the space before the
 * marsh rebuilds — the subsided-soil cycle of coastal paleoseismology [common practice].
 */
function coastalSpans(
  rng: SeededRandom,
  layout: SiteLayout,
  eventsOldFirst: readonly TrueEvent[],
  segmentCount: number,
): Span[] {
  const rate = layout.accumulationMmPerYr;
  const firstEventCalBp = eventsOldFirst.length > 0 ? eventsOldFirst[0].calBp : layout.recordYoungCalBp;
  const spans: Span[] = [
    background('PEAT', 'Peat', layout.recordOldCalBp, firstEventCalBp, rate, 0.1,
      'Brown herbaceous peat, rooted; the marsh surface before the oldest event.'),
  ];
  eventsOldFirst.forEach((event, i) => {
    const nextCalBp = i + 1 < eventsOldFirst.length ? eventsOldFirst[i + 1].calBp : layout.recordYoungCalBp;
    const major = isMajor(event, segmentCount);
    const sand = rng.uniform() < (major ? 0.8 : 0.5);
    const subsidenceM = major ? uniformBetween(rng, 0.45, 0.95) : uniformBetween(rng, 0.2, 0.5);
    const sandM = sand ? uniformBetween(rng, 0.02, major ? 0.14 : 0.07) : 0;
    const evidence = ['subsided marsh soil'];
    if (sand) evidence.push('tsunami sand');
    if (rng.uniform() < 0.5) evidence.push('abrupt contact');
    const quality: Rank = sand && subsidenceM >= 0.5 ? 1 : sand || subsidenceM >= 0.5 ? 2 : 3;
    const mark: EventMark = { trueEventKey: event.key, evidence, quality, bedThicknessM: sand ? sandM : subsidenceM };
    if (sand) {
      spans.push({
        facies: 'SAND_SHEET',
        label: 'Sand sheet',
        baseCalBp: event.calBp,
        topCalBp: event.calBp,
        thicknessM: Math.max(MIN_UNIT_THICKNESS_M, sandM),
        notes: 'Grey fine sand, normally graded, with mud rip-up clasts; thins landward.',
        event: mark,
      });
    }
    const infillYears = Math.min(120, 0.3 * (event.calBp - nextCalBp));
    spans.push({
      facies: 'TIDAL_MUD',
      label: 'Tidal mud',
      baseCalBp: event.calBp,
      topCalBp: event.calBp - infillYears,
      thicknessM: subsidenceM,
      notes: 'Grey silty clay with few roots; grades up into peat.',
      event: sand ? undefined : mark,
    });
    spans.push(
      background('PEAT', 'Peat', event.calBp - infillYears, nextCalBp, rate, 0.05, 'Herbaceous peat of a rebuilt marsh.'),
    );
  });
  return spans;
}

/** Lake or deep-sea core: slow background mud broken by instantaneous event beds. */
function eventBedSpans(
  rng: SeededRandom,
  layout: SiteLayout,
  eventsOldFirst: readonly TrueEvent[],
  segmentCount: number,
): Span[] {
  const core = layout.kind === 'CORE';
  const bedFacies: Facies = core ? 'TURBIDITE' : (layout.eventBed ?? 'TURBIDITE');
  const mud = core
    ? {
        facies: 'HEMIPELAGIC_MUD' as Facies,
        label: 'Hemipelagic mud',
        notes: 'Olive-grey bioturbated hemipelagic clay with planktic foraminifera.',
      }
    : { facies: 'OTHER' as Facies, label: 'Gyttja', notes: 'Dark brown organic lake mud (gyttja), faintly laminated.' };
  const rate = layout.accumulationMmPerYr;
  // Erosion draws come from their own stream, so the rest of the scenario is unchanged by them.
  const erosionRng = new SeededRandom(seedOf(`erosion:${layout.key}`));
  const firstEventCalBp = eventsOldFirst.length > 0 ? eventsOldFirst[0].calBp : layout.recordYoungCalBp;
  const spans: Span[] = [background(mud.facies, mud.label, layout.recordOldCalBp, firstEventCalBp, rate, 0.01, mud.notes)];
  eventsOldFirst.forEach((event, i) => {
    const nextCalBp = i + 1 < eventsOldFirst.length ? eventsOldFirst[i + 1].calBp : layout.recordYoungCalBp;
    const major = isMajor(event, segmentCount);
    const typical = core ? (major ? 0.11 : 0.05) : major ? 0.06 : 0.03;
    // Bed thickness varies from site to site for one event: lognormal scatter about a typical value.
    const thicknessM = Math.min(0.4, Math.max(MIN_UNIT_THICKNESS_M, typical * Math.exp(0.45 * rng.normal())));
    let evidence: string[];
    let quality: Rank;
    let bedNotes: string;
    if (bedFacies === 'SAND_SHEET') {
      evidence = ['tsunami sand'];
      if (rng.uniform() < 0.6) evidence.push('marine diatoms');
      quality = thicknessM >= 0.05 ? 1 : thicknessM >= 0.025 ? 2 : 3;
      bedNotes = 'Sand with marine shell fragments, sharp base, washed in over the beach ridge.';
    } else {
      evidence = [core ? 'turbidite' : 'lacustrine turbidite'];
      if (thicknessM >= (core ? 0.06 : 0.04)) evidence.push('sharp erosional base');
      if (rng.uniform() < 0.5) evidence.push('fining-upward sequence');
      const scale = core ? 1 : 0.6;
      quality = thicknessM >= 0.08 * scale ? 1 : thicknessM >= 0.035 * scale ? 2 : thicknessM >= 0.015 * scale ? 3 : 4;
      bedNotes = core
        ? 'Sandy base fining up to silt and a pale clay cap; sharp base.'
        : 'Graded silt bed with plant debris; sharp base.';
    }
    const erosion = core ? basalErosion(erosionRng, spans, rate) : undefined;
    spans.push({
      facies: bedFacies,
      label: bedFacies === 'SAND_SHEET' ? 'Sand bed' : 'Turbidite',
      baseCalBp: event.calBp,
      topCalBp: event.calBp,
      thicknessM,
      notes: bedNotes,
      event: { trueEventKey: event.key, evidence, quality, bedThicknessM: thicknessM },
      ...(erosion ? { erosion } : {}),
    });
    spans.push(background(mud.facies, mud.label, event.calBp, nextCalBp, rate, 0.008, mud.notes));
  });
  return spans;
}

/** A whole-number seed from a text (FNV-1a). */
function seedOf(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return h | 0;
}

/**
 * A turbidity current scours the top of the mud below it: in about half the beds, 3-30 mm (never
 * more than half the mud's thickness) [common practice: basal scour of distal turbidites is
 * millimetres to a few centimetres]. The mud below loses that thickness from its top, so its top
 * age grows older; the researcher logs the scour with a lognormal error of about 35 % and misses
 * it under 5 mm.
 */
function basalErosion(rng: SeededRandom, spans: Span[], mmPerYr: number): Span['erosion'] {
  const below = spans[spans.length - 1];
  const fullM = ((below.baseCalBp - below.topCalBp) * mmPerYr) / 1000;
  if (rng.uniform() >= 0.5 || below.facies !== 'HEMIPELAGIC_MUD' || below.thicknessM > fullM + 1e-9) return undefined;
  const trueM = Math.min(uniformBetween(rng, 0.003, 0.03), 0.5 * below.thicknessM);
  const loggedEstimate = trueM * Math.exp(0.35 * rng.normal());
  spans[spans.length - 1] = {
    ...below,
    thicknessM: below.thicknessM - trueM,
    topCalBp: below.topCalBp + (trueM * 1000) / mmPerYr,
  };
  return { trueM, loggedM: trueM >= 0.005 ? Math.round(loggedEstimate * 1000) / 1000 : null };
}

/**
 * Fault trench: each surface rupture builds a colluvial wedge at the foot of the scarp within
 * decades, and a soil forms on it until the next rupture [common practice].
 */
function trenchSpans(
  rng: SeededRandom,
  layout: SiteLayout,
  eventsOldFirst: readonly TrueEvent[],
  segmentCount: number,
): Span[] {
  const rate = layout.accumulationMmPerYr;
  const wedgeYears = 40;
  const firstEventCalBp = eventsOldFirst.length > 0 ? eventsOldFirst[0].calBp : layout.recordYoungCalBp;
  const spans: Span[] = [
    {
      facies: 'OTHER',
      label: 'Terrace gravel',
      baseCalBp: layout.recordOldCalBp,
      topCalBp: layout.recordOldCalBp - wedgeYears,
      thicknessM: uniformBetween(rng, 0.5, 0.9),
      notes: 'Rounded cobble gravel of the terrace tread, faulted.',
    },
    background('SOIL', 'Soil', layout.recordOldCalBp - wedgeYears, firstEventCalBp, rate, 0.12,
      'Dark silty A horizon over a weak B horizon.'),
  ];
  eventsOldFirst.forEach((event, i) => {
    const nextCalBp = i + 1 < eventsOldFirst.length ? eventsOldFirst[i + 1].calBp : layout.recordYoungCalBp;
    const major = isMajor(event, segmentCount);
    const wedgeM = major ? uniformBetween(rng, 0.35, 0.75) : uniformBetween(rng, 0.25, 0.55);
    const fissure = rng.uniform() < 0.4;
    const evidence = ['colluvial wedge', 'upward termination'];
    if (fissure) evidence.push('fissure fill');
    const quality: Rank = wedgeM >= 0.45 ? 1 : fissure ? 2 : 3;
    spans.push({
      facies: 'COLLUVIUM',
      label: 'Colluvial wedge',
      baseCalBp: event.calBp,
      topCalBp: event.calBp - wedgeYears,
      thicknessM: wedgeM,
      notes: 'Scarp-derived gravelly colluvium, thickest at the fault and tapering away from it.',
      event: { trueEventKey: event.key, evidence, quality, bedThicknessM: wedgeM },
    });
    spans.push(
      background('SOIL', 'Soil', event.calBp - wedgeYears, nextCalBp, rate, 0.1, 'Silty A horizon formed on the wedge.'),
    );
  });
  return spans;
}

/** Keep the part of a span between two ages, with thickness in proportion (uniform accumulation within a span). */
function clipSpan(span: Span, topCalBp: number, baseCalBp: number): Span {
  const fraction = span.baseCalBp === span.topCalBp ? 1 : (baseCalBp - topCalBp) / (span.baseCalBp - span.topCalBp);
  return {
    ...span,
    topCalBp,
    baseCalBp,
    thicknessM: Math.max(MIN_UNIT_THICKNESS_M, span.thicknessM * fraction),
    // The event contact is at the base: it survives only if the base does.
    event: baseCalBp === span.baseCalBp ? span.event : undefined,
  };
}

/** Remove every deposit aged between the fill's top and the deepest material cut, and put the channel fill in its place. */
function applyErosion(spans: readonly Span[], layout: SiteLayout): Span[] {
  const erosion = layout.erosion;
  if (!erosion) return [...spans];
  const older = spans
    .filter(
      (s) => s.baseCalBp > erosion.erodedOldCalBp || (s.baseCalBp === s.topCalBp && s.baseCalBp >= erosion.erodedOldCalBp),
    )
    .map((s) => clipSpan(s, Math.max(s.topCalBp, erosion.erodedOldCalBp), s.baseCalBp));
  const younger = spans
    .filter((s) => s.topCalBp < erosion.fillTopCalBp || (s.baseCalBp === s.topCalBp && s.topCalBp <= erosion.fillTopCalBp))
    .map((s) => clipSpan(s, s.topCalBp, Math.min(s.baseCalBp, erosion.fillTopCalBp)));
  const fill: Span = {
    facies: 'TIDAL_MUD',
    label: 'Channel fill',
    baseCalBp: erosion.cutCalBp,
    topCalBp: erosion.fillTopCalBp,
    thicknessM: erosion.fillThicknessM,
    notes: 'Laminated mud and sand with shell hash over an erosional base that truncates the peat below.',
  };
  return [...older, fill, ...younger];
}

function siteSpans(
  rng: SeededRandom,
  layout: SiteLayout,
  eventsOldFirst: readonly TrueEvent[],
  segmentCount: number,
): Span[] {
  let spans: Span[];
  switch (layout.kind) {
    case 'MARSH':
    case 'OUTCROP':
      spans = coastalSpans(rng, layout, eventsOldFirst, segmentCount);
      break;
    case 'LAKE':
    case 'CORE':
      spans = eventBedSpans(rng, layout, eventsOldFirst, segmentCount);
      break;
    case 'TRENCH':
      spans = trenchSpans(rng, layout, eventsOldFirst, segmentCount);
      break;
  }
  spans = applyErosion(spans, layout);
  if (layout.cap) {
    spans.push({
      facies: 'OTHER',
      label: layout.cap.label,
      baseCalBp: layout.recordYoungCalBp,
      topCalBp: 0,
      thicknessM: layout.cap.thicknessM,
      notes: layout.cap.notes,
    });
  }
  return spans;
}

/** Depths logged to the millimetre. */
function roundDepth(m: number): number {
  return Math.round(m * 1000) / 1000;
}

/** Place spans in depth from the top down and read off units and event horizons. */
function assembleColumn(kind: SiteKind, spans: readonly Span[]): { units: DemoUnit[]; horizons: DemoEventHorizon[] } {
  const n = spans.length;
  const tops = new Array<number>(n);
  const bases = new Array<number>(n);
  let depth = 0;
  for (let i = n - 1; i >= 0; i--) {
    tops[i] = roundDepth(depth);
    depth += spans[i].thicknessM;
    bases[i] = roundDepth(depth);
  }

  // Horizons: a contact under the first deposit of an event. Numbered from the top.
  const horizonIndices: number[] = [];
  for (let i = n - 1; i >= 1; i--) if (spans[i].event) horizonIndices.push(i);
  const prefix = kind === 'CORE' ? 'T' : 'E';
  const horizonNameAt = new Map<number, string>(); // unit index above the contact -> name
  horizonIndices.forEach((i, rank) => horizonNameAt.set(i, `${prefix}${rank + 1}`));

  const unitName = (i: number): string => {
    const label = spans[i].label;
    const own = horizonNameAt.get(i);
    if (own && spans[i].topCalBp === spans[i].baseCalBp) return `${label} ${own}`;
    const above = horizonNameAt.get(i + 1);
    if (above) return `${label} below ${above}`;
    for (let j = i; j >= 1; j--) {
      const below = horizonNameAt.get(j);
      if (below) return `${label} above ${below}`;
    }
    return label;
  };

  const units: DemoUnit[] = spans.map((span, i) => ({
    key: `U${i + 1}`,
    position: i + 1,
    name: unitName(i),
    topDepthM: tops[i],
    baseDepthM: bases[i],
    facies: span.facies,
    notes: span.notes,
    basalErosionM: span.erosion?.loggedM ?? null,
    truth: { topCalBp: span.topCalBp, baseCalBp: span.baseCalBp, trueEventKey: span.event?.trueEventKey ?? null, erodedM: span.erosion?.trueM ?? 0 },
  }));

  const horizons: DemoEventHorizon[] = horizonIndices.map((i) => {
    const mark = spans[i].event as EventMark;
    const name = horizonNameAt.get(i) as string;
    const bed = `${spans[i].label.toLowerCase()} ${Math.round(mark.bedThicknessM * 100)} cm thick`;
    return {
      key: name,
      name,
      unitBelowKey: units[i - 1].key,
      unitAboveKey: units[i].key,
      quality: mark.quality,
      evidence: [...mark.evidence],
      notes: `Contact at ${bases[i].toFixed(3)} m: ${spans[i - 1].label.toLowerCase()} below, ${bed} above.`,
      trueEventKey: mark.trueEventKey,
    };
  });
  return { units, horizons };
}

/** True age of the deposit at a depth inside a unit: linear in depth between the unit's top and base ages. */
export function depositAgeAt(unit: DemoUnit, depthM: number): number {
  const { topCalBp, baseCalBp } = unit.truth;
  if (baseCalBp === topCalBp) return topCalBp;
  const f = (depthM - unit.topDepthM) / (unit.baseDepthM - unit.topDepthM);
  return topCalBp + f * (baseCalBp - topCalBp);
}

function depthForAge(unit: DemoUnit, calBp: number): number {
  const { topCalBp, baseCalBp } = unit.truth;
  const f = baseCalBp === topCalBp ? 0.5 : (calBp - topCalBp) / (baseCalBp - topCalBp);
  return clampDepth(unit, unit.topDepthM + f * (unit.baseDepthM - unit.topDepthM));
}

/** A depth rounded to the millimetre that stays inside the unit. */
function clampDepth(unit: DemoUnit, depthM: number): number {
  return Math.min(unit.baseDepthM, Math.max(unit.topDepthM, roundDepth(depthM)));
}

// ---------------------------------------------------------------------------------------------
// Measurements

/** Hands out laboratory codes: each laboratory numbers its samples upward with gaps, as a busy laboratory does. */
class LabCodeIssuer {
  private readonly counters = new Map<string, number>();

  constructor(private readonly rng: SeededRandom) {}

  issue(lab: DemoLaboratory, measurementYear?: number): string {
    const start = lab === LAND_RADIOCARBON_LAB ? 31000 : lab === MARINE_RADIOCARBON_LAB ? 4200 : 0;
    const span = lab === LUMINESCENCE_LAB ? 20 : 6000;
    const key = `${lab.prefix}${measurementYear ?? ''}`;
    const previous = this.counters.get(key) ?? start + this.rng.integer(span);
    const next = previous + 1 + this.rng.integer(lab === LUMINESCENCE_LAB ? 3 : 9);
    this.counters.set(key, next);
    if (lab === LUMINESCENCE_LAB) {
      const year = String((measurementYear ?? 2000) % 100).padStart(2, '0');
      return `${lab.prefix}${year}-${String(next).padStart(3, '0')}`;
    }
    return `${lab.prefix}-${next}`;
  }
}

function roundTo(value: number, step: number): number {
  return Math.round(value / step) * step;
}

/** Curve values at a whole calendar year; an age off the curve is a generator bug, so it throws. */
function curveAt(curve: CalibrationCurve, calBp: number): { mu: number; sigma: number } {
  const i = Math.round(calBp) - curve.startCalBp;
  if (i < 0 || i >= curve.mu.length) throw new RangeError(`${calBp} cal BP is outside ${curve.code}`);
  return { mu: curve.mu[i], sigma: curve.sigma[i] };
}

/**
 * Typical delta13C (permil VPDB) by material [common practice]: C3 plants near -27, charcoal
 * near -25, foraminiferal carbonate near 0.
 */
const DELTA13C: Readonly<Partial<Record<SampleMaterial, { mean: number; sd: number }>>> = {
  IN_SITU_PLANT: { mean: -27.2, sd: 1.2 },
  PLANT_MACROFOSSIL: { mean: -26.8, sd: 1.5 },
  DETRITAL_CHARCOAL: { mean: -25.4, sd: 0.8 },
  PLANKTIC_FORAMS: { mean: 0.7, sd: 0.4 },
};

interface SamplePlan {
  readonly method: 'RADIOCARBON' | 'LUMINESCENCE';
  readonly unit: DemoUnit;
  readonly depthM: number;
  readonly material: SampleMaterial;
  readonly ageRelation: AgeRelation;
  /** True age of the dated material, cal BP (whole years). */
  readonly calBp: number;
  readonly depositCalBp: number;
  readonly outlier: boolean;
  readonly notes: string;
}

function radiocarbonSample(context: GenerationContext, plan: SamplePlan): DemoSample {
  const { rng, curves } = context;
  const marine = plan.material === 'PLANKTIC_FORAMS';
  const lab = marine ? MARINE_RADIOCARBON_LAB : LAND_RADIOCARBON_LAB;
  const labCode = context.labCodes.issue(lab);
  const curve = marine ? curves.marine20 : curves.intcal20;
  const { mu, sigma } = curveAt(curve, plan.calBp);
  // Quoted errors grow with age (less 14C left to count) and vary from run to run.
  const base = marine ? 22 + 0.004 * plan.calBp : (plan.material === 'DETRITAL_CHARCOAL' ? 25 : 20) + 0.003 * plan.calBp;
  const quoted = roundTo(base + 12 * rng.uniform(), lab.roundingYears);
  const c14Error = Math.min(60, Math.max(lab.roundingYears === 5 ? 20 : 18, quoted));
  let measured = mu + sigma * rng.normal() + c14Error * rng.normal();
  let trueDeltaR: number | null = null;
  if (marine) {
    trueDeltaR = VELMORA_DELTA_R.deltaR + VELMORA_DELTA_R.deltaRError * rng.normal();
    measured += trueDeltaR;
  }
  const d13 = DELTA13C[plan.material] ?? { mean: -26, sd: 1 };
  return {
    labCode,
    method: 'RADIOCARBON',
    material: plan.material,
    unitKey: plan.unit.key,
    depthM: plan.depthM,
    ageRelation: plan.ageRelation,
    c14Age: roundTo(measured, lab.roundingYears),
    c14Error,
    curve: marine ? 'MARINE20' : 'INTCAL20',
    deltaR: marine ? VELMORA_DELTA_R.deltaR : null,
    deltaRError: marine ? VELMORA_DELTA_R.deltaRError : null,
    delta13C: Math.round((d13.mean + d13.sd * rng.normal()) * 10) / 10,
    calendarAgeBp: null,
    calendarErrorYears: null,
    measurementYear: null,
    notes: plan.notes,
    truth: truthOf(plan, trueDeltaR === null ? null : Math.round(trueDeltaR * 10) / 10),
  };
}

/**
 * An OSL age as the laboratory reports it: years before the measurement year, with a 1-sigma of
 * about 7 % plus 15 years [common practice].
 */
function luminescenceSample(context: GenerationContext, plan: SamplePlan, measurementYear: number): DemoSample {
  const { rng } = context;
  const labCode = context.labCodes.issue(LUMINESCENCE_LAB, measurementYear);
  const ageBeforeMeasurement = plan.calBp + (measurementYear - 1950);
  const error = roundTo(0.07 * ageBeforeMeasurement + 15, LUMINESCENCE_LAB.roundingYears);
  return {
    labCode,
    method: 'LUMINESCENCE',
    material: plan.material,
    unitKey: plan.unit.key,
    depthM: plan.depthM,
    ageRelation: plan.ageRelation,
    c14Age: null,
    c14Error: null,
    curve: null,
    deltaR: null,
    deltaRError: null,
    delta13C: null,
    calendarAgeBp: roundTo(ageBeforeMeasurement + error * rng.normal(), LUMINESCENCE_LAB.roundingYears),
    calendarErrorYears: error,
    measurementYear,
    notes: plan.notes,
    truth: truthOf(plan, null),
  };
}

function truthOf(plan: SamplePlan, deltaR: number | null): SampleTruth {
  return {
    calBp: plan.calBp,
    depositCalBp: plan.depositCalBp,
    inheritanceYears: Math.max(0, plan.calBp - plan.depositCalBp),
    intrusionYears: Math.max(0, plan.depositCalBp - plan.calBp),
    deltaR,
    outlier: plan.outlier,
  };
}

/** A sample of material that dates its deposit. */
function depositPlan(unit: DemoUnit, depthM: number, material: SampleMaterial, notes: string): SamplePlan {
  const calBp = Math.round(depositAgeAt(unit, depthM));
  return {
    method: 'RADIOCARBON',
    unit,
    depthM,
    material,
    ageRelation: 'DATES_DEPOSIT',
    calBp,
    depositCalBp: calBp,
    outlier: false,
    notes,
  };
}

function centimetres(m: number): string {
  return `${Math.round(m * 100)} cm`;
}

/** The sample just below a horizon: the best maximum age for the event. */
function belowPlan(rng: SeededRandom, kind: SiteKind, unit: DemoUnit, horizon: DemoEventHorizon): SamplePlan {
  const thickness = unit.baseDepthM - unit.topDepthM;
  const offset = (low: number, high: number) => Math.min(uniformBetween(rng, low, high), 0.45 * thickness);
  switch (kind) {
    case 'MARSH':
    case 'OUTCROP': {
      const depth = clampDepth(unit, unit.topDepthM + offset(0.01, 0.03));
      const below = centimetres(depth - unit.topDepthM);
      return depositPlan(unit, depth, 'IN_SITU_PLANT',
        `Rhizomes in growth position ${below} below the top of the peat buried at ${horizon.name}.`);
    }
    case 'LAKE': {
      const depth = clampDepth(unit, unit.topDepthM + offset(0.005, 0.02));
      return depositPlan(unit, depth, 'PLANT_MACROFOSSIL',
        `Terrestrial leaf fragments and seeds just below the base of event bed ${horizon.name}.`);
    }
    case 'TRENCH': {
      const depth = clampDepth(unit, unit.topDepthM + offset(0.01, 0.025));
      return depositPlan(unit, depth, 'PLANT_MACROFOSSIL',
        `Seeds sieved from the top of the soil buried by the wedge of ${horizon.name}.`);
    }
    case 'CORE': {
      const depth = clampDepth(unit, unit.topDepthM + offset(0.005, 0.015));
      return depositPlan(unit, depth, 'PLANKTIC_FORAMS',
        `Mixed planktic foraminifera from a 1 cm slice below the base of turbidite ${horizon.name}.`);
    }
  }
}

/** Youngest age the generator dates: younger material sits on the flat, bomb-affected end of the curve. */
const YOUNGEST_SAMPLE_CALBP = 150;

/** The sample above the youngest horizon: its minimum age. */
function topPlan(rng: SeededRandom, layout: SiteLayout, units: readonly DemoUnit[], youngest: DemoEventHorizon): SamplePlan {
  const above = units.findIndex((u) => u.key === youngest.unitAboveKey);
  if (layout.kind === 'TRENCH' && layout.luminescenceYear !== undefined) {
    const wedge = units[above];
    const depth = clampDepth(wedge, wedge.topDepthM + uniformBetween(rng, 0.3, 0.6) * (wedge.baseDepthM - wedge.topDepthM));
    return {
      ...depositPlan(wedge, depth, 'OTHER',
        `Quartz sand lens in the colluvial wedge of ${youngest.name}, sampled in an opaque tube for OSL.`),
      method: 'LUMINESCENCE',
    };
  }
  let unit = units[above];
  for (let i = above; i < units.length; i++) {
    const u = units[i];
    if (u.truth.baseCalBp > u.truth.topCalBp && u.facies !== 'COLLUVIUM') {
      unit = u;
      break;
    }
  }
  const young = Math.max(unit.truth.topCalBp, YOUNGEST_SAMPLE_CALBP);
  const target = unit.truth.baseCalBp - uniformBetween(rng, 0.25, 0.6) * (unit.truth.baseCalBp - young);
  const depth = depthForAge(unit, target);
  switch (layout.kind) {
    case 'MARSH':
    case 'OUTCROP':
      return depositPlan(unit, depth, 'PLANT_MACROFOSSIL',
        `Seeds and leaf bases picked from the mud above ${youngest.name}.`);
    case 'LAKE':
      return depositPlan(unit, depth, 'PLANT_MACROFOSSIL',
        `Terrestrial plant remains from the lake mud above ${youngest.name}.`);
    case 'TRENCH':
      return depositPlan(unit, depth, 'PLANT_MACROFOSSIL', `Seeds from the soil formed on the wedge of ${youngest.name}.`);
    case 'CORE':
      return depositPlan(unit, depth, 'PLANKTIC_FORAMS',
        `Mixed planktic foraminifera from the hemipelagic mud above ${youngest.name}.`);
  }
}

function siteSamples(
  context: GenerationContext,
  layout: SiteLayout,
  units: readonly DemoUnit[],
  horizons: readonly DemoEventHorizon[],
): DemoSample[] {
  const { rng } = context;
  const unitByKey = new Map(units.map((u) => [u.key, u]));
  const plans: SamplePlan[] = horizons.map((h) => belowPlan(rng, layout.kind, unitByKey.get(h.unitBelowKey) as DemoUnit, h));
  if (horizons.length > 0) plans.push(topPlan(rng, layout, units, horizons[0]));

  for (const complication of layout.complications ?? []) {
    const horizon = horizons[complication.horizonRank - 1];
    if (complication.kind === 'INHERITED_CHARCOAL') {
      const wedge = unitByKey.get(horizon.unitAboveKey) as DemoUnit;
      const thickness = wedge.baseDepthM - wedge.topDepthM;
      const depth = clampDepth(wedge, wedge.topDepthM + uniformBetween(rng, 0.35, 0.65) * thickness);
      const depositCalBp = Math.round(depositAgeAt(wedge, depth));
      const outlier = complication.inheritance === 'OUTLIER';
      // Charcoal carries the age of the wood and of its storage in older soils before it was washed in.
      const inheritance = outlier ? uniformBetween(rng, 1250, 1600) : 80 + rng.exponential(100);
      plans.push({
        method: 'RADIOCARBON',
        unit: wedge,
        depthM: depth,
        material: 'DETRITAL_CHARCOAL',
        ageRelation: 'OLDER_THAN_DEPOSIT',
        calBp: Math.round(depositCalBp + inheritance),
        depositCalBp,
        outlier,
        notes: outlier
          ? `Single rounded charcoal fragment in the wedge of ${horizon.name}; probably reworked from old deposits upslope.`
          : `Detrital charcoal fragments in the wedge of ${horizon.name}; older than the wedge by an unknown inherited age.`,
      });
    } else {
      const peat = unitByKey.get(horizon.unitBelowKey) as DemoUnit;
      const depth = clampDepth(peat, peat.topDepthM + uniformBetween(rng, 0.4, 0.7) * (peat.baseDepthM - peat.topDepthM));
      const depositCalBp = Math.round(depositAgeAt(peat, depth));
      plans.push({
        method: 'RADIOCARBON',
        unit: peat,
        depthM: depth,
        material: 'PLANT_MACROFOSSIL',
        ageRelation: 'YOUNGER_THAN_DEPOSIT',
        calBp: Math.round(uniformBetween(rng, 160, 320)),
        depositCalBp,
        outlier: false,
        notes: `Fine root in the peat below ${horizon.name}, traced upward towards the modern marsh surface.`,
      });
    }
  }

  return plans
    .map((plan) =>
      plan.method === 'LUMINESCENCE' && layout.luminescenceYear !== undefined
        ? luminescenceSample(context, plan, layout.luminescenceYear)
        : radiocarbonSample(context, plan),
    )
    .sort((a, b) => a.depthM - b.depthM);
}

function roundCoordinate(x: number): number {
  return Math.round(x * 1e5) / 1e5;
}

function buildSite(
  context: GenerationContext,
  layout: SiteLayout,
  events: readonly TrueEvent[],
  geometry: MarginGeometry,
  segmentCount: number,
): DemoSite {
  const recordable = recordableEvents(layout, events);
  const spans = siteSpans(context.rng, layout, [...recordable].reverse(), segmentCount);
  const { units, horizons } = assembleColumn(layout.kind, spans);
  const samples = siteSamples(context, layout, units, horizons);
  const recorded = new Set(horizons.map((h) => h.trueEventKey));
  const missingEvents = recordable
    .filter((e) => !recorded.has(e.key))
    .map((e) => ({
      trueEventKey: e.key,
      reason: layout.erosion?.trueEventKey === e.key ? layout.erosion.reason : 'not preserved',
    }));
  const { latitude, longitude } = siteCoordinates(geometry, layout.alongStrikeKm, layout.acrossStrikeKm);
  const wording = SITE_WORDING[layout.key];
  return {
    key: layout.key,
    name: wording.name,
    kind: layout.kind,
    segmentKey: layout.segmentKey,
    latitude: roundCoordinate(latitude),
    longitude: roundCoordinate(longitude),
    alongStrikeKm: layout.alongStrikeKm,
    elevationM: layout.elevationM,
    waterDepthM: layout.waterDepthM,
    notes: wording.notes,
    units,
    eventHorizons: horizons,
    samples,
    truth: {
      acrossStrikeKm: layout.acrossStrikeKm,
      recordYoungCalBp: layout.recordYoungCalBp,
      recordOldCalBp: layout.recordOldCalBp,
      accumulationMmPerYr: layout.accumulationMmPerYr,
      missingEvents,
    },
  };
}

// ---------------------------------------------------------------------------------------------
// Correlation

/**
 * Ties as a chain along strike: horizons that `groupOf` puts in the same regional event are
 * linked site to neighbouring site, so every group is connected with the fewest ties. Stronger
 * horizons and closer sites give stronger ties.
 */
function chainTies(sites: readonly DemoSite[], groupOf: (site: DemoSite, horizon: DemoEventHorizon) => string): DemoTie[] {
  const bySite = [...sites].sort((a, b) => a.alongStrikeKm - b.alongStrikeKm);
  const groups = new Map<string, { site: DemoSite; horizon: DemoEventHorizon }[]>();
  for (const site of bySite) {
    for (const horizon of site.eventHorizons) {
      const group = groupOf(site, horizon);
      const members = groups.get(group) ?? [];
      members.push({ site, horizon });
      groups.set(group, members);
    }
  }
  const ties: DemoTie[] = [];
  for (const members of groups.values()) {
    for (let i = 1; i < members.length; i++) {
      const a = members[i - 1];
      const b = members[i];
      const distanceKm = Math.abs(b.site.alongStrikeKm - a.site.alongStrikeKm);
      const confidence = Math.min(4, Math.max(a.horizon.quality, b.horizon.quality) + (distanceKm > 100 ? 1 : 0)) as Rank;
      const evidence = ['age overlap', 'stratigraphic order'];
      if (a.site.kind === 'CORE' && b.site.kind === 'CORE') evidence.push('log match');
      ties.push({
        eventAKey: { siteKey: a.site.key, horizonKey: a.horizon.key },
        eventBKey: { siteKey: b.site.key, horizonKey: b.horizon.key },
        confidence,
        evidence,
      });
    }
  }
  return ties;
}
