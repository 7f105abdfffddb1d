import { Button, Classes, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { AgeModelSiteQuery, JobStatus } from '@/gql/graphql';
import { downstreamRow, type DownstreamState, runSettingsSummary } from '@/modules/age-model/utils/runHistory';

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
  /** The run the ladder, regional events and recurrence read for this site, and whether it was chosen. */
  downstream: DownstreamState;
  onShow: (runId: string) => void;
  /** Whether the reader may choose the run used downstream (who may run age models). */
  mayChoose: boolean;
  /** Use this run downstream, or (null) the newest successful run again. */
  onChoose: (runId: string | null) => void;
  /** True while a choice is being saved. */
  choosing: boolean;
};

/**
 * A site's past runs: when, how they ended, with which settings, whether they converged and are
 * still up to date, and which one the ladder, regional events and recurrence read (the newest
 * successful run unless another was chosen; a researcher may choose any successful run).
 */
export function RunHistory({ runs, shownId, downstream, onShow, mayChoose, onChoose, choosing }: RunHistoryProps) {
  return (
    <section className="sc-panel sc-run-history">
      <h3>Run history</h3>
      <p className={Classes.TEXT_MUTED}>
        {downstream.chosenId !== null
          ? 'A chosen run feeds the ladder, regional events and recurrence for this site; newer runs do not replace it until the site follows its newest run again.'
          : 'The newest successful run feeds the ladder, regional events and recurrence for this site.'}
      </p>
      <HTMLTable compact striped className="sc-table" aria-label="Run history">
        <thead>
          <tr>
            <th>Queued</th>
            <th>Status</th>
            <th>Settings</th>
            <th>Convergence</th>
            <th>Column since</th>
            <th title="Which run the ladder, regional events and recurrence read for this site">Downstream</th>
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
                <td>
                  <DownstreamCell run={run} downstream={downstream} mayChoose={mayChoose} onChoose={onChoose} choosing={choosing} />
                </td>
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

type DownstreamCellProps = Pick<RunHistoryProps, 'downstream' | 'mayChoose' | 'onChoose' | 'choosing'> & { run: HistoryRun };

/** The run's part downstream: a mark on the run in use, and "use this run" or "back to the newest". */
function DownstreamCell({ run, downstream, mayChoose, onChoose, choosing }: DownstreamCellProps) {
  const { mark, action } = downstreamRow(run, downstream, mayChoose);
  return (
    <span className="sc-downstream-cell">
      {mark && (
        <Tag minimal intent={Intent.PRIMARY} icon={downstream.chosenId === run.id ? IconNames.PIN : IconNames.TIMELINE_EVENTS} title="The ladder, regional events and recurrence read this run">
          {mark}
        </Tag>
      )}
      {action === 'choose' && (
        <Button size="small" variant="minimal" icon={IconNames.PIN} text="Use this run downstream" disabled={choosing} onClick={() => onChoose(run.id)} />
      )}
      {action === 'followNewest' && (
        <Button size="small" variant="minimal" icon={IconNames.UNPIN} text="Follow the newest run" disabled={choosing} onClick={() => onChoose(null)} />
      )}
    </span>
  );
}
