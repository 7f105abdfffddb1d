import { Button, Callout, H2, HTMLTable, Intent, NonIdealState, ProgressBar, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { type ReactNode, useEffect, useMemo, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { AgeModelRunQuery } from '@/gql/graphql';
import { CancelAgeModelRunDocument, ChooseDownstreamRunDocument, StartAgeModelRunDocument } from '@/modules/age-model/graphql/ageModel';
import { ageModelQueries } from '@/modules/age-model/hooks/ageModelQueries';
import { bracketingSamples, eventChartWindow, formatOffset, isFlaggedOutlier, isRunActive, OUTLIER_FLAG_PROBABILITY, RUN_SETTINGS_FIELDS, type RunSettingsInput } from '@/modules/age-model/utils/ageModelView';
import { downstreamSentence, newestFirst, runsToShow } from '@/modules/age-model/utils/runHistory';
import { AgeRangesValue, AgeValue } from '@/modules/ages/components/AgeValues';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { fieldErrorsOf, formErrorOf } from '@/modules/api/utils/apiError';
import { allows } from '@/modules/auth/utils/permissions';
import { CoreSection } from '@/modules/core-drawing/components/CoreSection';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { CompactSiteLadder } from './CompactSiteLadder';
import { EventPosteriorChart, type LikelihoodOutline } from './EventPosteriorChart';
import { RunDiagnostics } from './RunDiagnostics';
import { RunHistory } from './RunHistory';
import { RunSettingsForm } from './RunSettingsForm';
import { RunProvenance } from './RunProvenance';
import { RunStatusPanel } from './RunStatusPanel';
import '@/modules/correlation/components/charts.css';

export type AgeModelViewProps = { projectId: string; siteId: string };

/**
 * A site's age model: start a run, follow it, and read each event's posterior beside the
 * calibrated likelihoods it came from, with diagnostics and flagged samples.
 */
export function AgeModelView({ projectId, siteId }: AgeModelViewProps) {
  const queryClient = useQueryClient();
  const siteQuery = useQuery(ageModelQueries.site(projectId, siteId));
  const [startedRunId, setStartedRunId] = useState<string | null>(null);
  const [selectedRunId, setSelectedRunId] = useState<string | null>(null);
  const history = useMemo(() => newestFirst(siteQuery.data?.ageModelRuns ?? []), [siteQuery.data]);
  const { shownId, activeId } = runsToShow(history, selectedRunId, startedRunId);
  const runQuery = useQuery({ ...ageModelQueries.run(projectId, shownId ?? ''), enabled: shownId !== null });
  // The run in progress is polled on its own; the results above stay those of `shownId`.
  const activeQuery = useQuery({ ...ageModelQueries.run(projectId, activeId ?? ''), enabled: activeId !== null && activeId !== shownId });
  const invalidates = [ageModelQueries.all(projectId)];
  const start = useGraphqlMutation(StartAgeModelRunDocument, { invalidates });
  const cancel = useGraphqlMutation(CancelAgeModelRunDocument, { invalidates });
  // A new choice changes event ages across the project (ladder, regional events): refresh it all.
  const choose = useGraphqlMutation(ChooseDownstreamRunDocument, { invalidates: [projectQueries.detail(projectId)] });

  // A run that has just finished changes every event's age in the project: refresh it all
  // (the history with it, which then shows the finished run's results).
  // A run so quick that it had ended at its first poll counts too: the history still calls it active.
  const activeRun = activeQuery.data;
  const refreshedFor = useRef<string | null>(null);
  useEffect(() => {
    if (!activeRun || isRunActive(activeRun.status) || refreshedFor.current === activeRun.id) return;
    refreshedFor.current = activeRun.id;
    void queryClient.invalidateQueries({ queryKey: projectQueries.detail(projectId) });
  }, [activeRun, projectId, queryClient]);

  const site = siteQuery.data;
  const run = runQuery.data;
  const events = useMemo(() => {
    if (!site || !run) return [];
    const horizons = new Map(site.eventHorizons.map((horizon) => [horizon.id, horizon]));
    return run.events
      .map((posterior) => {
        const horizon = horizons.get(posterior.eventHorizon.id);
        const likelihoods: LikelihoodOutline[] = horizon
          ? bracketingSamples(horizon, site.samples).map(({ sample, side }) => ({
              id: sample.id,
              labCode: sample.labCode,
              side,
              density: sample.calibration?.density ?? [],
            }))
          : [];
        return { posterior, likelihoods };
      })
      .sort((a, b) => a.posterior.medianCalBp - b.posterior.medianCalBp);
  }, [site, run]);

  if (siteQuery.isPending) return <LoadingState />;
  if (siteQuery.isError) {
    return <NonIdealState icon={IconNames.ERROR} title="The site could not be loaded" description={siteQuery.error.message} />;
  }
  const loadedSite = siteQuery.data;
  const mayRun = allows(loadedSite.project, 'AGE_MODEL_RUN');
  const busy = activeId !== null || (run ? isRunActive(run.status) : false);
  // Downstream screens read the chosen run, else the newest successful one (Site.downstreamRun).
  const downstream = { downstreamId: loadedSite.downstreamRun?.id ?? null, chosenId: loadedSite.downstreamRunChoice?.run.id ?? null };
  const handleChoose = (runId: string | null) => choose.mutate({ input: { siteId, runId } });

  const handleStart = (settings: RunSettingsInput) => {
    start.mutate(
      { input: { siteId, ...settings } },
      {
        onSuccess: ({ startAgeModelRun }) => {
          setStartedRunId(startAgeModelRun.id);
          setSelectedRunId(null);
        },
      },
    );
  };
  const handleCancel = (id: string) => cancel.mutate({ id });

  return (
    <div className="sc-age-model">
      <header className="sc-page-header">
        <div className="sc-title-row">
          <H2 className="sc-page-title">Age model · {loadedSite.name}</H2>
          <Tag minimal>{loadedSite.kind.toLowerCase()}</Tag>
          <Link to={paths.site(projectId, siteId)}>Back to the column</Link>
        </div>
      </header>

      {mayRun && (
        <section className="sc-panel">
          <h3>New run</h3>
          <RunSettingsForm
            onStart={handleStart}
            starting={start.isPending}
            busy={busy}
            site={loadedSite}
            error={formErrorOf(start.error, RUN_SETTINGS_FIELDS)}
            serverErrors={fieldErrorsOf(start.error)}
          />
        </section>
      )}

      {activeId !== null && activeId !== shownId && (
        <RunInProgress
          run={activeRun}
          shownCreatedAt={run?.createdAt ?? null}
          canCancel={mayRun}
          cancelling={cancel.isPending}
          onCancel={() => handleCancel(activeId)}
        />
      )}

      {shownId === null ? (
        activeId === null && (
          <NonIdealState
            icon={IconNames.TIMELINE_EVENTS}
            title="No age model yet"
            description={mayRun ? 'Start a run to model this column.' : 'A researcher or admin can start a run for this site.'}
          />
        )
      ) : runQuery.isPending ? (
        <LoadingState label="Loading the run" />
      ) : runQuery.isError ? (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} title="The run could not be loaded">
          {runQuery.error.message}
        </Callout>
      ) : (
        <>
          {selectedRunId !== null && (
            <Callout icon={IconNames.HISTORY} className="sc-run-in-progress" title={`An earlier run: queued ${new Date(runQuery.data.createdAt).toLocaleString()}`}>
              {downstreamSentence(shownId, downstream)}{' '}
              <Button size="small" variant="minimal" intent={Intent.PRIMARY} text="Show the newest results" onClick={() => setSelectedRunId(null)} />
            </Callout>
          )}
          <RunResults
            run={runQuery.data}
            provenance={<RunProvenance projectId={projectId} siteId={siteId} siteName={loadedSite.name} run={runQuery.data} />}
            events={events}
            canCancel={mayRun}
            cancelling={cancel.isPending}
            onCancel={() => handleCancel(runQuery.data.id)}
          />
        </>
      )}

      {run?.status === 'SUCCEEDED' && run.depthModel === 'HEMIPELAGIC_RATE' && <CoreSection projectId={projectId} siteId={siteId} ageDepth={run.ageDepth} />}

      {history.length > 0 && (
        <>
          {choose.error && (
            <Callout intent={Intent.DANGER} icon={IconNames.ERROR} title="The choice was not saved">
              {choose.error.message}
            </Callout>
          )}
          <RunHistory
            runs={history}
            shownId={shownId}
            downstream={downstream}
            onShow={setSelectedRunId}
            mayChoose={mayRun}
            onChoose={handleChoose}
            choosing={choose.isPending}
          />
        </>
      )}
    </div>
  );
}

type ActiveRun = AgeModelRunQuery['ageModelRun'] | undefined;

type RunInProgressProps = {
  run: ActiveRun;
  /** When the run whose results are shown was queued; null when none is shown. */
  shownCreatedAt: string | null;
  canCancel: boolean;
  cancelling: boolean;
  onCancel: () => void;
};

/** The banner of a run that is queued or working, above the results of the last finished one. */
function RunInProgress({ run, shownCreatedAt, canCancel, cancelling, onCancel }: RunInProgressProps) {
  return (
    <Callout intent={Intent.PRIMARY} icon={IconNames.REFRESH} title="A new run is in progress" className="sc-run-in-progress" role="status">
      {run ? (
        <RunStatusPanel status={run.status} progress={run.progress} message={run.message} seed={run.seed} stale={false} canCancel={canCancel} cancelling={cancelling} onCancel={onCancel} />
      ) : (
        <ProgressBar className="sc-run-progress" intent={Intent.PRIMARY} />
      )}
      <div>
        {shownCreatedAt
          ? `Until it finishes, the results below are those of the run queued ${new Date(shownCreatedAt).toLocaleString()}.`
          : 'Its results appear here when it finishes.'}
      </div>
    </Callout>
  );
}

type RunData = AgeModelRunQuery['ageModelRun'];

type RunResultsProps = {
  run: RunData;
  /** Where its ages came from, with links. */
  provenance: ReactNode;
  events: { posterior: RunData['events'][number]; likelihoods: LikelihoodOutline[] }[];
  canCancel: boolean;
  cancelling: boolean;
  onCancel: () => void;
};

function RunResults({ run, provenance, events, canCancel, cancelling, onCancel }: RunResultsProps) {
  const compactEvents = useMemo(
    () =>
      events.map(({ posterior }) => ({
        id: posterior.eventHorizon.id,
        name: posterior.eventHorizon.name,
        medianCalBp: posterior.medianCalBp,
        density: posterior.density,
      })),
    [events],
  );
  const samples = [...run.samples].sort((a, b) => b.outlierProbability - a.outlierProbability);
  const flaggedCount = samples.filter((sample) => isFlaggedOutlier(sample.outlierProbability)).length;

  return (
    <>
      <RunStatusPanel
        status={run.status}
        progress={run.progress}
        message={run.message}
        seed={run.seed}
        stale={run.stale}
        staleReasons={run.staleReasons.map((reason) => reason.message)}
        canCancel={canCancel}
        cancelling={cancelling}
        onCancel={onCancel}
      />
      {provenance}
      {run.diagnostics && <RunDiagnostics {...run.diagnostics} />}
      {run.status === 'SUCCEEDED' && (
        <div className="sc-age-model-results">
          <section className="sc-panel sc-age-model-events">
            <h3>Event posteriors</h3>
            <p className="sc-chart-legend">
              <span style={{ color: CHART_COLOURS.posterior }}>■</span> posterior · <span style={{ color: CHART_COLOURS.likelihoodAbove }}>—</span> sample in the unit above ·{' '}
              <span style={{ color: CHART_COLOURS.likelihoodBelow }}>- -</span> sample in the unit below (each curve scaled to its own peak)
            </p>
            {events.map(({ posterior, likelihoods }) => (
              <div key={posterior.eventHorizon.id} className="sc-event-posterior">
                <h4>
                  {posterior.eventHorizon.name} <AgeValue calBp={posterior.medianCalBp} />
                </h4>
                <EventPosteriorChart
                  eventName={posterior.eventHorizon.name}
                  posterior={posterior.density}
                  likelihoods={likelihoods}
                  window={eventChartWindow(posterior.density, likelihoods.map((likelihood) => likelihood.density))}
                />
              </div>
            ))}
            <HTMLTable compact striped className="sc-table">
              <thead>
                <tr>
                  <th>Event</th>
                  <th>Median</th>
                  <th>68.3 % range</th>
                  <th>95.4 % range</th>
                  <th>R-hat</th>
                  <th>ESS</th>
                </tr>
              </thead>
              <tbody>
                {events.map(({ posterior }) => (
                  <tr key={posterior.eventHorizon.id}>
                    <td>{posterior.eventHorizon.name}</td>
                    <td>
                      <AgeValue calBp={posterior.medianCalBp} />
                    </td>
                    <td>
                      <AgeRangesValue ranges={posterior.hpd68} withProbability />
                    </td>
                    <td>
                      <AgeRangesValue ranges={posterior.hpd95} withProbability />
                    </td>
                    <td className="num">{posterior.rhat === null || posterior.rhat === undefined ? '–' : posterior.rhat.toFixed(3)}</td>
                    <td className="num">{posterior.ess === null || posterior.ess === undefined ? '–' : Math.round(posterior.ess)}</td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          </section>
          <aside className="sc-panel sc-age-model-side">
            <h3>Down the column</h3>
            <CompactSiteLadder events={compactEvents} />
            <h3>Samples</h3>
            {flaggedCount > 0 && (
              <Callout intent={Intent.WARNING} icon={IconNames.FLAG}>
                {flaggedCount} sample{flaggedCount === 1 ? '' : 's'} the run finds more than <span className="num">{Math.round(OUTLIER_FLAG_PROBABILITY * 100)} %</span>{' '}
                likely to be misplaced: check the material and where it was taken.
              </Callout>
            )}
            <HTMLTable compact striped className="sc-table">
              <thead>
                <tr>
                  <th>Lab code</th>
                  <th>Median</th>
                  <th>95.4 % range</th>
                  <th title="After the run: how likely the sample is misplaced (reworked, intruded, mislabelled), given the column's order">Misplaced?</th>
                  <th title="Inherited or intruded samples: how much older (+) or younger (−) the material is than its deposit, median and 95 % range, if the sample is not misplaced; the prior's mean is in the tooltip">
                    Offset
                  </th>
                </tr>
              </thead>
              <tbody>
                {samples.map((entry) => (
                  <tr key={entry.sample.id}>
                    <td className="num">{entry.sample.labCode}</td>
                    <td>
                      <AgeValue calBp={entry.medianCalBp} />
                    </td>
                    <td>
                      <AgeRangesValue ranges={entry.hpd95} />
                    </td>
                    <td>
                      <span className="num">{Math.round(entry.outlierProbability * 100)} %</span>{' '}
                      {isFlaggedOutlier(entry.outlierProbability) && (
                        <Tag intent={Intent.WARNING} minimal icon={IconNames.FLAG}>
                          check
                        </Tag>
                      )}
                    </td>
                    <td className="num" title={entry.offset ? `prior mean ${Math.round(entry.offset.scaleYears)} years` : undefined}>
                      {formatOffset(entry.offset)}
                    </td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
            {run.reservoirOffsets.length > 0 && (
              <>
                <h3>Reservoir offsets</h3>
                <p className="sc-chart-legend">One local Delta-R per source, shared by its marine samples (14C yr).</p>
                <HTMLTable compact striped className="sc-table">
                  <thead>
                    <tr>
                      <th>Source</th>
                      <th>Prior</th>
                      <th>Posterior median</th>
                      <th>95 % range</th>
                      <th>Samples</th>
                    </tr>
                  </thead>
                  <tbody>
                    {run.reservoirOffsets.map((offset) => (
                      <tr key={offset.source}>
                        <td>{offset.source}</td>
                        <td className="num">
                          {Math.round(offset.priorMeanYears)} ± {Math.round(offset.priorSdYears)}
                        </td>
                        <td className="num">{Math.round(offset.medianYears)}</td>
                        <td className="num">
                          {Math.round(offset.low95Years)} to {Math.round(offset.high95Years)}
                        </td>
                        <td className="num">{offset.samples.map((sample) => sample.labCode).join(', ')}</td>
                      </tr>
                    ))}
                  </tbody>
                </HTMLTable>
              </>
            )}
          </aside>
        </div>
      )}
    </>
  );
}
