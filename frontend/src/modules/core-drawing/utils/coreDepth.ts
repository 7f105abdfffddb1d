/**
 * A turbidite core's two depth scales, as the drawing needs them: true depth below the core top,
 * and event-free depth, where every event bed's thickness above a point is taken out because a
 * bed is laid down in hours to days and records no time (Goldfinger et al. 2012, USGS
 * Professional Paper 1661-F, for the practice). The definition follows the server's
 * (`backend/src/chronology/age-model/hemipelagic/core-depth.ts`): only facies TURBIDITE is
 * removed, and event-free depth is measured from the top of the uppermost unit.
 */

/** What the drawing needs of a unit of a core. */
export type CoreUnit = {
  id: string;
  position: number;
  name: string;
  topDepthM: number;
  baseDepthM: number;
  facies: string;
  basalErosionM?: number | null;
};

/** The facies a core's event-free depth removes. */
export const EVENT_BED_FACIES = 'TURBIDITE';
/** The facies that makes a column a hemipelagic core. */
export const MUD_FACIES = 'HEMIPELAGIC_MUD';

/** One unit placed on both scales. A bed's event-free top and base are the same depth. */
export type CoreSegment<TUnit extends CoreUnit = CoreUnit> = {
  unit: TUnit;
  isBed: boolean;
  topDepthM: number;
  baseDepthM: number;
  eventFreeTopM: number;
  eventFreeBaseM: number;
};

export type CoreScale<TUnit extends CoreUnit = CoreUnit> = {
  /** Top of the uppermost unit and base of the lowest (true depth, m). */
  topDepthM: number;
  baseDepthM: number;
  /** Event-free depth of the core's base (m). */
  eventFreeLengthM: number;
  /** Every unit with a thickness, top down. */
  segments: CoreSegment<TUnit>[];
  /** Event-free depth (m) of a true depth (m); constant through a bed. */
  eventFreeDepth: (depthM: number) => number;
};

function hasThickness(unit: CoreUnit): boolean {
  return Number.isFinite(unit.topDepthM) && Number.isFinite(unit.baseDepthM) && unit.baseDepthM > unit.topDepthM;
}

/** Both depth scales of a core; null when no unit has a thickness. */
export function coreScale<TUnit extends CoreUnit>(units: readonly TUnit[]): CoreScale<TUnit> | null {
  const topDown = units.filter(hasThickness).sort((a, b) => a.topDepthM - b.topDepthM || b.position - a.position);
  const first = topDown[0];
  const last = topDown[topDown.length - 1];
  if (!first || !last) return null;
  const topDepthM = first.topDepthM;
  const beds = topDown.filter((unit) => unit.facies === EVENT_BED_FACIES);
  const eventFreeDepth = (depthM: number): number => {
    let removed = 0;
    for (const bed of beds) {
      if (bed.topDepthM >= depthM) break;
      removed += Math.min(depthM, bed.baseDepthM) - bed.topDepthM;
    }
    return depthM - topDepthM - removed;
  };
  const baseDepthM = Math.max(...topDown.map((unit) => unit.baseDepthM));
  const segments = topDown.map((unit) => ({
    unit,
    isBed: unit.facies === EVENT_BED_FACIES,
    topDepthM: unit.topDepthM,
    baseDepthM: unit.baseDepthM,
    eventFreeTopM: eventFreeDepth(unit.topDepthM),
    eventFreeBaseM: eventFreeDepth(unit.baseDepthM),
  }));
  return { topDepthM, baseDepthM, eventFreeLengthM: eventFreeDepth(baseDepthM), segments, eventFreeDepth };
}

/** Whether a site's column can take the hemipelagic depth model's first condition: mud with depths. */
export function hasMudWithDepths(units: readonly Pick<CoreUnit, 'facies' | 'topDepthM' | 'baseDepthM'>[]): boolean {
  return units.some((unit) => unit.facies === MUD_FACIES && hasThickness(unit as CoreUnit));
}

/** A link between the two scales: a true depth and the event-free depth it maps to. */
export type DepthLink = { depthM: number; eventFreeDepthM: number };

/**
 * The links drawn between the true and the event-free column: one at each of the given round
 * true depths (the true axis's ticks) that falls inside the core and outside any bed, so a reader
 * can follow a tick across. Beds are drawn as wedges of their own, not as links.
 */
export function depthLinks(scale: CoreScale, trueTicks: readonly number[]): DepthLink[] {
  return trueTicks
    .filter((depth) => depth >= scale.topDepthM && depth <= scale.baseDepthM)
    .filter((depth) => !scale.segments.some((segment) => segment.isBed && depth > segment.topDepthM && depth < segment.baseDepthM))
    .map((depthM) => ({ depthM, eventFreeDepthM: scale.eventFreeDepth(depthM) }));
}

/** A contact whose upper unit eroded mud from below it. */
export type ErosionMark = { unitId: string; unitName: string; depthM: number; eventFreeDepthM: number; erosionM: number };

/** The bases that carry an erosion estimate above zero, top down. */
export function erosionMarks(scale: CoreScale): ErosionMark[] {
  return scale.segments.flatMap((segment) => {
    const erosion = segment.unit.basalErosionM;
    return erosion !== null && erosion !== undefined && erosion > 0
      ? [{ unitId: segment.unit.id, unitName: segment.unit.name, depthM: segment.baseDepthM, eventFreeDepthM: segment.eventFreeBaseM, erosionM: erosion }]
      : [];
  });
}

/** A thickness in metres as the drawing's labels write it: centimetres below a metre. */
export function thicknessLabel(metres: number): string {
  if (metres < 1) {
    const cm = metres * 100;
    return `${cm < 10 ? cm.toFixed(1).replace(/\.0$/, '') : Math.round(cm)} cm`;
  }
  return `${metres.toFixed(2)} m`;
}

/**
 * A log channel's readings on the chosen depth, top down, non-finite readings left out. On
 * event-free depth a bed's readings all fall on the bed's one depth, so its signature shows as a
 * flat excursion there rather than being dropped.
 */
export function traceOnAxis(
  depthsM: readonly number[],
  values: readonly number[],
  scale: CoreScale,
  axis: 'TRUE' | 'EVENT_FREE',
): { depth: number; value: number }[] {
  const points: { depth: number; value: number }[] = [];
  depthsM.forEach((depthM, index) => {
    const value = values[index];
    if (value === undefined || !Number.isFinite(value) || !Number.isFinite(depthM)) return;
    if (axis === 'EVENT_FREE' && (depthM < scale.topDepthM || depthM > scale.baseDepthM)) return;
    points.push({ depth: axis === 'TRUE' ? depthM : scale.eventFreeDepth(depthM), value });
  });
  return points.sort((a, b) => a.depth - b.depth);
}
