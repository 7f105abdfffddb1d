import { Injectable } from '@nestjs/common';
import { EventHorizonsRepository } from '../event-horizons/event-horizons.repository';
import { IntervalEnds, intervalEnds, intervalEventIds, IntervalSnapshot } from './interval-events';

type AnalysisIntervals = { inputSnapshot: unknown; intervals?: readonly { index: number }[] | null };

/** `RecurrenceAnalysis.intervals` with the names of the events at each interval's ends. */
@Injectable()
export class IntervalNamesService {
  constructor(private readonly eventHorizons: EventHorizonsRepository) {}

  async namedIntervals<T extends { index: number }>(analysis: AnalysisIntervals & { intervals?: readonly T[] | null }): Promise<(T & IntervalEnds)[]> {
    const intervals = analysis.intervals ?? [];
    if (intervals.length === 0) return [];
    const snapshot = (analysis.inputSnapshot ?? null) as IntervalSnapshot | null;
    const ids = [...new Set(intervalEventIds(snapshot))];
    const rows = ids.length > 0 ? await this.eventHorizons.findByIds(ids) : [];
    const names = new Map(rows.map((row) => [row.id, row.name]));
    return intervals.map((interval) => ({ ...interval, ...intervalEnds(snapshot, interval.index, names) }) as T & IntervalEnds);
  }
}
