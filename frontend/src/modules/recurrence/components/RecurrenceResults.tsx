import { Button, Callout, Classes, HTMLTable, Intent, ProgressBar, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useMemo, useRef, useState } from 'react';
import { Link, useParams } from 'react-router';
import { paths } from '@/app/paths';
import type { RecurrenceAnalysisQuery } from '@/gql/graphql';
import { AgeValue } from '@/modules/ages/components/AgeValues';
import { useSession } from '@/modules/auth/hooks/useSession';
import { FigureExportButtons } from '@/modules/correlation/components/FigureExportButtons';
import { downloadWithToken } from '@/modules/correlation/utils/figureDownload';
import { figureFileName } from '@/modules/correlation/utils/figureExport';
import { MODEL_ORDER, RecurrenceCurveChart, type ModelCurve } from '@/modules/recurrence/components/RecurrenceCurveChart';
import {
  elapsedSinceLastEvent,
  formatProbability,
  histogramAsDensity,
  isJobActive,
  modelLabel,
  recurrenceExportUrl,
  type SharedRecurrenceAxes,
} from '@/modules/recurrence/utils/recurrenceCharts';

export type RecurrenceAnalysisData = RecurrenceAnalysisQuery['recurrenceAnalysis'];

export type RecurrenceResultsProps = {
  analysis: RecurrenceAnalysisData;
  canCancel: boolean;
  cancelling: boolean;
  onCancel: () => void;
  /** Axes shared with the other side of a comparison; each figure fits its own data without them. */
  sharedAxes?: SharedRecurrenceAxes;
};

type Range = { median: number; low95: number; high95: number } | null | undefined;

function RangeCell({ range, digits = 0 }: { range: Range; digits?: number }) {
  if (!range) return <td className="num">–</td>;
  return (
    <td className="num">
      {range.median.toFixed(digits)} <span className="sc-chart-legend">({range.low95.toFixed(digits)}–{range.high95.toFixed(digits)})</span>
    </td>
  );
}

type WindowRange = { median: number; low95: number; high95: number; datingOnlyLow95?: number | null; datingOnlyHigh95?: number | null };

/** A probability: median and headline range (dating and parameters), the dating-only range beneath. */
function ProbabilityCell({ probability }: { probability: WindowRange | undefined }) {
  if (!probability) return <td className="num">–</td>;
  return (
    <td className="num">
      {formatProbability(probability.median)}{' '}
      <span className="sc-chart-legend">
        ({formatProbability(probability.low95)}–{formatProbability(probability.high95)})
      </span>
      {probability.datingOnlyLow95 != null && probability.datingOnlyHigh95 != null && (
        <div className="sc-chart-legend">
          dating only {formatProbability(probability.datingOnlyLow95)}–{formatProbability(probability.datingOnlyHigh95)}
        </div>
      )}
    </td>
  );
}

/** A parameter's range with parameter uncertainty, the dating-only range beneath. */
function ParameterCell({ range, digits }: { range: WindowRange | null | undefined; digits: number }) {
  if (!range) return <td className="num">–</td>;
  return (
    <td className="num">
      {range.median.toFixed(digits)}{' '}
      <span className="sc-chart-legend">
        ({range.low95.toFixed(digits)}–{range.high95.toFixed(digits)})
      </span>
      {range.datingOnlyLow95 != null && range.datingOnlyHigh95 != null && (
        <div className="sc-chart-legend">
          dating only {range.datingOnlyLow95.toFixed(digits)}–{range.datingOnlyHigh95.toFixed(digits)}
        </div>
      )}
    </td>
  );
}

function byModelOrder<T extends { model: (typeof MODEL_ORDER)[number] }>(entries: readonly T[]): T[] {
  return [...entries].sort((a, b) => MODEL_ORDER.indexOf(a.model) - MODEL_ORDER.indexOf(b.model));
}

/** The label of what an analysis ran on. */
export function analysisLabel(analysis: { segment?: { name: string } | null; site?: { name: string } | null; hypothesis?: { name: string } | null }): string {
  if (analysis.site) return `site ${analysis.site.name}`;
  return `${analysis.segment?.name ?? 'segment'} · ${analysis.hypothesis?.name ?? 'no hypothesis'}`;
}

/**
 * One recurrence analysis: the caution first, then progress or the figures, probabilities,
 * model comparison and statistics, with exports of the numbers and the figures.
 */
export function RecurrenceResults({ analysis, canCancel, cancelling, onCancel, sharedAxes }: RecurrenceResultsProps) {
  const session = useSession();
  const [exportError, setExportError] = useState<string | null>(null);
  const histogramFigure = useRef<SVGSVGElement | null>(null);
  const hazardFigure = useRef<SVGSVGElement | null>(null);
  const survivalFigure = useRef<SVGSVGElement | null>(null);

  const curves = useMemo(() => byModelOrder(analysis.curves), [analysis.curves]);
  const densityCurves = useMemo<ModelCurve[]>(() => curves.map((curve) => ({ model: curve.model, points: curve.density })), [curves]);
  const hazardCurves = useMemo<ModelCurve[]>(() => curves.map((curve) => ({ model: curve.model, points: curve.hazard })), [curves]);
  const survivalCurves = useMemo<ModelCurve[]>(() => curves.map((curve) => ({ model: curve.model, points: curve.survival })), [curves]);
  const bars = useMemo(() => histogramAsDensity(analysis.histogram), [analysis.histogram]);
  const elapsed = elapsedSinceLastEvent(analysis.forecastStartYear, analysis.lastEventMedianCalBp, analysis.openInterval?.median);
  const marker = elapsed === null ? null : { years: elapsed, label: `${Math.round(elapsed)} yr since last event (${analysis.forecastStartYear})` };
  const models = byModelOrder(analysis.models);
  const windows = [...analysis.windowsYears].sort((a, b) => a - b);
  const label = analysisLabel(analysis);

  const handleExport = (format: 'csv' | 'json') => () => {
    setExportError(null);
    downloadWithToken(recurrenceExportUrl(analysis.id, format), figureFileName(`recurrence ${label} ${analysis.forecastStartYear}`, format), session?.token).catch(
      (error: unknown) => setExportError(error instanceof Error ? error.message : 'the export failed'),
    );
  };

  const projectId = useParams().projectId ?? '';
  const handleEvents = () => {
    setExportError(null);
    downloadWithToken(`/api/recurrence-analyses/${encodeURIComponent(analysis.id)}/events.csv`, `analysis events ${label}.csv`, session?.token).catch((error: unknown) =>
      setExportError(error instanceof Error ? error.message : 'the export failed'),
    );
  };

  return (
    <div className="sc-recurrence-results">
      <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN} title="Research result, not a hazard assessment" className="sc-caution">
        {analysis.caution}
      </Callout>
      {analysis.stale && (
        <Callout intent={Intent.DANGER} icon={IconNames.OUTDATED} title="Out of date: its inputs changed after it was computed">
          <ul className="sc-stale-reasons">
            {analysis.staleReasons.map((reason) => (
              <li key={`${reason.message}|${reason.via.join('|')}`}>
                {reason.message}
                {reason.via.length > 0 && <span className={Classes.TEXT_MUTED}> (through the {reason.via.join(', then ')})</span>}
              </li>
            ))}
          </ul>
          Refresh stale results to re-run it with the same settings and seed.
        </Callout>
      )}
      {analysis.inputs.ageModelRuns.length > 0 && (
        <p className={Classes.TEXT_MUTED}>
          Computed from the age models of{' '}
          {analysis.inputs.ageModelRuns.map((run, i) => (
            <span key={run.id}>
              {i > 0 && ', '}
              <Link to={paths.ageModel(projectId, run.site.id)}>{run.site.name}</Link>
            </span>
          ))}
          {analysis.inputs.hypothesisVersion !== null && <> under hypothesis version <span className="num">{analysis.inputs.hypothesisVersion}</span></>}.
        </p>
      )}
      <div className="sc-run-status-line">
        <Tag minimal>{analysis.status.toLowerCase()}</Tag>
        <span>{label}</span>
        <span>
          seed <span className="num">{analysis.seed}</span> · <span className="num">{analysis.draws}</span> draws · from{' '}
          <span className="num">{analysis.forecastStartYear}</span> CE
        </span>
        {isJobActive(analysis.status) && (
          <>
            <ProgressBar className="sc-run-progress" intent={Intent.PRIMARY} value={analysis.status === 'QUEUED' ? undefined : analysis.progress} />
            {canCancel && <Button size="small" icon={IconNames.STOP} text="Cancel" onClick={onCancel} loading={cancelling} />}
          </>
        )}
        {analysis.status === 'SUCCEEDED' && (
          <>
            <Button size="small" icon={IconNames.DOWNLOAD} text="CSV" onClick={handleExport('csv')} />
            <Button size="small" icon={IconNames.DOWNLOAD} text="JSON" onClick={handleExport('json')} />
            <Button size="small" icon={IconNames.DOWNLOAD} text="Events CSV" onClick={handleEvents} />
          </>
        )}
      </div>
      {exportError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {exportError}
        </Callout>
      )}
      {analysis.status === 'FAILED' && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} title="The analysis failed">
          {analysis.message ?? 'No reason was given.'}
        </Callout>
      )}
      {analysis.status === 'SUCCEEDED' && (
        <>
          <div className="sc-recurrence-figures">
            <section>
              <div className="sc-figure-head">
                <strong>Inter-event times and fitted densities</strong>
                <FigureExportButtons figure={histogramFigure} title={`Intervals ${label}`} />
              </div>
              <RecurrenceCurveChart
                curves={densityCurves}
                bars={bars}
                xLabel="inter-event time, years"
                yLabel="density per year"
                yMax={sharedAxes?.densityMax}
                yearsMax={sharedAxes?.yearsMax}
                figure={histogramFigure}
              />
            </section>
            <section>
              <div className="sc-figure-head">
                <strong>Hazard rate</strong>
                <FigureExportButtons figure={hazardFigure} title={`Hazard ${label}`} />
              </div>
              <RecurrenceCurveChart
                curves={hazardCurves}
                marker={marker}
                xLabel="years since an event"
                yLabel="hazard per year"
                yMax={sharedAxes?.hazardMax}
                yearsMax={sharedAxes?.yearsMax}
                figure={hazardFigure}
              />
            </section>
            <section>
              <div className="sc-figure-head">
                <strong>Survival</strong>
                <FigureExportButtons figure={survivalFigure} title={`Survival ${label}`} />
              </div>
              <RecurrenceCurveChart
                curves={survivalCurves}
                marker={marker}
                xLabel="years since an event"
                yLabel="probability of no event"
                yMax={1}
                yearsMax={sharedAxes?.yearsMax}
                figure={survivalFigure}
              />
            </section>
          </div>

          <h3>Conditional probability of the next event</h3>
          <p className="sc-chart-legend">
            In a window starting {analysis.forecastStartYear} CE, given no event since the last one: median with its 95 % range over draws of the
            event ages and of each model&apos;s parameters; beneath it, the narrower range from dating alone (each draw&apos;s best fit plugged in), which
            understates the uncertainty.
          </p>
          <HTMLTable compact striped className="sc-table">
            <thead>
              <tr>
                <th>Model</th>
                {windows.map((window) => (
                  <th key={window} className="num">
                    {window} yr
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {models.map((model) => (
                <tr key={model.model}>
                  <td>{modelLabel(model.model)}</td>
                  {windows.map((window) => (
                    <ProbabilityCell key={window} probability={model.probabilities.find((entry) => entry.windowYears === window)} />
                  ))}
                </tr>
              ))}
              {analysis.modelAveraged.length > 0 && (
                <tr>
                  <td>Model-averaged (AICc weights)</td>
                  {windows.map((window) => (
                    <ProbabilityCell key={window} probability={analysis.modelAveraged.find((entry) => entry.windowYears === window)} />
                  ))}
                </tr>
              )}
              <tr>
                <td>Poisson, 1 − exp(−ΔT/μ), dating only</td>
                {windows.map((window) => {
                  const poisson = analysis.poisson.find((entry) => entry.windowYears === window);
                  return (
                    <td key={window} className="num">
                      {poisson ? (
                        <>
                          {formatProbability(poisson.median)}{' '}
                          <span className="sc-chart-legend">
                            ({formatProbability(poisson.low95)}–{formatProbability(poisson.high95)})
                          </span>
                        </>
                      ) : (
                        '–'
                      )}
                    </td>
                  );
                })}
              </tr>
            </tbody>
          </HTMLTable>
          {analysis.parameterNote && <p className="sc-chart-legend">{analysis.parameterNote}</p>}

          <h3>Model comparison</h3>
          <HTMLTable compact striped className="sc-table">
            <thead>
              <tr>
                <th>Model</th>
                <th className="num">Mean recurrence, yr</th>
                <th className="num">Aperiodicity</th>
                <th className="num">log L</th>
                <th className="num">AIC</th>
                <th className="num">AICc</th>
                <th className="num">ΔAICc</th>
                <th className="num">Akaike weight (AICc)</th>
              </tr>
            </thead>
            <tbody>
              {[...models]
                .sort((a, b) => (a.deltaAicc ?? Infinity) - (b.deltaAicc ?? Infinity) || a.deltaAic - b.deltaAic)
                .map((model) => (
                  <tr key={model.model}>
                    <td>{modelLabel(model.model)}</td>
                    {model.meanRecurrenceRange ? (
                      <ParameterCell range={model.meanRecurrenceRange} digits={0} />
                    ) : (
                      <td className="num">{model.meanRecurrenceYears.toFixed(0)}</td>
                    )}
                    {model.model === 'POISSON' ? (
                      <td className="num">1</td>
                    ) : model.aperiodicityRange ? (
                      <ParameterCell range={model.aperiodicityRange} digits={2} />
                    ) : (
                      <td className="num">{model.aperiodicity.toFixed(2)}</td>
                    )}
                    <td className="num">{model.logLikelihood.toFixed(2)}</td>
                    <td className="num">{model.aic.toFixed(2)}</td>
                    <td className="num">{model.aicc == null ? 'too few intervals' : model.aicc.toFixed(2)}</td>
                    <td className="num">{model.deltaAicc == null ? '–' : model.deltaAicc.toFixed(2)}</td>
                    <td className="num">{model.akaikeWeight.toFixed(3)}</td>
                  </tr>
                ))}
            </tbody>
          </HTMLTable>
          <p className="sc-chart-legend">
            Mean recurrence here is each model's fitted mean μ: its maximum-likelihood fit, with the time since the last event as
            an interval still open, refitted in every draw (median and 95 % range; "dating only" holds the parameters fixed). It
            differs from the interval statistics below, which average the closed intervals of each draw without any model.
          </p>
          {analysis.modelComparisonNote && <p className="sc-chart-legend">{analysis.modelComparisonNote}</p>}

          <h3>Interval statistics</h3>
          <p className="sc-chart-legend">
            Each figure is the median over the Monte Carlo draws of the event ages, with its 95 % range in brackets. The Poisson
            row of the probability table uses this mean recurrence draw by draw.
          </p>
          <HTMLTable compact className="sc-table">
            <tbody>
              <tr>
                <th>Events</th>
                <td className="num">{analysis.eventCount ?? '–'}</td>
              </tr>
              <tr>
                <th>Last event (median)</th>
                <td>
                  <AgeValue calBp={analysis.lastEventMedianCalBp} />
                </td>
              </tr>
              <tr>
                <th>Open interval, yr</th>
                <RangeCell range={analysis.openInterval} />
              </tr>
              <tr>
                <th>
                  Mean recurrence, yr
                  <div className="sc-chart-legend">mean of the closed intervals in each draw of the event ages</div>
                </th>
                <RangeCell range={analysis.meanRecurrence} />
              </tr>
              <tr>
                <th>Median recurrence, yr</th>
                <RangeCell range={analysis.medianRecurrence} />
              </tr>
              <tr>
                <th>Standard deviation, yr</th>
                <RangeCell range={analysis.sdRecurrence} />
              </tr>
              <tr>
                <th>Coefficient of variation</th>
                <RangeCell range={analysis.aperiodicity} digits={2} />
              </tr>
            </tbody>
          </HTMLTable>
          {analysis.intervals.length > 0 && (
            <HTMLTable compact striped className="sc-table">
              <thead>
                <tr>
                  <th>Between events (older → younger)</th>
                  <th className="num">Median, yr</th>
                  <th className="num">95 % range, yr</th>
                </tr>
              </thead>
              <tbody>
                {analysis.intervals.map((interval) => (
                  <tr key={interval.index}>
                    <td>
                      {intervalLabel(interval)}
                    </td>
                    <td className="num">{interval.medianYears.toFixed(0)}</td>
                    <td className="num">
                      {interval.low95.toFixed(0)}–{interval.high95.toFixed(0)}
                    </td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          )}
        </>
      )}
    </div>
  );
}

/**
 * An interval's ends by name ("E3 → E2", oldest first as time runs), with the events' places in
 * the record (1 = youngest) when the analysis could not name them (weights vary the record).
 */
export function intervalLabel(interval: { index: number; youngerEvent?: string | null; olderEvent?: string | null }): string {
  const older = interval.olderEvent ? `${interval.olderEvent} (${interval.index + 2})` : `event ${interval.index + 2}`;
  const younger = interval.youngerEvent ? `${interval.youngerEvent} (${interval.index + 1})` : `event ${interval.index + 1}`;
  return `${older} → ${younger}`;
}
