/**
 * A site's column as the age model sees it: units in stratigraphic order, the event horizons at
 * their contacts and the dated samples in them, checked for the problems that make an ordering
 * model meaningless, and turned into the partial order the sampler enforces.
 *
 * The order is the law of superposition (Steno 1669; for its use in Bayesian chronologies, Buck,
 * Kenworthy, Litton & Smith 1991, Antiquity 65:808-821): a unit with a lower `position` is older,
 * an event horizon lies between the unit below and the unit above it, and the samples of one unit
 * form a group between the things bounding that unit. Within a unit, samples are unordered unless
 * the column is a core (`orderSamplesByDepth`), where a deeper sample is older.
 */
import { CalendarDensity } from '../common/density';
import type { ReservoirSource, SampleReservoir } from './reservoir-offsets';

/** How a dated sample's age relates to the time its unit was deposited. */
export type AgeRelation = 'DATES_DEPOSIT' | 'OLDER_THAN_DEPOSIT' | 'YOUNGER_THAN_DEPOSIT';

export interface ColumnUnit {
  readonly id: string;
  /** Shown in messages; the id is used when absent. */
  readonly name?: string;
  /** Order index from the base: 1 is the oldest unit. */
  readonly position: number;
  readonly topDepthM: number | null;
  readonly baseDepthM: number | null;
  /** Facies as stored (`TURBIDITE`, `HEMIPELAGIC_MUD`, ...); used by the hemipelagic depth model only. */
  readonly facies?: string;
  /** Estimated thickness of mud (m) the unit's base eroded; used by the hemipelagic depth model only. */
  readonly basalErosionM?: number | null;
}

export interface ColumnEventHorizon {
  readonly id: string;
  readonly name?: string;
  readonly unitBelowId: string;
  readonly unitAboveId: string;
}

export interface ColumnSample {
  readonly id: string;
  /** A lab code or label for messages; the id is used when absent. */
  readonly name?: string;
  readonly unitId: string;
  /** Depth below the top of the column (m); used for order only when `orderSamplesByDepth`. */
  readonly depthM: number | null;
  readonly ageRelation: AgeRelation;
  /** The sample's calendar-age likelihood (a calibrated 14C age, a luminescence or historical age). */
  readonly likelihood: CalendarDensity;
  /** Excluded samples take no part in the model. */
  readonly excluded?: boolean;
  /**
   * Scale (mean, years) of the exponential prior on this sample's age offset from its deposit:
   * inheritance for OLDER_THAN_DEPOSIT, intrusion for YOUNGER_THAN_DEPOSIT. Absent or null takes the
   * run's `inheritanceScaleYears`. Ignored for DATES_DEPOSIT.
   */
  readonly offsetScaleYears?: number | null;
  /**
   * Marine samples whose Delta-R they share with others of the site: the source and the sample's
   * likelihood at each value of its offset's grid (`reservoir-offsets.ts`). `likelihood` is then
   * the likelihood with the Delta-R error integrated out (for starting values and the window).
   */
  readonly reservoir?: SampleReservoir;
}

export interface AgeModelInput {
  readonly units: readonly ColumnUnit[];
  readonly eventHorizons: readonly ColumnEventHorizon[];
  readonly samples: readonly ColumnSample[];
  /**
   * True for a core, where depths within a unit are measured on one line, so a deeper sample is
   * older. Trench and outcrop depths are taken at different places on a wall and are not ordered.
   */
  readonly orderSamplesByDepth?: boolean;
  /** The Delta-R sources the samples' `reservoir` name; absent when no sample shares an offset. */
  readonly reservoirSources?: readonly ReservoirSource[];
}

export type ColumnProblemCode =
  | 'DUPLICATE_ID'
  | 'INVALID_POSITION'
  | 'DUPLICATE_POSITION'
  | 'HORIZON_UNKNOWN_UNIT'
  | 'HORIZON_NOT_ADJACENT'
  | 'HORIZONS_AT_ONE_CONTACT'
  | 'EVENT_NOT_DATED_BELOW'
  | 'SAMPLE_UNKNOWN_UNIT'
  | 'SAMPLE_INVALID_DEPTH'
  | 'SAMPLE_EMPTY_LIKELIHOOD'
  | 'NO_DATED_SAMPLE';

export interface ColumnProblem {
  readonly code: ColumnProblemCode;
  /** Written for the researcher who built the column, naming units and horizons by name. */
  readonly message: string;
  /** Ids of the units, horizons and samples concerned. */
  readonly subjectIds: readonly string[];
}

/** The column cannot be modelled; `problems` lists every reason found. */
export class ColumnProblemError extends Error {
  constructor(readonly problems: readonly ColumnProblem[]) {
    super(
      problems.length === 1
        ? `The column cannot be modelled: ${problems[0].message}`
        : `The column cannot be modelled (${problems.length} problems): ${problems.map((p) => p.message).join(' ')}`,
    );
    this.name = 'ColumnProblemError';
  }
}

function labelOf(thing: { id: string; name?: string }): string {
  return thing.name !== undefined && thing.name.trim() !== '' ? `"${thing.name}"` : `"${thing.id}"`;
}

/** Whether a sample takes part in the model. */
export function isModelled(sample: ColumnSample): boolean {
  return sample.excluded !== true;
}

function hasMass(density: CalendarDensity): boolean {
  let mass = 0;
  for (const p of density.probabilities) {
    if (!(p >= 0) || !Number.isFinite(p)) return false;
    mass += p;
  }
  return mass > 0 && Number.isFinite(mass) && Number.isInteger(density.startCalBp);
}

function duplicateIdProblems(kind: string, things: readonly { id: string }[]): ColumnProblem[] {
  const seen = new Set<string>();
  const problems: ColumnProblem[] = [];
  for (const thing of things) {
    if (seen.has(thing.id)) {
      problems.push({
        code: 'DUPLICATE_ID',
        message: `Two ${kind} share the id "${thing.id}".`,
        subjectIds: [thing.id],
      });
    }
    seen.add(thing.id);
  }
  return problems;
}

/**
 * Every problem that stops the column being modelled: units sharing a position or with a position
 * that is not a whole number; a horizon whose units are missing or not adjacent (the unit above
 * must sit at the position right after the unit below); two horizons at one contact (the column
 * cannot order them); an event with no modelled sample in any unit at or below its unit below
 * (nothing bounds it from below); samples in unknown units, with unusable depths or with an empty
 * likelihood; and a column with no modelled sample at all. An empty list means the column is fit.
 */
export function validateColumn(input: AgeModelInput): ColumnProblem[] {
  const problems: ColumnProblem[] = [
    ...duplicateIdProblems('units', input.units),
    ...duplicateIdProblems('event horizons', input.eventHorizons),
    ...duplicateIdProblems('samples', input.samples),
  ];
  const unitsById = new Map(input.units.map((unit) => [unit.id, unit]));

  const unitsByPosition = new Map<number, ColumnUnit>();
  for (const unit of input.units) {
    if (!Number.isInteger(unit.position)) {
      problems.push({
        code: 'INVALID_POSITION',
        message:
          `Unit ${labelOf(unit)} has position ${String(unit.position)}; positions are whole numbers counted ` +
          'from the base (1 is the oldest unit).',
        subjectIds: [unit.id],
      });
      continue;
    }
    const other = unitsByPosition.get(unit.position);
    if (other) {
      problems.push({
        code: 'DUPLICATE_POSITION',
        message:
          `Units ${labelOf(other)} and ${labelOf(unit)} both have position ${unit.position}; ` +
          'each unit needs its own place in the column.',
        subjectIds: [other.id, unit.id],
      });
    } else {
      unitsByPosition.set(unit.position, unit);
    }
  }

  const horizonsAtContact = new Map<string, ColumnEventHorizon>();
  for (const horizon of input.eventHorizons) {
    const below = unitsById.get(horizon.unitBelowId);
    const above = unitsById.get(horizon.unitAboveId);
    if (!below || !above) {
      const missing = [
        !below ? `unit below "${horizon.unitBelowId}"` : '',
        !above ? `unit above "${horizon.unitAboveId}"` : '',
      ]
        .filter((text) => text !== '')
        .join(' and ');
      problems.push({
        code: 'HORIZON_UNKNOWN_UNIT',
        message: `Event horizon ${labelOf(horizon)} refers to a ${missing} that is not in the column.`,
        subjectIds: [horizon.id],
      });
      continue;
    }
    if (above.position !== below.position + 1) {
      problems.push({
        code: 'HORIZON_NOT_ADJACENT',
        message:
          `Event horizon ${labelOf(horizon)} lies between unit ${labelOf(below)} (position ${below.position}) and unit ` +
          `${labelOf(above)} (position ${above.position}), but a horizon is a contact: the unit above must be the next ` +
          `one up (position ${below.position + 1}).`,
        subjectIds: [horizon.id, below.id, above.id],
      });
      continue;
    }
    const contact = `${below.id}\u0000${above.id}`;
    const other = horizonsAtContact.get(contact);
    if (other) {
      problems.push({
        code: 'HORIZONS_AT_ONE_CONTACT',
        message:
          `Event horizons ${labelOf(other)} and ${labelOf(horizon)} both lie between units ${labelOf(below)} and ` +
          `${labelOf(above)}; with no deposit between them the column cannot order them. ` +
          'Merge them or add the unit between.',
        subjectIds: [other.id, horizon.id],
      });
    } else {
      horizonsAtContact.set(contact, horizon);
    }
  }

  for (const sample of input.samples) {
    if (!unitsById.has(sample.unitId)) {
      problems.push({
        code: 'SAMPLE_UNKNOWN_UNIT',
        message: `Sample ${labelOf(sample)} is placed in unit "${sample.unitId}", which is not in the column.`,
        subjectIds: [sample.id],
      });
    }
    if (sample.depthM !== null && !Number.isFinite(sample.depthM)) {
      problems.push({
        code: 'SAMPLE_INVALID_DEPTH',
        message: `Sample ${labelOf(sample)} has depth ${String(sample.depthM)}; give a depth in metres or none.`,
        subjectIds: [sample.id],
      });
    }
    if (isModelled(sample) && !hasMass(sample.likelihood)) {
      problems.push({
        code: 'SAMPLE_EMPTY_LIKELIHOOD',
        message:
          `Sample ${labelOf(sample)} has no usable calendar-age likelihood (no mass on a whole-year grid); ` +
          'recalibrate it or exclude it.',
        subjectIds: [sample.id],
      });
    }
  }

  const modelled = input.samples.filter((sample) => isModelled(sample) && unitsById.has(sample.unitId));
  if (modelled.length === 0) {
    problems.push({
      code: 'NO_DATED_SAMPLE',
      message:
        input.samples.length === 0
          ? 'The column has no dated sample; add at least one before running an age model.'
          : 'Every sample in the column is excluded; include at least one dated sample before running an age model.',
      subjectIds: [],
    });
  } else {
    let lowestDatedPosition = Infinity;
    for (const sample of modelled) {
      lowestDatedPosition = Math.min(lowestDatedPosition, unitsById.get(sample.unitId)?.position ?? Infinity);
    }
    for (const horizon of input.eventHorizons) {
      const below = unitsById.get(horizon.unitBelowId);
      if (!below || !unitsById.has(horizon.unitAboveId)) continue;
      if (lowestDatedPosition > below.position) {
        problems.push({
          code: 'EVENT_NOT_DATED_BELOW',
          message:
            `Event horizon ${labelOf(horizon)} has nothing dated below it: no included sample lies in unit ` +
            `${labelOf(below)} or any unit under it, so nothing bounds its age from below.`,
          subjectIds: [horizon.id],
        });
      }
    }
  }
  return problems;
}

/** Node kinds of the order graph. */
export const NodeKind = { END: 0, START: 1, EVENT: 2, DEPOSIT: 3 } as const;

/**
 * The column's partial order as a graph on the model's ages: node 0 is the end boundary, node 1
 * the start boundary, then the events (oldest first) and the deposit ages of the modelled samples
 * (in column order). Each node occupies a contiguous run of "stages" numbered from the young end;
 * node a is younger than node b exactly when a's run ends before b's begins. Only the immediate
 * neighbours in that order (its covering relation) are kept as edges, in compressed rows.
 */
export interface OrderGraph {
  readonly nodeCount: number;
  readonly kind: Uint8Array;
  readonly stageMin: Int32Array;
  readonly stageMax: Int32Array;
  /** Stages run from 0 (youngest) to stageCount - 1; the end boundary is at -1, the start at stageCount. */
  readonly stageCount: number;
  readonly olderOffsets: Int32Array;
  readonly olderNeighbours: Int32Array;
  readonly youngerOffsets: Int32Array;
  readonly youngerNeighbours: Int32Array;
  /** Event horizons in node order (oldest first); event k is node 2 + k. */
  readonly events: readonly ColumnEventHorizon[];
  /** Modelled samples in node order; sample k is node 2 + events.length + k. */
  readonly samples: readonly ColumnSample[];
}

/**
 * Build the order graph of a valid column (call `validateColumn` first; this throws
 * ColumnProblemError if the column has problems).
 */
export function buildOrderGraph(input: AgeModelInput): OrderGraph {
  const problems = validateColumn(input);
  if (problems.length > 0) throw new ColumnProblemError(problems);

  const units = [...input.units].sort((a, b) => a.position - b.position);
  const eventAbove = new Map<string, ColumnEventHorizon>();
  for (const horizon of input.eventHorizons) eventAbove.set(horizon.unitBelowId, horizon);
  const samplesByUnit = new Map<string, ColumnSample[]>();
  for (const sample of input.samples) {
    if (!isModelled(sample)) continue;
    const list = samplesByUnit.get(sample.unitId) ?? [];
    list.push(sample);
    samplesByUnit.set(sample.unitId, list);
  }

  // Stages are laid out from the base up (oldest first) and renumbered from the top afterwards.
  type Placement = { first: number; last: number };
  const eventStage: ColumnEventHorizon[] = [];
  const eventPlacement: Placement[] = [];
  const samples: ColumnSample[] = [];
  const samplePlacement: Placement[] = [];
  let stage = 0;
  for (const unit of units) {
    const inUnit = samplesByUnit.get(unit.id) ?? [];
    const depthOrdered = input.orderSamplesByDepth === true;
    const depths = depthOrdered
      ? [...new Set(inUnit.filter((s) => s.depthM !== null).map((s) => s.depthM as number))].sort((a, b) => b - a)
      : [];
    const first = stage;
    const levels = Math.max(1, depths.length);
    const last = first + levels - 1;
    for (const sample of inUnit) {
      samples.push(sample);
      if (depthOrdered && sample.depthM !== null) {
        const level = first + depths.indexOf(sample.depthM);
        samplePlacement.push({ first: level, last: level });
      } else {
        samplePlacement.push({ first, last });
      }
    }
    stage = last + 1;
    const horizon = eventAbove.get(unit.id);
    if (horizon) {
      eventStage.push(horizon);
      eventPlacement.push({ first: stage, last: stage });
      stage++;
    }
  }
  const stageCount = stage;
  const nodeCount = 2 + eventStage.length + samples.length;
  const kind = new Uint8Array(nodeCount);
  const stageMin = new Int32Array(nodeCount);
  const stageMax = new Int32Array(nodeCount);
  kind[0] = NodeKind.END;
  stageMin[0] = stageMax[0] = -1;
  kind[1] = NodeKind.START;
  stageMin[1] = stageMax[1] = stageCount;
  const place = (node: number, nodeKind: number, p: Placement): void => {
    kind[node] = nodeKind;
    stageMin[node] = stageCount - 1 - p.last;
    stageMax[node] = stageCount - 1 - p.first;
  };
  eventPlacement.forEach((p, k) => place(2 + k, NodeKind.EVENT, p));
  samplePlacement.forEach((p, k) => place(2 + eventStage.length + k, NodeKind.DEPOSIT, p));

  // Covering relation: b is an immediate older neighbour of a when b starts after a ends and no
  // node lies wholly between them, i.e. b starts no later than the earliest end among the nodes
  // that start after a.
  const older: number[][] = Array.from({ length: nodeCount }, () => []);
  const younger: number[][] = Array.from({ length: nodeCount }, () => []);
  for (let a = 0; a < nodeCount; a++) {
    let earliestEnd = Infinity;
    for (let c = 0; c < nodeCount; c++) {
      if (stageMin[c] > stageMax[a]) earliestEnd = Math.min(earliestEnd, stageMax[c]);
    }
    for (let b = 0; b < nodeCount; b++) {
      if (stageMin[b] > stageMax[a] && stageMin[b] <= earliestEnd) {
        older[a].push(b);
        younger[b].push(a);
      }
    }
  }
  const compress = (rows: number[][]): { offsets: Int32Array; neighbours: Int32Array } => {
    const offsets = new Int32Array(rows.length + 1);
    rows.forEach((row, i) => (offsets[i + 1] = offsets[i] + row.length));
    return { offsets, neighbours: Int32Array.from(rows.flat()) };
  };
  const o = compress(older);
  const y = compress(younger);
  return {
    nodeCount,
    kind,
    stageMin,
    stageMax,
    stageCount,
    olderOffsets: o.offsets,
    olderNeighbours: o.neighbours,
    youngerOffsets: y.offsets,
    youngerNeighbours: y.neighbours,
    events: eventStage,
    samples,
  };
}
