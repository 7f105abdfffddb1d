import { Button, Callout, Intent, ProgressBar, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { JobStatus } from '@/gql/graphql';
import { isRunActive, progressPercent } from '@/modules/age-model/utils/ageModelView';

const STATUS_INTENT: Record<JobStatus, Intent> = {
  QUEUED: Intent.NONE,
  RUNNING: Intent.PRIMARY,
  SUCCEEDED: Intent.SUCCESS,
  FAILED: Intent.DANGER,
  CANCELLED: Intent.WARNING,
};

export type RunStatusPanelProps = {
  status: JobStatus;
  progress: number;
  message: string | null | undefined;
  seed: number;
  stale: boolean;
  /** What changed since the run was queued, in words (from the server). */
  staleReasons?: readonly string[];
  canCancel: boolean;
  cancelling: boolean;
  onCancel: () => void;
};

/** A run's state: progress while it works, the failure message, and a warning when out of date. */
export function RunStatusPanel({ status, progress, message, seed, stale, staleReasons = [], canCancel, cancelling, onCancel }: RunStatusPanelProps) {
  const active = isRunActive(status);
  return (
    <div className="sc-run-status">
      <div className="sc-run-status-line">
        <Tag intent={STATUS_INTENT[status]} minimal>
          {status.toLowerCase()}
        </Tag>
        <span>
          seed <span className="num">{seed}</span>
        </span>
        {active && (
          <>
            <ProgressBar className="sc-run-progress" intent={Intent.PRIMARY} value={status === 'QUEUED' ? undefined : progress} />
            <span className="num">{progressPercent(progress)} %</span>
            {canCancel && <Button size="small" icon={IconNames.STOP} text="Cancel" onClick={onCancel} loading={cancelling} />}
          </>
        )}
      </div>
      {status === 'FAILED' && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} title="The run failed">
          {message ?? 'No reason was given.'}
        </Callout>
      )}
      {stale && (
        <Callout intent={Intent.WARNING} icon={IconNames.OUTDATED} title="Out of date">
          The column or its samples changed after this run was started. Start a new run to bring the ages up to date.
          {staleReasons.length > 0 && (
            <ul>
              {staleReasons.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
            </ul>
          )}
        </Callout>
      )}
    </div>
  );
}
