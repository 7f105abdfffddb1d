import { useMemo } from 'react';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { bedLogMarks, type LadderCoreLike, type LogLane } from '@/modules/correlation/utils/ladderCoreLogs';
import type { LadderGeometry } from '@/modules/correlation/utils/ladderOverlays';

export type CoreLogsOverlayProps = {
  geometry: LadderGeometry;
  cores: readonly LadderCoreLike[];
  /** Pixels per metre of bed thickness, one scale for every core. */
  pixelsPerMetre: number;
};

/** The lane left of a column's axis: most of the gap between columns, at least 12 px. */
function laneOf(step: number, bandwidth: number): LogLane {
  return { width: Math.max(12, Math.min(40, step - bandwidth - 12)), gap: 6 };
}

/**
 * Each core's beds drawn left of its axis with their log readings: a bracket down the bed's
 * thickness (its base at the event's median age) and the readings as a line across the lane.
 */
export function CoreLogsOverlay({ geometry, cores, pixelsPerMetre }: CoreLogsOverlayProps) {
  const { anchors, columnScale, time } = geometry;
  const step = columnScale.step();
  const bandwidth = columnScale.bandwidth();
  const marks = useMemo(
    () => bedLogMarks(cores, anchors, (id) => columnScale(id), time, pixelsPerMetre, laneOf(step, bandwidth)),
    [cores, anchors, columnScale, time, pixelsPerMetre, step, bandwidth],
  );
  return (
    <g pointerEvents="none" data-overlay="core-logs">
      {marks.map((mark) => (
        <g key={mark.eventId}>
          <title>{mark.bedName}</title>
          <path d={`M${mark.laneLeft + 3},${mark.top}H${mark.laneLeft}V${mark.base}H${mark.laneLeft + 3}`} fill="none" stroke={CHART_COLOURS.mutedText} strokeWidth={0.75} />
          <polyline points={mark.points.map((point) => `${point.x},${point.y}`).join(' ')} fill="none" stroke={CHART_COLOURS.likelihoodAbove} strokeWidth={1.25} />
        </g>
      ))}
    </g>
  );
}
