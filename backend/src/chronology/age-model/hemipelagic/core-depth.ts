/**
 * A core's depth scale for the hemipelagic depth model: true depth below the core top, and
 * event-free depth, where every event bed's thickness above a point is removed because a turbidite
 * is deposited in hours to days and records no time [common practice; Goldfinger et al. 2012,
 * USGS Professional Paper 1661-F, for the method of dating turbidites by the hemipelagic mud
 * between them]. Only units of facies TURBIDITE are removed; every other unit is taken to have
 * accumulated as background mud. A unit's `basalErosionM` is mud its base removed from the unit
 * below: time missing at that contact, which the model restores.
 */
import { AgeModelInput, ColumnUnit, isModelled } from '../column';

/** The facies removed from depth: event beds. */
export const EVENT_BED_FACIES = 'TURBIDITE';
/** The facies whose presence makes a column a hemipelagic core. */
export const HEMIPELAGIC_FACIES = 'HEMIPELAGIC_MUD';

/** A contact between two units of the core, top down. */
export interface CoreContact {
  readonly depthM: number;
  readonly eventFreeDepthM: number;
  readonly unitAboveId: string;
  readonly unitBelowId: string;
  /** Position of the unit below (1 is the oldest). */
  readonly unitBelowPosition: number;
  /** Estimated thickness of mud the unit above eroded here (m); 0 when none is recorded. */
  readonly erosionEstimateM: number;
}

export interface CoreDepthScale {
  /** Depth of the top of the uppermost unit (m). */
  readonly topDepthM: number;
  /** Depth of the base of the lowest unit (m). */
  readonly baseDepthM: number;
  /** Event-free depth of the core's base (m). */
  readonly eventFreeLengthM: number;
  /** Every contact, top down. */
  readonly contacts: readonly CoreContact[];
  /** Event beds as [top, base] true depths, top down. */
  readonly beds: readonly { readonly unitId: string; readonly topDepthM: number; readonly baseDepthM: number }[];
  /** Event-free depth (m below the core top) of a true depth (m). Constant through a bed. */
  eventFreeDepth(depthM: number): number;
}

function hasDepths(unit: ColumnUnit): unit is ColumnUnit & { topDepthM: number; baseDepthM: number } {
  return unit.topDepthM !== null && unit.baseDepthM !== null && unit.baseDepthM > unit.topDepthM;
}

/** The depth scale of a column whose units all have depths (checked by `hemipelagicProblems`). */
export function coreDepthScale(units: readonly ColumnUnit[]): CoreDepthScale {
  const topDown = units.filter(hasDepths).sort((a, b) => b.position - a.position);
  if (topDown.length === 0) throw new RangeError('a core needs units with depths');
  const topDepthM = topDown[0].topDepthM;
  const baseDepthM = topDown[topDown.length - 1].baseDepthM;
  const beds = topDown
    .filter((u) => u.facies === EVENT_BED_FACIES)
    .map((u) => ({ unitId: u.id, topDepthM: u.topDepthM, baseDepthM: u.baseDepthM }));
  const eventFreeDepth = (depthM: number): number => {
    let removed = 0;
    for (const bed of beds) {
      if (bed.topDepthM >= depthM) break;
      removed += Math.min(depthM, bed.baseDepthM) - bed.topDepthM;
    }
    return depthM - topDepthM - removed;
  };
  const contacts: CoreContact[] = [];
  for (let i = 0; i + 1 < topDown.length; i++) {
    const above = topDown[i];
    const below = topDown[i + 1];
    const erosion = above.basalErosionM;
    contacts.push({
      depthM: above.baseDepthM,
      eventFreeDepthM: eventFreeDepth(above.baseDepthM),
      unitAboveId: above.id,
      unitBelowId: below.id,
      unitBelowPosition: below.position,
      erosionEstimateM: erosion !== null && erosion !== undefined && erosion > 0 ? erosion : 0,
    });
  }
  return { topDepthM, baseDepthM, eventFreeLengthM: eventFreeDepth(baseDepthM), contacts, beds, eventFreeDepth };
}

/**
 * Why a column cannot take the hemipelagic depth model, in words for the researcher; empty when it
 * can. It needs a hemipelagic mud unit, depths on every unit, and a depth on every modelled sample.
 */
export function hemipelagicProblems(input: AgeModelInput): string[] {
  const problems: string[] = [];
  if (!input.units.some((u) => u.facies === HEMIPELAGIC_FACIES && hasDepths(u))) {
    problems.push(
      'the hemipelagic depth model dates a core through its hemipelagic mud, and this column has no unit of facies ' +
        'HEMIPELAGIC_MUD with depths; use ORDER_ONLY, or record the mud units',
    );
  }
  const undepthed = input.units.filter((u) => !hasDepths(u));
  if (undepthed.length > 0) {
    problems.push(`the hemipelagic depth model needs the depths of every unit; ${undepthed.map((u) => u.name ?? u.id).join(', ')} ${undepthed.length === 1 ? 'has' : 'have'} none`);
  }
  const unplaced = input.samples.filter((s) => isModelled(s) && (s.depthM === null || !Number.isFinite(s.depthM)));
  if (unplaced.length > 0) {
    problems.push(`the hemipelagic depth model places samples by depth; ${unplaced.map((s) => s.name ?? s.id).join(', ')} ${unplaced.length === 1 ? 'has' : 'have'} no depth`);
  }
  return problems;
}
