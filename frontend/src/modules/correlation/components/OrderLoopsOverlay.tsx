import { useMemo } from 'react';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { orderLoopMarks, type LadderGeometry, type OrderLoopLike } from '@/modules/correlation/utils/ladderOverlays';

export type OrderLoopsOverlayProps = {
  geometry: LadderGeometry;
  loops: readonly OrderLoopLike[];
  /** The loop chosen in the order-loop callout, drawn strongest; null draws every loop alike. */
  selectedKey: string | null;
};

/** Dash of a loop's ties and steps: long-short, unlike the plain dash of any tie in conflict. */
const LOOP_DASH = '9 3 2 3';

/**
 * Each order loop drawn over the ladder as the closed path it is: its ties and, along each
 * column, the step from the older member up to the younger one, in a long-short dash with a
 * "loop n" label, so a loop reads without colour. The chosen loop is drawn thick on a white
 * halo; the others stay thin and faint while one is chosen.
 */
export function OrderLoopsOverlay({ geometry, loops, selectedKey }: OrderLoopsOverlayProps) {
  const { anchors, columnScale, time } = geometry;
  const marks = useMemo(() => orderLoopMarks(loops, anchors, (id) => columnScale(id), time), [loops, anchors, columnScale, time]);
  // The chosen loop last, so it lies on top of the others.
  const ordered = [...marks].sort((a, b) => Number(a.key === selectedKey) - Number(b.key === selectedKey));
  return (
    <g pointerEvents="none" data-overlay="order-loops">
      {ordered.map((mark) => {
        const chosen = mark.key === selectedKey;
        const faint = selectedKey !== null && !chosen;
        const pieces = [...mark.ties, ...mark.steps];
        return (
          <g key={mark.key} data-loop={mark.number} data-selected={chosen || undefined} opacity={faint ? 0.35 : 1}>
            {chosen &&
              pieces.map((piece, index) => (
                <line key={`halo-${index}`} x1={piece.x1} y1={piece.y1} x2={piece.x2} y2={piece.y2} stroke="#ffffff" strokeWidth={6} strokeLinecap="round" />
              ))}
            {pieces.map((piece, index) => (
              <line
                key={index}
                x1={piece.x1}
                y1={piece.y1}
                x2={piece.x2}
                y2={piece.y2}
                stroke={CHART_COLOURS.warning}
                strokeWidth={chosen ? 3 : 1.5}
                strokeDasharray={LOOP_DASH}
              />
            ))}
            {mark.label && (
              <text
                x={mark.label.x}
                y={mark.label.y - 5}
                textAnchor="middle"
                fontSize={11}
                fontWeight={chosen ? 700 : 600}
                fill={CHART_COLOURS.text}
                stroke="#ffffff"
                strokeWidth={3}
                paintOrder="stroke"
              >
                loop {mark.number}
              </text>
            )}
          </g>
        );
      })}
    </g>
  );
}
