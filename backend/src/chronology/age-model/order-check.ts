/**
 * Checks that joint draws respect the column's stratigraphic order, derived afresh from the
 * column (not from the sampler's order graph), so the sampler's construction of the order is
 * itself under test.
 */
import { AgeModelInput, ColumnSample, isModelled } from './column';
import { AgeModelDraws, EventDraws } from './age-model';

/** At most this many violations are described; the count is still exact. */
const DESCRIBED = 20;

interface Placed {
  readonly label: string;
  /** Unit position, or for an event the position of its unit below plus one half. */
  readonly level: number;
  readonly depthM: number | null;
  readonly isEvent: boolean;
}

/** Whether a must be at least as old as b (cal BP a >= b) by the column alone. */
function mustBeOlder(a: Placed, b: Placed, byDepth: boolean): boolean {
  if (a.level < b.level) return true;
  if (a.level > b.level || a.isEvent || b.isEvent) return false;
  return byDepth && a.depthM !== null && b.depthM !== null && a.depthM > b.depthM;
}

function placedSamples(input: AgeModelInput, sampleIds: readonly string[]): Placed[] {
  const positions = new Map(input.units.map((unit) => [unit.id, unit.position]));
  const byId = new Map<string, ColumnSample>(input.samples.map((sample) => [sample.id, sample]));
  return sampleIds.map((id) => {
    const sample = byId.get(id);
    if (!sample || !isModelled(sample)) throw new RangeError(`sample ${id} is not a modelled sample of the column`);
    return { label: `sample ${id}`, level: positions.get(sample.unitId) ?? NaN, depthM: sample.depthM, isEvent: false };
  });
}

function placedEvents(input: AgeModelInput, eventHorizonIds: readonly string[]): Placed[] {
  const positions = new Map(input.units.map((unit) => [unit.id, unit.position]));
  const byId = new Map(input.eventHorizons.map((horizon) => [horizon.id, horizon]));
  return eventHorizonIds.map((id) => {
    const horizon = byId.get(id);
    if (!horizon) throw new RangeError(`event horizon ${id} is not in the column`);
    return { label: `event ${id}`, level: (positions.get(horizon.unitBelowId) ?? NaN) + 0.5, depthM: null, isEvent: true };
  });
}

function violations(
  things: readonly Placed[],
  rows: number,
  valueOf: (row: number, thing: number) => number,
  byDepth: boolean,
  extra: (row: number, report: (text: string) => void) => void,
): string[] {
  const found: string[] = [];
  let count = 0;
  const report = (text: string): void => {
    count++;
    if (found.length < DESCRIBED) found.push(text);
  };
  const pairs: [number, number][] = [];
  for (let a = 0; a < things.length; a++) {
    for (let b = 0; b < things.length; b++) {
      if (a !== b && mustBeOlder(things[a], things[b], byDepth)) pairs.push([a, b]);
    }
  }
  for (let row = 0; row < rows; row++) {
    for (const [a, b] of pairs) {
      const older = valueOf(row, a);
      const younger = valueOf(row, b);
      if (!(older >= younger)) {
        report(`draw ${row}: ${things[a].label} at ${older} cal BP is younger than ${things[b].label} at ${younger} cal BP`);
      }
    }
    extra(row, report);
  }
  if (count > found.length) found.push(`... ${count - found.length} more`);
  return found;
}

/**
 * Every way the joint draws of all ages break the column's order: a unit's deposits older than
 * those of every unit above, events between their units and in order, deeper samples older in a
 * core, and everything between the start and end boundaries. Empty when the order holds.
 */
export function orderViolations(input: AgeModelInput, draws: AgeModelDraws): string[] {
  const samples = placedSamples(input, draws.sampleIds);
  const events = placedEvents(input, draws.eventHorizonIds);
  const things = [...events, ...samples];
  const e = events.length;
  const s = samples.length;
  const valueOf = (row: number, k: number): number =>
    k < e ? draws.events[row * e + k] : draws.samples[row * s + (k - e)];
  return violations(things, draws.drawCount, valueOf, input.orderSamplesByDepth === true, (row, report) => {
    const start = draws.startBoundary[row];
    const end = draws.endBoundary[row];
    for (let k = 0; k < things.length; k++) {
      const v = valueOf(row, k);
      if (!(v <= start)) report(`draw ${row}: ${things[k].label} at ${v} cal BP is older than the start boundary ${start}`);
      if (!(v >= end)) report(`draw ${row}: ${things[k].label} at ${v} cal BP is younger than the end boundary ${end}`);
    }
  });
}

/** Every way the joint event draws break the events' stratigraphic order. Empty when it holds. */
export function eventOrderViolations(input: AgeModelInput, draws: EventDraws): string[] {
  const events = placedEvents(input, draws.eventHorizonIds);
  const e = events.length;
  return violations(events, draws.drawCount, (row, k) => draws.draws[row * e + k], false, () => undefined);
}
