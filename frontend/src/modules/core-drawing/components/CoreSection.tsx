import { Callout, FormGroup, Intent, NonIdealState, SegmentedControl } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useRef, useState } from 'react';
import { coreLogQueries } from '@/modules/core-logs/hooks/coreLogQueries';
import { AgeDepthChart } from '@/modules/core-drawing/components/AgeDepthChart';
import { CoreDrawing, coreDrawingHeight, type CoreDrawingTrace } from '@/modules/core-drawing/components/CoreDrawing';
import type { AgeDepthPoint, DatedLevel, DepthAxis } from '@/modules/core-drawing/utils/ageDepth';
import { coreScale } from '@/modules/core-drawing/utils/coreDepth';
import { FigureExportButtons } from '@/modules/correlation/components/FigureExportButtons';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';
import './coreDrawing.css';

export type CoreSectionProps = {
  projectId: string;
  siteId: string;
  /** The age-depth curve of a HEMIPELAGIC_RATE run; the chart is drawn only when given and not empty. */
  ageDepth?: readonly AgeDepthPoint[];
};

const DEPTH_OPTIONS: { value: DepthAxis; label: string }[] = [
  { value: 'TRUE', label: 'True depth' },
  { value: 'EVENT_FREE', label: 'Event-free depth' },
];

/**
 * A core drawn to depth beside its logs, and, for a hemipelagic run, its age-depth curve; one
 * switch sets the depth the logs and the curve are drawn on.
 */
export function CoreSection({ projectId, siteId, ageDepth }: CoreSectionProps) {
  const query = useQuery(coreLogQueries.site(projectId, siteId));
  const [axis, setAxis] = useState<DepthAxis>('TRUE');
  const drawingFigure = useRef<SVGSVGElement>(null);
  const chartFigure = useRef<SVGSVGElement>(null);
  const { ref: chartFrame, width: chartWidth } = useParentSize();
  const site = query.data;

  const scale = useMemo(() => (site ? coreScale(site.units) : null), [site]);
  const traces = useMemo<CoreDrawingTrace[]>(
    () =>
      site?.coreLogs.flatMap((log) =>
        log.traces.map((trace) => ({ key: `${log.id}-${trace.channel}`, channel: trace.channel, source: log.name, unit: trace.unit, depthsM: trace.depthsM, values: trace.values })),
      ) ?? [],
    [site],
  );
  const levels = useMemo<DatedLevel[]>(
    () =>
      site?.samples.flatMap((sample) =>
        sample.depthM === null || sample.depthM === undefined
          ? []
          : [
              {
                id: sample.id,
                label: sample.labCode,
                depthM: sample.depthM,
                excluded: sample.excluded,
                medianCalBp: sample.calibration?.medianCalBp ?? null,
                ranges: sample.calibration?.hpd95 ?? [],
              },
            ],
      ) ?? [],
    [site],
  );
  const horizons = useMemo(
    () =>
      site?.eventHorizons.flatMap((horizon) => {
        const above = site.units.find((unit) => unit.id === horizon.unitAbove.id);
        return above ? [{ id: horizon.id, name: horizon.name, depthM: above.baseDepthM, unitAboveId: above.id }] : [];
      }) ?? [],
    [site],
  );

  if (query.isPending) return <LoadingState label="Loading the core" />;
  if (query.isError) return <Callout intent={Intent.DANGER} title="The core could not be loaded">{query.error.message}</Callout>;
  if (!site || !scale) {
    return <NonIdealState icon={IconNames.LAYERS} title="Nothing to draw yet" description="Add units with depths to draw the core." />;
  }
  const showCurve = ageDepth !== undefined && ageDepth.length > 0;
  const chartHeight = coreDrawingHeight(scale.baseDepthM - scale.topDepthM) + 100;

  return (
    <section className="sc-panel sc-core-section" aria-label="The core drawn to depth">
      <div className="sc-core-toolbar">
        <h3>{showCurve ? 'Core and age-depth curve' : 'Core and logs'}</h3>
        <FormGroup label={showCurve ? 'Logs and curve on' : 'Logs on'} inline className="sc-core-axis-switch">
          <SegmentedControl size="small" options={DEPTH_OPTIONS} value={axis} onValueChange={(value) => setAxis(value as DepthAxis)} aria-label="Depth the logs are drawn on" />
        </FormGroup>
      </div>
      <div className={showCurve ? 'sc-core-figures sc-core-figures-pair' : 'sc-core-figures'}>
        <figure className="sc-core-figure">
          <figcaption>
            <span>The core on true and event-free depth</span>
            <FigureExportButtons figure={drawingFigure} title={`${site.name} core`} />
          </figcaption>
          <div className="sc-core-scroll">
            <CoreDrawing
              units={site.units}
              horizons={horizons}
              levels={levels}
              traces={traces}
              logsOn={axis}
              title={`${site.name}: the core on true and event-free depth`}
              svgRef={drawingFigure}
            />
          </div>
        </figure>
        {showCurve && (
          <figure className="sc-core-figure">
            <figcaption>
              <span>Age-depth curve</span>
              <FigureExportButtons figure={chartFigure} title={`${site.name} age-depth`} />
            </figcaption>
            <div ref={chartFrame} className="sc-core-chart-frame">
              {chartWidth > 0 && (
                <AgeDepthChart
                  points={ageDepth}
                  scale={scale}
                  levels={levels}
                  horizons={horizons}
                  axis={axis}
                  width={Math.max(360, chartWidth)}
                  height={chartHeight}
                  title={`${site.name}: age-depth curve on ${axis === 'TRUE' ? 'true' : 'event-free'} depth`}
                  svgRef={chartFigure}
                />
              )}
            </div>
          </figure>
        )}
      </div>
    </section>
  );
}
