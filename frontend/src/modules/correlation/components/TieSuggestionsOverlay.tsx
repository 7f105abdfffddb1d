import { useMemo } from 'react';
import type { TieSuggestion } from '@/modules/correlation/hooks/useTieSuggestions';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { suggestionMarks, type LadderGeometry } from '@/modules/correlation/utils/ladderOverlays';

export type TieSuggestionsOverlayProps = { geometry: LadderGeometry; suggestions: readonly TieSuggestion[] };

/**
 * Proposed ties not yet accepted, as thin dotted candidates between the two cores with their
 * score written on them; a tie becomes a solid line only once the correlator accepts it.
 */
export function TieSuggestionsOverlay({ geometry, suggestions }: TieSuggestionsOverlayProps) {
  const { anchors, columnScale, time } = geometry;
  const marks = useMemo(() => suggestionMarks(suggestions, anchors, (id) => columnScale(id), time), [suggestions, anchors, columnScale, time]);
  return (
    <g pointerEvents="none" data-overlay="tie-suggestions">
      {marks.map((mark) => (
        <g key={mark.key}>
          <line x1={mark.x1} y1={mark.y1} x2={mark.x2} y2={mark.y2} stroke={CHART_COLOURS.selected} strokeWidth={1.25} strokeDasharray="2 4" strokeLinecap="round" />
          <text x={mark.label.x} y={mark.label.y - 3} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.text} stroke="#ffffff" strokeWidth={3} paintOrder="stroke">
            {mark.label.text}
          </text>
        </g>
      ))}
    </g>
  );
}
