import { Button, Callout, Classes, HTMLTable, Intent, NumericInput, ProgressBar, Switch, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/app/paths';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { LatestRefreshDocument, RefreshStaleResultsDocument, SetRefreshSettingsDocument } from '@/modules/recurrence/graphql/recurrence';
import { chosenRunNotes, progressLine, stepNote } from '@/modules/recurrence/utils/refreshPlan';

/** Polling interval while a refresh is active. */
const REFRESH_POLL_MS = 2000;

const refreshQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'refresh'] as const,
  latest: (projectId: string) =>
    queryOptions({
      queryKey: [...refreshQueries.all(projectId), 'latest'] as const,
      queryFn: async () => (await graphqlRequest(LatestRefreshDocument, { projectId })).project,
      refetchInterval: (query) => (query.state.data?.refreshPlans[0]?.status === 'ACTIVE' ? REFRESH_POLL_MS : false),
    }),
};

const STAGE_LABEL: Record<number, string> = { 1: 'site age model', 2: 'joint run', 3: 'analysis' };
const STATUS_INTENT: Record<string, Intent> = { SUCCEEDED: Intent.SUCCESS, FAILED: Intent.DANGER, BLOCKED: Intent.WARNING, QUEUED: Intent.PRIMARY };

export type RefreshPanelProps = {
  projectId: string;
  /** Whether the reader may change the project's settings (the automatic refresh). */
  canConfigure: boolean;
  /** Show a fresh analysis on this page. */
  onShowAnalysis?: (analysisId: string) => void;
};

/**
 * One action that re-runs every stale result in order, and the whole plan of the latest refresh:
 * what is queued now, what waits for which run, what ended and how, and what was skipped and why.
 */
export function RefreshPanel({ projectId, canConfigure, onShowAnalysis }: RefreshPanelProps) {
  const latest = useQuery(refreshQueries.latest(projectId));
  const refresh = useGraphqlMutation(RefreshStaleResultsDocument, { invalidates: [projectQueries.detail(projectId)] });
  const plan = latest.data?.refreshPlans[0] ?? null;
  const handleRefresh = () => refresh.mutate({ projectId });
  const siteOfRun = new Map((plan?.ageModelRuns ?? []).map((run) => [run.id, run.site.id]));
  const choices = latest.data?.downstreamRunChoices ?? [];
  const chosenNotes = chosenRunNotes(choices, (iso) => new Date(iso).toLocaleString());

  const freshLink = (step: NonNullable<typeof plan>['steps'][number]) => {
    if (!step.freshId || step.status === 'FAILED') return null;
    if (step.kind === 'ageModelRun') {
      const siteId = siteOfRun.get(step.freshId);
      return siteId ? <Link to={paths.ageModel(projectId, siteId)}>fresh run</Link> : null;
    }
    if (step.kind === 'jointRun') return <Link to={paths.ladder(projectId)}>joint run on the ladder</Link>;
    if (step.kind === 'recurrenceAnalysis' && onShowAnalysis && step.status === 'SUCCEEDED') {
      return (
        <Button size="small" variant="minimal" text="show fresh analysis" onClick={() => onShowAnalysis(step.freshId!)} />
      );
    }
    return null;
  };

  return (
    <section className="sc-panel">
      <h3>Stale results</h3>
      <p className={Classes.TEXT_MUTED}>
        Re-runs every out-of-date age model and analysis your role may start, site age models first and each analysis once the runs it needs
        are done, with the same settings and seeds. A failure stops only what needs it.
      </p>
      <Button icon={IconNames.REFRESH} text="Refresh stale results" onClick={handleRefresh} loading={refresh.isPending} disabled={plan?.status === 'ACTIVE'} />
      {refresh.error && <p className={Classes.INTENT_DANGER}>{refresh.error.message}</p>}
      {chosenNotes.length > 0 && (
        <Callout icon={IconNames.PIN} title="Chosen runs that are not the newest" className="sc-chosen-runs">
          <p>A refresh re-runs and keeps to these chosen runs; a newer run reaches the ladder and analyses once its site follows its newest run again.</p>
          <ul>
            {choices
              .filter((choice) => choice.newerRunExists)
              .map((choice, i) => (
                <li key={choice.site.id}>
                  {chosenNotes[i]} <Link to={paths.ageModel(projectId, choice.site.id)}>age model of {choice.site.name}</Link>
                </li>
              ))}
          </ul>
        </Callout>
      )}
      {latest.data && (
        <AutomaticRefresh projectId={projectId} settings={latest.data.refreshSettings} canConfigure={canConfigure} />
      )}
      {plan && (
        <>
          <p>
            Latest refresh{plan.automatic ? ' (automatic)' : ''} <span className="num">{new Date(plan.createdAt).toLocaleString()}</span>{' '}
            <Tag minimal>{plan.status === 'ACTIVE' ? 'in progress' : 'finished'}</Tag>
            {plan.steps.length === 0 ? ' · nothing to re-run' : ` · ${progressLine(plan.progress)}`}
          </p>
          {plan.steps.length > 0 && (
            <ProgressBar
              className="sc-run-progress"
              intent={plan.progress.failed + plan.progress.blocked > 0 ? Intent.WARNING : Intent.PRIMARY}
              value={plan.progress.fraction}
              animate={plan.status === 'ACTIVE'}
              stripes={plan.status === 'ACTIVE'}
            />
          )}
          {plan.steps.length > 0 && (
            <HTMLTable compact striped className="sc-table">
              <thead>
                <tr>
                  <th>Step</th>
                  <th>Result</th>
                  <th>Status</th>
                  <th>Where it stands</th>
                  <th />
                </tr>
              </thead>
              <tbody>
                {plan.steps.map((step) => (
                  <tr key={step.id}>
                    <td>{STAGE_LABEL[step.stage] ?? step.stage}</td>
                    <td>{step.label}</td>
                    <td>
                      <Tag minimal intent={STATUS_INTENT[step.status]}>
                        {step.status.toLowerCase()}
                      </Tag>
                    </td>
                    <td>{stepNote(step)}</td>
                    <td>{freshLink(step)}</td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          )}
          {plan.skipped.length > 0 && (
            <>
              <h4>Skipped</h4>
              <ul className={Classes.TEXT_MUTED}>
                {plan.skipped.map((skip) => (
                  <li key={`${skip.kind}:${skip.id}`}>
                    {skip.label}: {skip.reason}
                  </li>
                ))}
              </ul>
            </>
          )}
        </>
      )}
    </section>
  );
}

type AutomaticRefreshProps = {
  projectId: string;
  settings: { automatic: boolean; debounceSeconds: number };
  canConfigure: boolean;
};

/** The project's automatic refresh after changes: a switch and the quiet time before it starts (ADMIN). */
function AutomaticRefresh({ projectId, settings, canConfigure }: AutomaticRefreshProps) {
  const save = useGraphqlMutation(SetRefreshSettingsDocument, { invalidates: [refreshQueries.all(projectId)] });
  const [debounce, setDebounce] = useState(settings.debounceSeconds);
  useEffect(() => setDebounce(settings.debounceSeconds), [settings.debounceSeconds]);
  if (!canConfigure) {
    return (
      <p className={Classes.TEXT_MUTED}>
        {settings.automatic
          ? `Refreshes by itself ${settings.debounceSeconds} s after the last change.`
          : 'Automatic refresh is off; an admin can turn it on.'}
      </p>
    );
  }
  const handleToggle = () => save.mutate({ input: { projectId, automatic: !settings.automatic, debounceSeconds: debounce } });
  const handleDebounce = (value: number) => setDebounce(value);
  const handleSaveDebounce = () => {
    if (debounce !== settings.debounceSeconds) save.mutate({ input: { projectId, automatic: settings.automatic, debounceSeconds: debounce } });
  };
  return (
    <div className="sc-refresh-settings">
      <Switch
        checked={settings.automatic}
        onChange={handleToggle}
        disabled={save.isPending}
        inline
        label="Refresh by itself after changes"
      />
      <label className="sc-refresh-settings">
        after
        <NumericInput
          value={debounce}
          min={10}
          max={3600}
          stepSize={10}
          onValueChange={handleDebounce}
          onBlur={handleSaveDebounce}
          disabled={save.isPending}
          fill={false}
          aria-label="Quiet time before the automatic refresh (s)"
        />
        s without a further change
      </label>
      {save.error && <span className={Classes.INTENT_DANGER}> {save.error.message}</span>}
    </div>
  );
}
