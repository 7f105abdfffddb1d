import { Button, Callout, FormGroup, HTMLSelect, InputGroup, Intent, NonIdealState, TextArea } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { scaleLinear } from 'd3';
import { useState } from 'react';
import { coreLogQueries, useCoreLogMutations } from '@/modules/core-logs/hooks/coreLogQueries';
import { eventFreeDepth } from '@/modules/core-logs/utils/eventFreeDepth';

export type CoreLogsViewProps = {
  projectId: string;
  siteId: string;
  canEdit: boolean;
};

type DepthAxis = 'TRUE' | 'EVENT_FREE';

const PLOT_WIDTH = 150;
const PLOT_HEIGHT = 420;
const MARGIN = { top: 24, right: 8, bottom: 8, left: 44 };

/** A core's physical-property logs drawn beside its column (beds shaded), and the upload form. */
export function CoreLogsView({ projectId, siteId, canEdit }: CoreLogsViewProps) {
  const { data: site } = useQuery(coreLogQueries.site(projectId, siteId));
  const { upload, remove } = useCoreLogMutations(projectId, siteId);
  const [name, setName] = useState('');
  const [csv, setCsv] = useState('');
  const [axis, setAxis] = useState<DepthAxis>('TRUE');
  if (!site) return null;
  const units = site.units;
  const toAxis = (depth: number) => (axis === 'TRUE' ? depth : eventFreeDepth(units, depth));
  const deepest = Math.max(0.01, ...site.coreLogs.map((log) => log.baseDepthM), ...units.map((u) => u.baseDepthM));
  const y = scaleLinear().domain([0, toAxis(deepest)]).range([MARGIN.top, PLOT_HEIGHT - MARGIN.bottom]);
  const beds = units.filter((u) => u.facies === 'TURBIDITE');

  const handleUpload = () => upload.mutate({ input: { siteId, name, csv } }, { onSuccess: () => { setName(''); setCsv(''); } });
  const handleFile = async (file: File | undefined) => {
    if (file) setCsv(await file.text());
  };

  return (
    <div className="sc-core-logs">
      <FormGroup label="Depth" inline>
        <HTMLSelect value={axis} onChange={(e) => setAxis(e.currentTarget.value as DepthAxis)}>
          <option value="TRUE">True depth (m)</option>
          <option value="EVENT_FREE">Event-free depth (m, turbidites removed)</option>
        </HTMLSelect>
      </FormGroup>
      {site.coreLogs.length === 0 && <NonIdealState icon={IconNames.TIMELINE_LINE_CHART} title="No core logs yet" />}
      <div style={{ display: 'flex', flexWrap: 'wrap', gap: 12 }}>
        {site.coreLogs.flatMap((log) =>
          log.traces.map((trace) => {
            const x = scaleLinear()
              .domain([Math.min(...trace.values), Math.max(...trace.values)])
              .nice()
              .range([MARGIN.left, PLOT_WIDTH - MARGIN.right]);
            const path = trace.depthsM.map((d, i) => `${i === 0 ? 'M' : 'L'}${(x(trace.values[i] ?? 0) ?? 0).toFixed(1)},${(y(toAxis(d)) ?? 0).toFixed(1)}`).join('');
            return (
              <figure key={`${log.id}-${trace.channel}`} style={{ margin: 0 }}>
                <svg width={PLOT_WIDTH} height={PLOT_HEIGHT} role="img" aria-label={`${log.name}: ${trace.channel}`}>
                  {axis === 'TRUE' &&
                    beds.map((bed) => (
                      <rect key={bed.id} x={MARGIN.left} width={PLOT_WIDTH - MARGIN.left - MARGIN.right} y={y(bed.topDepthM)} height={y(bed.baseDepthM) - y(bed.topDepthM)} fill="#c9b48a" opacity={0.35} />
                    ))}
                  {axis === 'EVENT_FREE' &&
                    beds.map((bed) => <line key={bed.id} x1={MARGIN.left} x2={PLOT_WIDTH - MARGIN.right} y1={y(toAxis(bed.topDepthM))} y2={y(toAxis(bed.topDepthM))} stroke="#8a6d3b" strokeDasharray="3 2" />)}
                  <path d={path} fill="none" stroke="#4a5d6b" strokeWidth={1.2} />
                  {y.ticks(8).map((tick) => (
                    <text key={tick} x={MARGIN.left - 4} y={y(tick)} textAnchor="end" dominantBaseline="middle" fontSize={10} className="num">
                      {tick.toFixed(1)}
                    </text>
                  ))}
                  <text x={MARGIN.left} y={12} fontSize={11}>
                    {trace.channel} ({trace.unit})
                  </text>
                </svg>
                <figcaption className="num" style={{ fontSize: 11 }}>
                  {log.name} · {log.rowCount} rows · {log.topDepthM}-{log.baseDepthM} m
                  {canEdit && trace.channel === log.channels[0] && (
                    <Button small minimal icon={IconNames.TRASH} aria-label={`Delete ${log.name}`} onClick={() => remove.mutate({ id: log.id })} />
                  )}
                </figcaption>
              </figure>
            );
          }),
        )}
      </div>
      {canEdit && (
        <div style={{ maxWidth: 640, marginTop: 16 }}>
          <h4>Upload a core log</h4>
          <p>CSV: a header "depth (m)" then one "name (unit)" per channel; one row per depth, increasing down the core.</p>
          <FormGroup label="Name" labelFor="core-log-name">
            <InputGroup id="core-log-name" value={name} onChange={(e) => setName(e.currentTarget.value)} />
          </FormGroup>
          <FormGroup label="CSV file or text" labelFor="core-log-csv">
            <input type="file" accept=".csv,text/csv,text/plain" onChange={(e) => void handleFile(e.currentTarget.files?.[0])} />
            <TextArea id="core-log-csv" fill rows={6} value={csv} onChange={(e) => setCsv(e.currentTarget.value)} className="num" />
          </FormGroup>
          {upload.error && (
            <Callout intent={Intent.DANGER} title="The log was not stored">
              {upload.error.message}
            </Callout>
          )}
          <Button intent={Intent.PRIMARY} icon={IconNames.UPLOAD} disabled={!name.trim() || !csv.trim()} loading={upload.isPending} onClick={handleUpload}>
            Check and store
          </Button>
        </div>
      )}
    </div>
  );
}
