/**
 * Pure geometry of what is drawn over the event ladder besides its own ties: order loops (the
 * minimal cycles of a hypothesis's order graph) as closed paths of ties and column steps, and
 * proposed ties between two cores. Positions come from the chart's own scales, so overlays move
 * with its zoom; the components only draw what these return.
 */
import type { ScaleBand, ScaleLinear } from 'd3';
import type { EventAnchor } from '@/modules/correlation/utils/ladderLayout';

/** The ladder chart's current scales, handed to whatever is drawn over it. */
export type LadderGeometry = {
  time: ScaleLinear<number, number>;
  columnScale: ScaleBand<string>;
  anchors: ReadonlyMap<string, EventAnchor>;
  /** Top and bottom of the plotted time range, in pixels. */
  top: number;
  bottom: number;
};

/** A straight piece of an overlay. */
export type OverlaySegment = { x1: number; y1: number; x2: number; y2: number };

/** An order loop as the API sends it: its ties in loop order and its steps down the columns. */
export type OrderLoopLike = {
  regionalEventIds: readonly string[];
  ties: readonly { id: string; eventA: { id: string }; eventB: { id: string } }[];
  steps: readonly { site: { id: string }; older: { id: string }; younger: { id: string } }[];
};

/** A loop placed on the ladder: its ties, its steps along the columns, and where its label goes. */
export type OrderLoopMark = {
  key: string;
  /** 1-based, in the order the API lists the loops; the label reads "loop n". */
  number: number;
  ties: (OverlaySegment & { tieId: string })[];
  /** Each step drawn along its column, from the older (lower) event up to the younger one. */
  steps: OverlaySegment[];
  /** The middle of the loop's first drawn tie; null when no tie of the loop can be drawn. */
  label: { x: number; y: number } | null;
};

/** The key a loop is selected by: its regional events in loop order. */
export function orderLoopKey(loop: Pick<OrderLoopLike, 'regionalEventIds'>): string {
  return loop.regionalEventIds.join('>');
}

/** Pixels a step is drawn to the left of its column's axis, so the axis line does not hide it. */
export const LOOP_STEP_OFFSET = 4;

function anchorPoint(
  eventId: string,
  anchors: ReadonlyMap<string, EventAnchor>,
  columnX: (columnId: string) => number | undefined,
  time: (calBp: number) => number,
): { x: number; y: number } | null {
  const anchor = anchors.get(eventId);
  if (!anchor || anchor.medianCalBp === null) return null;
  const x = columnX(anchor.columnId);
  return x === undefined ? null : { x, y: time(anchor.medianCalBp) };
}

/**
 * Each loop as a closed path on the ladder: every tie on it as a segment between its two events'
 * medians on their column axes (left event first), every step as a vertical piece just left of its
 * column from the older member's median to the younger's. Pieces whose events are not on the
 * ladder (no median, or a site not shown) are left out; the loop keeps its number.
 */
export function orderLoopMarks(
  loops: readonly OrderLoopLike[],
  anchors: ReadonlyMap<string, EventAnchor>,
  columnX: (columnId: string) => number | undefined,
  time: (calBp: number) => number,
): OrderLoopMark[] {
  return loops.map((loop, index) => {
    const ties: OrderLoopMark['ties'] = [];
    for (const tie of loop.ties) {
      const a = anchorPoint(tie.eventA.id, anchors, columnX, time);
      const b = anchorPoint(tie.eventB.id, anchors, columnX, time);
      if (!a || !b) continue;
      const [left, right] = a.x <= b.x ? [a, b] : [b, a];
      ties.push({ tieId: tie.id, x1: left.x, y1: left.y, x2: right.x, y2: right.y });
    }
    const steps: OverlaySegment[] = [];
    for (const step of loop.steps) {
      const older = anchorPoint(step.older.id, anchors, columnX, time);
      const younger = anchorPoint(step.younger.id, anchors, columnX, time);
      if (!older || !younger) continue;
      steps.push({ x1: older.x - LOOP_STEP_OFFSET, y1: older.y, x2: younger.x - LOOP_STEP_OFFSET, y2: younger.y });
    }
    const first = ties[0];
    const label = first ? { x: (first.x1 + first.x2) / 2, y: (first.y1 + first.y2) / 2 } : null;
    return { key: orderLoopKey(loop), number: index + 1, ties, steps, label };
  });
}

/** A proposed tie as the API sends it. */
export type TieSuggestionLike = { eventA: { id: string }; eventB: { id: string }; score: number; tied: boolean };

/** A proposed tie placed on the ladder: a segment between medians and its score's label. */
export type SuggestionMark = OverlaySegment & { key: string; score: number; label: { x: number; y: number; text: string } };

/** The key of a proposed tie: its two events. */
export function suggestionKey(suggestion: Pick<TieSuggestionLike, 'eventA' | 'eventB'>): string {
  return `${suggestion.eventA.id}+${suggestion.eventB.id}`;
}

/**
 * The proposals not yet tied, each as a segment between its two events' medians on their column
 * axes (left event first). The score is written on the segment, a third of the way along it for
 * the 1st, 3rd, ... proposal and two thirds for the 2nd, 4th, ..., so labels of neighbouring
 * proposals between the same two columns do not sit on one another.
 */
export function suggestionMarks(
  suggestions: readonly TieSuggestionLike[],
  anchors: ReadonlyMap<string, EventAnchor>,
  columnX: (columnId: string) => number | undefined,
  time: (calBp: number) => number,
): SuggestionMark[] {
  const marks: SuggestionMark[] = [];
  for (const suggestion of suggestions) {
    if (suggestion.tied) continue;
    const a = anchorPoint(suggestion.eventA.id, anchors, columnX, time);
    const b = anchorPoint(suggestion.eventB.id, anchors, columnX, time);
    if (!a || !b) continue;
    const [left, right] = a.x <= b.x ? [a, b] : [b, a];
    const along = marks.length % 2 === 0 ? 1 / 3 : 2 / 3;
    marks.push({
      key: suggestionKey(suggestion),
      score: suggestion.score,
      x1: left.x,
      y1: left.y,
      x2: right.x,
      y2: right.y,
      label: { x: left.x + (right.x - left.x) * along, y: left.y + (right.y - left.y) * along, text: suggestion.score.toFixed(2) },
    });
  }
  return marks;
}
