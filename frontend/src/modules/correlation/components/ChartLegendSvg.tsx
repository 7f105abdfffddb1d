import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { textWidth } from '@/modules/ui/utils/labelPlacement';

/** How a legend entry's swatch is drawn; each kind differs by shape or stroke, not colour alone. */
export type LegendSwatch = 'density' | 'median' | 'tie' | 'tie-conflict' | 'tie-differs' | 'band' | 'band-fails' | 'bar' | 'boundary';

export type LegendEntry = { swatch: LegendSwatch; label: string };

const SWATCH_PX = 18;
const ROW_PX = 16;

/** Where each entry goes: left to right, wrapping onto a new row at maxWidth. */
export function legendLayout(entries: readonly LegendEntry[], maxWidth: number, measure: (text: string) => number = (text) => textWidth(text, '10px')) {
  let x = 0;
  let row = 0;
  const placed = entries.map((entry) => {
    const width = SWATCH_PX + 4 + measure(entry.label) + 14;
    if (x > 0 && x + width > maxWidth) {
      x = 0;
      row += 1;
    }
    const at = { entry, x, y: row * ROW_PX };
    x += width;
    return at;
  });
  return { placed, height: (row + 1) * ROW_PX };
}

/** The legend rows' height for a width, so a chart can leave room for it. */
export function legendHeight(entries: readonly LegendEntry[], maxWidth: number): number {
  return entries.length === 0 ? 0 : legendLayout(entries, maxWidth).height;
}

export function HatchPattern({ id }: { id: string }) {
  return (
    <pattern id={id} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
      <rect width={6} height={6} fill={CHART_COLOURS.regionalBand} fillOpacity={0.25} />
      <line x1={0} y1={0} x2={0} y2={6} stroke={CHART_COLOURS.danger} strokeWidth={1.5} />
    </pattern>
  );
}

function Swatch({ swatch, hatchId }: { swatch: LegendSwatch; hatchId: string }) {
  const mid = 0;
  switch (swatch) {
    case 'density':
      return <path d={`M0,${mid + 5}L0,${mid - 5}C6,${mid - 5} 8,${mid} 16,${mid + 5}Z`} fill={CHART_COLOURS.posteriorFill} stroke={CHART_COLOURS.posterior} strokeWidth={0.75} />;
    case 'median':
      return <line x1={0} x2={SWATCH_PX - 2} y1={mid} y2={mid} stroke={CHART_COLOURS.text} strokeWidth={1.25} />;
    case 'tie':
      return <line x1={0} x2={SWATCH_PX - 2} y1={mid + 4} y2={mid - 4} stroke={CHART_COLOURS.tie} strokeWidth={1.25} />;
    case 'tie-conflict':
      return <line x1={0} x2={SWATCH_PX - 2} y1={mid + 4} y2={mid - 4} stroke={CHART_COLOURS.warning} strokeWidth={2} strokeDasharray="6 3" />;
    case 'tie-differs':
      return (
        <>
          <line x1={0} x2={SWATCH_PX - 2} y1={mid + 4} y2={mid - 4} stroke={CHART_COLOURS.tie} strokeWidth={2.5} />
          <rect x={SWATCH_PX / 2 - 4} y={mid - 3} width={6} height={6} transform={`rotate(45 ${SWATCH_PX / 2 - 1} ${mid})`} fill="#fff" stroke={CHART_COLOURS.tie} />
        </>
      );
    case 'band':
      return <rect x={0} y={mid - 5} width={SWATCH_PX - 2} height={10} fill={CHART_COLOURS.regionalBand} fillOpacity={0.35} />;
    case 'band-fails':
      return <rect x={0} y={mid - 5} width={SWATCH_PX - 2} height={10} fill={`url(#${hatchId})`} stroke={CHART_COLOURS.danger} strokeDasharray="3 2" />;
    case 'bar':
      return <rect x={0} y={mid - 5} width={SWATCH_PX - 2} height={10} fill={CHART_COLOURS.posteriorFill} fillOpacity={0.55} stroke={CHART_COLOURS.posterior} strokeWidth={0.75} />;
    case 'boundary':
      return <line x1={SWATCH_PX / 2} x2={SWATCH_PX / 2} y1={mid - 6} y2={mid + 6} stroke={CHART_COLOURS.axis} strokeWidth={1.25} strokeDasharray="4 2" />;
  }
}

export type ChartLegendSvgProps = { entries: readonly LegendEntry[]; x: number; y: number; maxWidth: number; hatchId: string };

/** A legend drawn inside the chart's SVG, so an exported figure carries it. */
export function ChartLegendSvg({ entries, x, y, maxWidth, hatchId }: ChartLegendSvgProps) {
  const { placed } = legendLayout(entries, maxWidth);
  return (
    <g transform={`translate(${x},${y})`} className="sc-chart-legend-svg">
      {placed.map(({ entry, x: ex, y: ey }) => (
        <g key={entry.label} transform={`translate(${ex},${ey + ROW_PX / 2})`}>
          <Swatch swatch={entry.swatch} hatchId={hatchId} />
          <text x={SWATCH_PX + 4} dy="0.32em" fontSize={10} fill={CHART_COLOURS.mutedText}>
            {entry.label}
          </text>
        </g>
      ))}
    </g>
  );
}
