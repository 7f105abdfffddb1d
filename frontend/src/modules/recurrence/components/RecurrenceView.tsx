import { Callout, H2, HTMLSelect, Intent, NonIdealState, Switch } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState, type ChangeEvent } from 'react';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { allows } from '@/modules/auth/utils/permissions';
import { analysisLabel, RecurrenceResults } from '@/modules/recurrence/components/RecurrenceResults';
import { RecurrenceSetupForm } from '@/modules/recurrence/components/RecurrenceSetupForm';
import { AnalysisEventTable } from '@/modules/recurrence/components/AnalysisEventTable';
import { ComparisonPanel } from '@/modules/recurrence/components/ComparisonPanel';
import type { CountingRuleInput } from '@/gql/graphql';
import { RefreshPanel } from '@/modules/recurrence/components/RefreshPanel';
import { CancelRecurrenceAnalysisDocument, StartRecurrenceAnalysisDocument } from '@/modules/recurrence/graphql/recurrence';
import { recurrenceQueries } from '@/modules/recurrence/hooks/recurrenceQueries';
import { isJobActive, sharedRecurrenceAxes, type SharedRecurrenceAxes } from '@/modules/recurrence/utils/recurrenceCharts';
import type { RecurrenceSettingsInput } from '@/modules/recurrence/utils/recurrenceForm';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import '@/modules/correlation/components/charts.css';

export type RecurrenceViewProps = { projectId: string };

/** A seed both analyses of a comparison share when none was typed. */
function randomSeed(): number {
  return Math.floor(Math.random() * 2_147_483_647);
}

type AnalysisPanelProps = { projectId: string; analysisId: string; canRun: boolean; sharedAxes?: SharedRecurrenceAxes };

function AnalysisPanel({ projectId, analysisId, canRun, sharedAxes }: AnalysisPanelProps) {
  const analysisQuery = useQuery(recurrenceQueries.analysis(projectId, analysisId));
  const cancel = useGraphqlMutation(CancelRecurrenceAnalysisDocument, { invalidates: [recurrenceQueries.all(projectId)] });
  if (analysisQuery.isPending) return <LoadingState label="Loading the analysis" />;
  if (analysisQuery.isError) {
    return (
      <Callout intent={Intent.DANGER} icon={IconNames.ERROR} title="The analysis could not be loaded">
        {analysisQuery.error.message}
      </Callout>
    );
  }
  const handleCancel = () => cancel.mutate({ id: analysisId });
  return (
    <div>
      <RecurrenceResults analysis={analysisQuery.data} canCancel={canRun} cancelling={cancel.isPending} onCancel={handleCancel} sharedAxes={sharedAxes} />
      {analysisQuery.data.status === 'SUCCEEDED' && <AnalysisEventTable projectId={projectId} analysisId={analysisId} status={analysisQuery.data.status} />}
    </div>
  );
}

/**
 * Recurrence for a segment and hypothesis or a single site: start an analysis, follow it, and
 * read its figures; or put two analyses side by side.
 */
export function RecurrenceView({ projectId }: RecurrenceViewProps) {
  // The picker lists each analysis with its status: while one is queued or running, the list is
  // asked again, so a finished analysis is not still called "queued".
  const setupQuery = useQuery({
    ...recurrenceQueries.setup(projectId),
    refetchInterval: (query) => (query.state.data?.recurrenceAnalyses.some((entry) => isJobActive(entry.status)) ? 3000 : false),
  });
  const start = useGraphqlMutation(StartRecurrenceAnalysisDocument, { invalidates: [recurrenceQueries.all(projectId)] });
  const [chosenId, setChosenId] = useState<string | null>(null);
  const [compareId, setCompareId] = useState<string | null>(null);
  const [comparing, setComparing] = useState(false);
  const analysesInOrder = [...(setupQuery.data?.recurrenceAnalyses ?? [])].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  const shownId = chosenId ?? analysesInOrder[0]?.id ?? null;
  const comparedId = comparing ? (compareId ?? analysesInOrder.find((entry) => entry.id !== shownId)?.id ?? null) : null;
  // Side by side, both analyses share their axes so equal heights mean equal values.
  const first = useQuery({ ...recurrenceQueries.analysis(projectId, shownId ?? ''), enabled: comparedId !== null && shownId !== null });
  const second = useQuery({ ...recurrenceQueries.analysis(projectId, comparedId ?? ''), enabled: comparedId !== null });
  const sharedAxes = useMemo(() => {
    if (!comparedId || first.data?.status !== 'SUCCEEDED' || second.data?.status !== 'SUCCEEDED') return undefined;
    return sharedRecurrenceAxes([first.data, second.data]);
  }, [comparedId, first.data, second.data]);

  if (setupQuery.isPending) return <LoadingState />;
  if (setupQuery.isError) return <NonIdealState icon={IconNames.ERROR} title="The project could not be loaded" description={setupQuery.error.message} />;
  const project = setupQuery.data;
  const canRun = allows(project, 'RECURRENCE_RUN');
  const analyses = [...project.recurrenceAnalyses].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  const analysisId = chosenId ?? analyses[0]?.id ?? null;
  const secondId = comparing ? (compareId ?? analyses.find((entry) => entry.id !== analysisId)?.id ?? null) : null;

  // With a second hypothesis, both analyses share every setting and the seed, then open side by side.
  const handleStart = (input: RecurrenceSettingsInput & { countingRule?: CountingRuleInput | null }, compareHypothesisId: string | null) => {
    const shared = compareHypothesisId && input.seed === null ? { ...input, seed: randomSeed() } : input;
    start.mutate(
      { input: shared },
      {
        onSuccess: ({ startRecurrenceAnalysis: first }) => {
          setChosenId(first.id);
          if (!compareHypothesisId) return;
          start.mutate(
            { input: { ...shared, hypothesisId: compareHypothesisId } },
            {
              onSuccess: ({ startRecurrenceAnalysis: second }) => {
                setCompareId(second.id);
                setComparing(true);
              },
            },
          );
        },
      },
    );
  };
  const handleChoose = (event: ChangeEvent<HTMLSelectElement>) => setChosenId(event.target.value);
  const handleCompare = (event: ChangeEvent<HTMLSelectElement>) => setCompareId(event.target.value);
  const handleComparing = () => setComparing((previous) => !previous);
  const optionLabel = (entry: (typeof analyses)[number]) =>
    `${new Date(entry.createdAt).toLocaleString()} · ${analysisLabel(entry)} · from ${entry.forecastStartYear} · ${entry.status.toLowerCase()}`;

  return (
    <div className="sc-recurrence">
      <header className="sc-page-header">
        <H2 className="sc-page-title">Recurrence · {project.name}</H2>
      </header>
      {allows(project, 'RESULTS_REFRESH') && (
        <RefreshPanel projectId={projectId} canConfigure={allows(project, 'PROJECT_SETTINGS')} onShowAnalysis={setChosenId} />
      )}
      {canRun && (
        <section className="sc-panel">
          <h3>New analysis</h3>
          <RecurrenceSetupForm project={project} starting={start.isPending} error={formErrorOf(start.error, [])} onStart={handleStart} />
        </section>
      )}
      {analyses.length === 0 || analysisId === null ? (
        <NonIdealState
          icon={IconNames.TIMELINE_LINE_CHART}
          title="No recurrence analysis yet"
          description={canRun ? 'Start one above.' : 'A hazard analyst or admin can start an analysis.'}
        />
      ) : (
        <>
          <div className="sc-ladder-toolbar">
            <HTMLSelect value={analysisId} onChange={handleChoose} aria-label="Analysis">
              {analyses.map((entry) => (
                <option key={entry.id} value={entry.id}>
                  {optionLabel(entry)}
                </option>
              ))}
            </HTMLSelect>
            <Switch checked={comparing} onChange={handleComparing} label="Compare with" disabled={analyses.length < 2} inline />
            {comparing && (
              <HTMLSelect value={secondId ?? ''} onChange={handleCompare} aria-label="Second analysis">
                {analyses.map((entry) => (
                  <option key={entry.id} value={entry.id}>
                    {optionLabel(entry)}
                  </option>
                ))}
              </HTMLSelect>
            )}
          </div>
          {secondId && sharedAxes && <ComparisonPanel projectId={projectId} analysisAId={analysisId} analysisBId={secondId} />}
          <div className={secondId ? 'sc-recurrence-compare' : undefined}>
            <AnalysisPanel projectId={projectId} analysisId={analysisId} canRun={canRun} sharedAxes={sharedAxes} />
            {secondId && <AnalysisPanel projectId={projectId} analysisId={secondId} canRun={canRun} sharedAxes={sharedAxes} />}
          </div>
        </>
      )}
    </div>
  );
}
