import { HTMLSelect, NonIdealState, SegmentedControl } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { scaleLinear } from 'd3';
import { useMemo, useRef, useState, type ChangeEvent } from 'react';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import type { LadderColumn } from '@/modules/correlation/components/EventLadderChart';
import { FigureExportButtons } from '@/modules/correlation/components/FigureExportButtons';
import { HypothesisSizeProfilesDocument } from '@/modules/correlation/graphql/ladder';
import { ladderQueries } from '@/modules/correlation/hooks/ladderQueries';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { profileSeries, quantitiesOf, SIZE_QUANTITIES, valueExtent, type SizeQuantity } from '@/modules/correlation/utils/sizeProfile';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

const MARGIN = { top: 16, right: 24, bottom: 34, left: 64 };
const HEIGHT = 240;

export type SizeProfileChartProps = { projectId: string; hypothesisId: string; columns: readonly LadderColumn[] };

/**
 * Under the space-time view: one regional event's measured size at each member site along strike
 * (subsidence or displacement with 1σ error bars, or a core's event-bed thickness), on the same
 * along-strike extent as the sites above.
 */
export function SizeProfileChart({ projectId, hypothesisId, columns }: SizeProfileChartProps) {
  const { ref, width } = useParentSize();
  const figure = useRef<SVGSVGElement | null>(null);
  const { age } = useAgeScale();
  const query = useQuery({
    queryKey: [...ladderQueries.hypotheses(projectId), hypothesisId, 'size-profiles'] as const,
    queryFn: async () => (await graphqlRequest(HypothesisSizeProfilesDocument, { id: hypothesisId })).hypothesis,
  });
  const measured = useMemo(() => (query.data?.regionalEvents ?? []).filter((event) => quantitiesOf(event.sizeProfile).length > 0), [query.data]);
  const [chosenId, setChosenId] = useState<string | null>(null);
  const [chosenQuantity, setChosenQuantity] = useState<SizeQuantity>('subsidence');
  const event = measured.find((entry) => entry.id === chosenId) ?? measured[0] ?? null;
  const available = event ? quantitiesOf(event.sizeProfile) : [];
  const quantity = available.includes(chosenQuantity) ? chosenQuantity : (available[0] ?? 'subsidence');
  const series = useMemo(() => (event ? profileSeries(event.sizeProfile, quantity) : []), [event, quantity]);
  const distance = useMemo(() => {
    const kms = [...columns.map((column) => column.site.alongStrikeKm), ...series.map((point) => point.km)];
    const low = Math.min(...kms, 0);
    const high = Math.max(...kms, 1);
    const pad = (high - low) * 0.03;
    return scaleLinear().domain([low - pad, high + pad]).range([MARGIN.left, Math.max(width - MARGIN.right, MARGIN.left + 1)]);
  }, [columns, series, width]);
  const values = useMemo(() => scaleLinear().domain(valueExtent(series)).range([HEIGHT - MARGIN.bottom, MARGIN.top]).nice(), [series]);

  if (query.isPending || query.isError) return null;
  if (measured.length === 0) {
    return (
      <NonIdealState
        icon={IconNames.TIMELINE_AREA_CHART}
        title="No measured event sizes"
        description="Give event horizons their coseismic subsidence or displacement (or a core's event bed its depths) to see an event's size along strike."
      />
    );
  }
  const eventLabel = (entry: (typeof measured)[number]) =>
    `${entry.members.map((member) => member.name).join(' + ')}${entry.combinedMedianCalBp == null ? '' : ` · ${age(entry.combinedMedianCalBp)}`}`;
  const handleEvent = (change: ChangeEvent<HTMLSelectElement>) => setChosenId(change.target.value);
  const handleQuantity = (value: string) => setChosenQuantity(value as SizeQuantity);
  const axis = SIZE_QUANTITIES.find((q) => q.value === quantity)?.axis ?? '';

  return (
    <section className="sc-size-profile">
      <div className="sc-figure-head">
        <strong>Event size along strike</strong>
        <HTMLSelect value={event?.id ?? ''} onChange={handleEvent} aria-label="Regional event" minimal>
          {measured.map((entry) => (
            <option key={entry.id} value={entry.id}>
              {eventLabel(entry)}
            </option>
          ))}
        </HTMLSelect>
        <SegmentedControl
          size="small"
          options={SIZE_QUANTITIES.filter((q) => available.includes(q.value)).map((q) => ({ value: q.value, label: q.label }))}
          value={quantity}
          onValueChange={handleQuantity}
          aria-label="Quantity"
        />
        <FigureExportButtons figure={figure} title={`Size profile ${event ? eventLabel(event) : ''} ${quantity}`} />
      </div>
      <div ref={ref} className="sc-chart-frame">
        {width > 0 && (
          <svg ref={figure} width={width} height={HEIGHT} role="img" aria-label={`Measured ${quantity} along strike`}>
            {values.ticks(5).map((tick) => (
              <g key={tick}>
                <line x1={MARGIN.left} x2={width - MARGIN.right} y1={values(tick)} y2={values(tick)} stroke={tick === 0 ? CHART_COLOURS.axis : CHART_COLOURS.grid} />
                <text x={MARGIN.left - 6} y={values(tick)} dy="0.32em" textAnchor="end" fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
                  {tick}
                </text>
              </g>
            ))}
            {distance.ticks(8).map((km) => (
              <text key={km} x={distance(km)} y={HEIGHT - 18} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
                {km}
              </text>
            ))}
            <text x={width - MARGIN.right} y={HEIGHT - 4} textAnchor="end" fontSize={10} fill={CHART_COLOURS.mutedText}>
              along strike, km
            </text>
            <text x={8} y={MARGIN.top - 4} fontSize={10} fill={CHART_COLOURS.mutedText}>
              {axis}
            </text>
            {series.map((point) => {
              const x = distance(point.km);
              const y = values(point.value);
              return (
                <g key={`${point.km}-${point.eventName}`}>
                  {point.error !== null && (
                    <>
                      <line x1={x} x2={x} y1={values(point.value - point.error)} y2={values(point.value + point.error)} stroke={CHART_COLOURS.posterior} />
                      <line x1={x - 4} x2={x + 4} y1={values(point.value - point.error)} y2={values(point.value - point.error)} stroke={CHART_COLOURS.posterior} />
                      <line x1={x - 4} x2={x + 4} y1={values(point.value + point.error)} y2={values(point.value + point.error)} stroke={CHART_COLOURS.posterior} />
                    </>
                  )}
                  <circle cx={x} cy={y} r={4} fill={CHART_COLOURS.posteriorFill} stroke={CHART_COLOURS.posterior}>
                    <title>{`${point.siteName} ${point.eventName}: ${point.value} m${point.error === null ? '' : ` ± ${point.error} m (1σ)`} at ${point.km} km`}</title>
                  </circle>
                  <text x={x} y={y - 8} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.text}>
                    {point.siteName}
                  </text>
                </g>
              );
            })}
          </svg>
        )}
      </div>
      <p className="sc-chart-legend">
        Members without this measurement are not drawn. Points are single-site measurements: they bound where the rupture reached, not its full extent.
      </p>
    </section>
  );
}
