import { Button, Classes, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { AgeModelSiteQuery, JobStatus } from '@/gql/graphql';
import { runSettingsSummary } from '@/modules/age-model/utils/runHistory';

type HistoryRun = NonNullable<AgeModelSiteQuery['site']>['ageModelRuns'][number];

const STATUS_INTENT: Record<JobStatus, Intent> = {
  QUEUED: Intent.NONE,
  RUNNING: Intent.PRIMARY,
  SUCCEEDED: Intent.SUCCESS,
  FAILED: Intent.DANGER,
  CANCELLED: Intent.WARNING,
};

export type RunHistoryProps = {
  /** Newest first. */
  runs: readonly HistoryRun[];
  /** The run whose results the page shows. */
  shownId: string | null;
  /** The run the ladder, regional events and recurrence read for this site. */
  downstreamId: string | null;
  onShow: (runId: string) => void;
};

/** A site's past runs: when, how they ended, with which settings, whether they converged and are still up to date. */
export function RunHistory({ runs, shownId, downstreamId, onShow }: RunHistoryProps) {
  return (
    <section className="sc-panel sc-run-history">
      <h3>Run history</h3>
      <HTMLTable compact striped className="sc-table" aria-label="Run history">
        <thead>
          <tr>
            <th>Queued</th>
            <th>Status</th>
            <th>Settings</th>
            <th>Convergence</th>
            <th>Column since</th>
            <th>Used for</th>
            <th aria-label="Show" />
          </tr>
        </thead>
        <tbody>
          {runs.map((run) => {
            const shown = run.id === shownId;
            return (
              <tr key={run.id} aria-current={shown ? 'true' : undefined}>
                <td className="num">{new Date(run.createdAt).toLocaleString()}</td>
                <td>
                  <Tag intent={STATUS_INTENT[run.status]} minimal>
                    {run.status.toLowerCase()}
                  </Tag>
                </td>
                <td>{runSettingsSummary(run.depthModel, run.seed, run.settings)}</td>
                <td>
                  {run.diagnostics ? (
                    <span title={`max split R-hat ${run.diagnostics.maxRhat.toFixed(3)} · min effective sample size ${Math.round(run.diagnostics.minEss)}`}>
                      {run.diagnostics.converged ? 'converged' : 'not converged'} (R-hat <span className="num">{run.diagnostics.maxRhat.toFixed(2)}</span>)
                    </span>
                  ) : (
                    '–'
                  )}
                </td>
                <td>
                  {run.stale ? (
                    <Tag intent={Intent.WARNING} minimal icon={IconNames.OUTDATED}>
                      changed
                    </Tag>
                  ) : (
                    'unchanged'
                  )}
                </td>
                <td>{run.id === downstreamId ? <Tag minimal intent={Intent.PRIMARY}>ladder, regional events, recurrence</Tag> : ''}</td>
                <td>
                  {shown ? (
                    <span className={Classes.TEXT_MUTED}>shown</span>
                  ) : (
                    <Button size="small" variant="minimal" text="Show" onClick={() => onShow(run.id)} disabled={run.status === 'QUEUED' || run.status === 'RUNNING'} />
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </section>
  );
}
