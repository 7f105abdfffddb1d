import { Button, Callout, HTMLTable, Intent, ProgressBar, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState, type FormEvent } from 'react';
import type { JobStatus } from '@/gql/graphql';
import { AgeRangesValue, AgeValue } from '@/modules/ages/components/AgeValues';
import { RunDiagnostics } from '@/modules/age-model/components/RunDiagnostics';
import { isRunActive, progressPercent } from '@/modules/age-model/utils/ageModelView';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { CancelJointAgeModelRunDocument, StartJointAgeModelRunDocument } from '@/modules/correlation/graphql/jointRun';
import { jointRunQueries } from '@/modules/correlation/hooks/jointRunQueries';
import { ladderQueries } from '@/modules/correlation/hooks/ladderQueries';
import { DEFAULT_JOINT_RUN_FORM, readJointRunForm, type JointRunField, type JointRunForm } from '@/modules/correlation/utils/jointRun';
import { NumberField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';
import '@/modules/correlation/components/joint-run.css';

const STATUS_INTENT: Record<JobStatus, Intent> = {
  QUEUED: Intent.NONE,
  RUNNING: Intent.PRIMARY,
  SUCCEEDED: Intent.SUCCESS,
  FAILED: Intent.DANGER,
  CANCELLED: Intent.WARNING,
};

export type JointRunPanelProps = {
  projectId: string;
  hypothesis: { id: string; name: string; orderConflicts: readonly unknown[]; latestJointRun?: { id: string; status: JobStatus } | null };
  /** CORRELATOR or ADMIN: may start and cancel. */
  canRun: boolean;
  /** "E3 at Core A" by event id. */
  eventLabels: ReadonlyMap<string, string>;
};

/**
 * The hypothesis' joint age model run: start one (chains, iterations, seed), watch its chains,
 * cancel it, read its diagnostics and regional ages, and see when it is out of date.
 */
export function JointRunPanel({ projectId, hypothesis, canRun, eventLabels }: JointRunPanelProps) {
  const queryClient = useQueryClient();
  const [values, setValues] = useState<JointRunForm>(DEFAULT_JOINT_RUN_FORM);
  const [errors, setErrors] = useState<FieldErrors<JointRunField>>({});
  const runId = hypothesis.latestJointRun?.id ?? null;
  const runQuery = useQuery({ ...jointRunQueries.run(projectId, runId ?? ''), enabled: runId !== null });
  const invalidates = [ladderQueries.hypotheses(projectId), jointRunQueries.all(projectId)];
  const start = useGraphqlMutation(StartJointAgeModelRunDocument, { invalidates });
  const cancel = useGraphqlMutation(CancelJointAgeModelRunDocument, { invalidates });
  const run = runQuery.data ?? null;
  const active = run !== null && isRunActive(run.status);

  // When a run ends, the hypothesis' regional events gain (or lose) their joint ages.
  const endedStatus = run && !active ? run.status : null;
  useEffect(() => {
    if (endedStatus) void queryClient.invalidateQueries({ queryKey: ladderQueries.hypotheses(projectId) });
  }, [endedStatus, projectId, queryClient]);

  const change = (field: JointRunField) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const handleStart = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readJointRunForm(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    start.mutate({ input: { hypothesisId: hypothesis.id, ...result.input } });
  };
  const handleCancel = () => {
    if (run) cancel.mutate({ id: run.id });
  };
  const loops = hypothesis.orderConflicts.length;

  return (
    <div className="sc-side-list sc-joint-run">
      <p className="sc-chart-legend">
        One chronology for every site this hypothesis ties: each regional event is one age shared by its members&apos; columns, and every site keeps
        its own column model. Its chains run as separate jobs.
      </p>
      {run ? (
        <div className="sc-run-status">
          <div className="sc-run-status-line">
            <Tag intent={STATUS_INTENT[run.status]} minimal>
              {run.status.toLowerCase()}
            </Tag>
            <span>
              seed <span className="num">{run.seed}</span> · hypothesis version <span className="num">{run.hypothesisVersion}</span>
            </span>
            {run.stale && (
              <Tag intent={Intent.WARNING} icon={IconNames.OUTDATED} minimal>
                out of date
              </Tag>
            )}
          </div>
          {active && (
            <div className="sc-run-status-line">
              <ProgressBar className="sc-run-progress" intent={Intent.PRIMARY} value={run.status === 'QUEUED' ? undefined : run.progress} />
              <span className="num">{progressPercent(run.progress)} %</span>
              {canRun && <Button size="small" icon={IconNames.STOP} text="Cancel" onClick={handleCancel} loading={cancel.isPending} />}
            </div>
          )}
          <HTMLTable compact className="sc-joint-chains">
            <thead>
              <tr>
                <th>Chain</th>
                <th>Status</th>
                <th>Progress</th>
              </tr>
            </thead>
            <tbody>
              {run.chains.map((chain) => (
                <tr key={chain.index}>
                  <td className="num">{chain.index + 1}</td>
                  <td>{chain.status.toLowerCase()}</td>
                  <td className="num">{chain.status === 'SUCCEEDED' ? 100 : progressPercent(chain.progress)} %</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
          {run.status === 'FAILED' && (
            <Callout intent={Intent.DANGER} icon={IconNames.ERROR} title="The joint run failed">
              {run.message ?? 'No reason was given.'}
            </Callout>
          )}
          {run.stale && (
            <Callout intent={Intent.WARNING} icon={IconNames.OUTDATED} title="Out of date: regional events show their independent ages">
              <ul>
                {run.staleReasons.map((reason) => (
                  <li key={reason.message}>{reason.message}</li>
                ))}
              </ul>
            </Callout>
          )}
          {run.diagnostics && <RunDiagnostics {...run.diagnostics} />}
          {run.regionalEvents.length > 0 && (
            <HTMLTable compact className="sc-joint-regional">
              <thead>
                <tr>
                  <th>Regional event</th>
                  <th>Median</th>
                  <th>95.4 %</th>
                  <th title="split R-hat and effective sample size">R-hat · ESS</th>
                </tr>
              </thead>
              <tbody>
                {[...run.regionalEvents]
                  .sort((a, b) => a.medianCalBp - b.medianCalBp)
                  .map((regional) => (
                    <tr key={regional.id}>
                      <td>{regional.members.map((member) => eventLabels.get(member.id) ?? member.name).join(' · ')}</td>
                      <td>
                        <AgeValue calBp={regional.medianCalBp} />
                      </td>
                      <td>
                        <AgeRangesValue ranges={regional.hpd95} />
                      </td>
                      <td className="num">
                        {regional.rhat.toFixed(3)} · {Math.round(regional.ess)}
                      </td>
                    </tr>
                  ))}
              </tbody>
            </HTMLTable>
          )}
        </div>
      ) : (
        <p>No joint run of this hypothesis yet.</p>
      )}
      {canRun && (
        <form className="sc-run-settings" onSubmit={handleStart} noValidate>
          {loops > 0 && (
            <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN} className="sc-form-callout">
              The hypothesis has {loops} order loop(s): no one chronology can hold all its ties. Change a tie on each loop before a joint run.
            </Callout>
          )}
          {(start.error ?? cancel.error) && (
            <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
              {(start.error ?? cancel.error)?.message}
            </Callout>
          )}
          <div className="sc-run-settings-fields">
            <NumberField name="jointChains" label="Chains" helperText="2 to 16, each a job of its own" value={values.chains} onValueChange={change('chains')} error={errors.chains} />
            <NumberField
              name="jointIterations"
              label="Iterations per chain"
              helperText="500 to 200,000 after burn-in"
              value={values.iterations}
              onValueChange={change('iterations')}
              error={errors.iterations}
            />
            <NumberField name="jointSeed" label="Seed" labelInfo="(blank: random)" value={values.seed} onValueChange={change('seed')} error={errors.seed} />
          </div>
          <Button type="submit" intent={Intent.PRIMARY} icon={IconNames.PLAY} text="Start joint run" loading={start.isPending} disabled={active || loops > 0} />
        </form>
      )}
    </div>
  );
}
