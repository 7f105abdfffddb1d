/**
 * Which events bound each interval of an analysis, by name, from what the analysis was computed
 * from (its input snapshot). Intervals are counted from the youngest (index 0: between the
 * youngest event and the one before it). A site analysis names its event horizons; a segment
 * analysis names each regional event by its members ("Site A E3 + Core B T2"). When a counting
 * rule weights events in or out per draw, an interval's ends differ between draws and are not named.
 */
import type { StoredEventTable } from './segment-event-table';

export type IntervalSnapshot =
  | { kind: 'site'; eventHorizonIds: readonly string[] }
  | {
      kind: 'segment';
      regionalEvents: readonly { id: string; memberIds: readonly string[]; inclusionProbability?: number }[];
      eventTable?: Pick<StoredEventTable, 'rows'>;
    };

export type IntervalEnds = { youngerEvent: string | null; olderEvent: string | null };

/**
 * The named ends of interval `index`. `eventNames` gives event horizon names by id (with their
 * site for a segment's members when no event table was stored).
 */
export function intervalEnds(snapshot: IntervalSnapshot | null, index: number, eventNames: ReadonlyMap<string, string>): IntervalEnds {
  const none = { youngerEvent: null, olderEvent: null };
  if (!snapshot) return none;
  if (snapshot.kind === 'site') {
    // Stored oldest first.
    const ids = snapshot.eventHorizonIds;
    const younger = ids[ids.length - 1 - index];
    const older = ids[ids.length - 2 - index];
    return { youngerEvent: (younger && eventNames.get(younger)) ?? null, olderEvent: (older && eventNames.get(older)) ?? null };
  }
  const events = snapshot.regionalEvents;
  if (events.some((event) => event.inclusionProbability !== undefined && event.inclusionProbability < 1)) return none;
  const labels = new Map((snapshot.eventTable?.rows ?? []).map((row) => [row.regionalEventId, row.label]));
  const name = (event: (typeof events)[number] | undefined) =>
    event ? (labels.get(event.id) ?? event.memberIds.map((id) => eventNames.get(id) ?? '?').join(' + ')) : null;
  return { youngerEvent: name(events[index]), olderEvent: name(events[index + 1]) };
}

/** Event horizon ids an analysis' intervals may name (to look their names up in one query). */
export function intervalEventIds(snapshot: IntervalSnapshot | null): string[] {
  if (!snapshot) return [];
  return snapshot.kind === 'site' ? [...snapshot.eventHorizonIds] : snapshot.regionalEvents.flatMap((event) => [...event.memberIds]);
}
