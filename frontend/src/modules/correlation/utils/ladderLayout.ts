/**
 * Pure geometry of the event ladder: sites as columns in along-strike order, calendar time
 * running down the page (young at top, as a section is read), ties as segments between event
 * medians, regional events as bands across their member columns, and the along-strike
 * space-time view. The chart components only draw what these return.
 */
import { scaleBand, scaleLinear, type ScaleBand, type ScaleLinear } from 'd3';
import { calendarWindow, type DensityPoint } from '@/modules/calibration/utils/calibrationChart';

/** A column of the ladder as the layout needs it. */
export type LadderSiteLike = { id: string; name: string; alongStrikeKm: number };

/** An HPD range as the API sends it; olderCalBp >= youngerCalBp. */
export type HpdRangeLike = { olderCalBp: number; youngerCalBp: number; probability: number };

/**
 * Columns ordered along strike, lowest km first (left); sites at the same position keep a
 * stable order by name so the ladder does not reshuffle between loads.
 */
export function orderAlongStrike<TColumn extends { site: LadderSiteLike }>(columns: readonly TColumn[]): TColumn[] {
  return [...columns].sort(
    (a, b) => a.site.alongStrikeKm - b.site.alongStrikeKm || a.site.name.localeCompare(b.site.name) || a.site.id.localeCompare(b.site.id),
  );
}

/**
 * The calendar window shown: every event density's extent with some margin (the calibration
 * chart's rule), or the last 1000 years when nothing has been modelled yet.
 */
export function ladderTimeWindow(densities: readonly (readonly DensityPoint[])[]): [younger: number, older: number] {
  const window = calendarWindow(densities, { padding: 0.04, minSpanYears: 500, roundTo: 100 });
  return window ? [window.youngerCalBp, window.olderCalBp] : [0, 1000];
}

/**
 * Calendar time down the page: the younger end of the window at `top`, the older at `bottom`.
 * A larger cal BP is further down.
 */
export function createTimeScale(window: readonly [number, number], top: number, bottom: number): ScaleLinear<number, number> {
  const [younger, older] = window[0] <= window[1] ? window : [window[1], window[0]];
  return scaleLinear().domain([younger, older]).range([top, bottom]);
}

/** One band per column, in the order given (already along strike), across the plot width. */
export function createColumnScale(columnIds: readonly string[], left: number, right: number): ScaleBand<string> {
  return scaleBand<string>().domain(columnIds).range([left, right]).paddingInner(0.25).paddingOuter(0.15);
}

/**
 * Horizontal extent of an event's density shape: the largest density of the whole ladder
 * spans `fraction` of a column, so shapes stay comparable across columns.
 */
export function createDensityWidthScale(peak: number, columnWidth: number, fraction = 0.9): ScaleLinear<number, number> {
  return scaleLinear()
    .domain([0, peak > 0 ? peak : 1])
    .range([0, columnWidth * fraction]);
}

/** Where every event sits: its column and its median, found by event id. */
export type EventAnchor = { eventId: string; columnId: string; medianCalBp: number | null };

/** A tie drawn as a segment between the medians of its two events. */
export type TieSegment = { tieId: string; x1: number; y1: number; x2: number; y2: number; conflict: boolean };

export type TieLike = { id: string; eventA: { id: string }; eventB: { id: string } };

/**
 * Segments for the ties whose two events both have a median on the ladder, from the right edge
 * of the left event's column anchor to the left of the right one's; ties named in an order
 * conflict are flagged so they can be drawn in the warning style.
 */
export function tieSegments(
  ties: readonly TieLike[],
  anchors: ReadonlyMap<string, EventAnchor>,
  columnX: (columnId: string) => number | undefined,
  time: (calBp: number) => number,
  conflictingTieIds: ReadonlySet<string>,
): TieSegment[] {
  const segments: TieSegment[] = [];
  for (const tie of ties) {
    const a = anchors.get(tie.eventA.id);
    const b = anchors.get(tie.eventB.id);
    if (!a || !b || a.medianCalBp === null || b.medianCalBp === null) continue;
    const xa = columnX(a.columnId);
    const xb = columnX(b.columnId);
    if (xa === undefined || xb === undefined) continue;
    const [left, right] = xa <= xb ? [a, b] : [b, a];
    segments.push({
      tieId: tie.id,
      x1: Math.min(xa, xb),
      y1: time(left.medianCalBp!),
      x2: Math.max(xa, xb),
      y2: time(right.medianCalBp!),
      conflict: conflictingTieIds.has(tie.id),
    });
  }
  return segments;
}

/** A regional event's band: across its member columns, down its combined 95.4 % extent. */
export type RegionalBand = { regionalEventId: string; x: number; width: number; y: number; height: number };

export type RegionalEventLike = { id: string; members: readonly { id: string }[]; combinedHpd95: readonly HpdRangeLike[] };

/**
 * The outer extent of a set of HPD ranges, [younger, older] in cal BP; null when there is none.
 * A band spans the whole combined 95.4 % region even when it is split into several ranges.
 */
export function hpdExtent(ranges: readonly HpdRangeLike[]): [younger: number, older: number] | null {
  if (ranges.length === 0) return null;
  let younger = Infinity;
  let older = -Infinity;
  for (const range of ranges) {
    younger = Math.min(younger, range.youngerCalBp, range.olderCalBp);
    older = Math.max(older, range.youngerCalBp, range.olderCalBp);
  }
  return [younger, older];
}

/**
 * Bands for the regional events with a combined range: from the left edge of the leftmost
 * member column to the right edge of the rightmost, at least one year tall so a very tight
 * combined range still shows.
 */
export function regionalBands(
  regionalEvents: readonly RegionalEventLike[],
  anchors: ReadonlyMap<string, EventAnchor>,
  columns: ScaleBand<string>,
  time: (calBp: number) => number,
): RegionalBand[] {
  const bands: RegionalBand[] = [];
  for (const regional of regionalEvents) {
    const extent = hpdExtent(regional.combinedHpd95);
    if (!extent) continue;
    let left = Infinity;
    let right = -Infinity;
    for (const member of regional.members) {
      const anchor = anchors.get(member.id);
      const x = anchor ? columns(anchor.columnId) : undefined;
      if (x === undefined) continue;
      left = Math.min(left, x);
      right = Math.max(right, x + columns.bandwidth());
    }
    if (!Number.isFinite(left)) continue;
    const y1 = time(extent[0]);
    const y2 = time(extent[1]);
    bands.push({
      regionalEventId: regional.id,
      x: left,
      width: right - left,
      y: Math.min(y1, y2),
      height: Math.max(Math.abs(y2 - y1), 1),
    });
  }
  return bands;
}

/** A regional event in the space-time view: along-strike extent across, combined range down. */
export type SpaceTimeBar = {
  regionalEventId: string;
  fromKm: number;
  toKm: number;
  medianCalBp: number | null;
  youngerCalBp: number;
  olderCalBp: number;
  memberCount: number;
};

/**
 * Space-time bars: each regional event spans the along-strike positions of its members' sites;
 * an event on one site only is a point in distance (fromKm = toKm) and is drawn with a minimum
 * width by the chart.
 */
export function spaceTimeBars(
  regionalEvents: readonly (RegionalEventLike & { combinedMedianCalBp?: number | null })[],
  siteKmOfEvent: ReadonlyMap<string, number>,
): SpaceTimeBar[] {
  const bars: SpaceTimeBar[] = [];
  for (const regional of regionalEvents) {
    const extent = hpdExtent(regional.combinedHpd95);
    const kms = regional.members.map((member) => siteKmOfEvent.get(member.id)).filter((km): km is number => km !== undefined);
    if (!extent || kms.length === 0) continue;
    bars.push({
      regionalEventId: regional.id,
      fromKm: Math.min(...kms),
      toKm: Math.max(...kms),
      medianCalBp: regional.combinedMedianCalBp ?? null,
      youngerCalBp: extent[0],
      olderCalBp: extent[1],
      memberCount: regional.members.length,
    });
  }
  return bars;
}

/** Whether two selected events may be tied: both chosen and in different columns. */
export function canTieEvents(first: EventAnchor | undefined, second: EventAnchor | undefined): boolean {
  return Boolean(first && second && first.eventId !== second.eventId && first.columnId !== second.columnId);
}

/**
 * The next selection after clicking an event: clicking a selected event drops it; a third
 * click replaces the older of the two, so the pair is always the two most recent picks.
 */
export function nextEventSelection(selection: readonly string[], eventId: string): string[] {
  if (selection.includes(eventId)) return selection.filter((id) => id !== eventId);
  return [...selection, eventId].slice(-2);
}

/**
 * A zoomed view of the time window: d3-zoom's transform applied to the time axis only, as
 * [younger, older] cal BP. `k` scales about `y`, then `ty` pans (both in pixels).
 */
export function zoomedTimeWindow(
  base: ScaleLinear<number, number>,
  transform: { k: number; y: number },
): [number, number] {
  const [top, bottom] = base.range() as [number, number];
  const invert = (pixel: number) => base.invert((pixel - transform.y) / transform.k);
  return [invert(top), invert(bottom)];
}

export type KeyboardColumn = { site: { id: string }; events: readonly { eventHorizon: { id: string }; medianCalBp?: number | null }[] };

/**
 * The event the arrow keys move to from `eventId` on the ladder: up and down to the next younger
 * and older event of the same column, left and right to the nearest-in-age event of the nearest
 * column that has events. Without a current event any arrow starts at the youngest event of the
 * first column. Returns null when there is nowhere to go.
 */
export function eventInDirection(
  columns: readonly KeyboardColumn[],
  eventId: string | null,
  key: 'ArrowUp' | 'ArrowDown' | 'ArrowLeft' | 'ArrowRight',
): string | null {
  const byAge = (column: KeyboardColumn) =>
    [...column.events].sort((a, b) => (a.medianCalBp ?? Infinity) - (b.medianCalBp ?? Infinity));
  const filled = columns.filter((column) => column.events.length > 0);
  if (filled.length === 0) return null;
  const columnIndex = eventId === null ? -1 : filled.findIndex((column) => column.events.some((event) => event.eventHorizon.id === eventId));
  if (columnIndex === -1) return byAge(filled[0]!)[0]!.eventHorizon.id;
  const events = byAge(filled[columnIndex]!);
  const at = events.findIndex((event) => event.eventHorizon.id === eventId);
  if (key === 'ArrowUp') return at > 0 ? events[at - 1]!.eventHorizon.id : null;
  if (key === 'ArrowDown') return at < events.length - 1 ? events[at + 1]!.eventHorizon.id : null;
  const target = filled[columnIndex + (key === 'ArrowLeft' ? -1 : 1)];
  if (!target) return null;
  const median = events[at]!.medianCalBp ?? 0;
  const nearest = [...target.events].sort(
    (a, b) => Math.abs((a.medianCalBp ?? Infinity) - median) - Math.abs((b.medianCalBp ?? Infinity) - median),
  )[0]!;
  return nearest.eventHorizon.id;
}
