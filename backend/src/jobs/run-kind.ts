import type PgBoss from 'pg-boss';
import type { ComputeTask } from './compute-task';
import type { RunRow, RunTable, RunValues } from './runs.repository';

/** How pg-boss delivers a run's job: no pg-boss retries, the reaper re-queues runs whose worker vanished. */
export const RUN_SEND_OPTIONS: PgBoss.SendOptions = { retryLimit: 0, expireInSeconds: 3600 };

/** A kind of queued job: its pg-boss queue and how jobs are sent to it. */
interface QueueKind {
  /** The pg-boss queue name; unique among kinds. */
  readonly queue: string;
  readonly sendOptions: PgBoss.SendOptions;
}

/**
 * A queued job with no row of its own to watch (an attachment's thumbnail): the worker calls
 * `handle`, and pg-boss retries it as `sendOptions` say.
 */
export interface TaskKind<Payload extends object> extends QueueKind {
  readonly type: 'task';
  handle(payload: Payload): Promise<void>;
}

/** What a run's job carries. */
export interface RunJob {
  runId: string;
}

/**
 * A kind of run: a row (with the `runState` columns) that users watch while a worker computes it.
 * The shared `RunExecutor` claims the row, builds the computation's input, runs `compute` in a
 * worker thread with throttled progress and a cancel poll, and writes the result or the failure;
 * `JobReaper` re-queues a run whose worker went silent, up to `maxAttempts`.
 */
export interface RunKind<Table extends RunTable = RunTable, Input = unknown, Output = unknown> extends QueueKind {
  readonly type: 'run';
  /** What the run is called in logs ("age model run"). */
  readonly label: string;
  readonly table: Table;
  /** Most attempts a run gets when its worker dies under it. */
  readonly maxAttempts: number;
  /** The run's message when the reaper queues it again. */
  readonly requeueMessage: string;
  /** The computation, run in a worker thread. */
  readonly compute: ComputeTask<Input, Output>;
  /** The computation's input for a claimed run; may read other rows. Throwing fails the run. */
  input(run: RunRow<Table>): Promise<Input>;
  /** What a successful run stores beside status SUCCEEDED and progress 1 (results, message). */
  succeeded(output: Output, run: RunRow<Table>): RunValues<Table>;
  /** The message of a run whose input or computation threw `error`. */
  failureMessage(error: unknown): string;
  /**
   * Optional: called once the run has ended SUCCEEDED or FAILED (stored by its worker, or given
   * up by the reaper), for kinds whose rows are parts of a larger whole (a joint run's chains).
   * It must be safe to call again; an error is logged, not stored.
   */
  afterFinish?(runId: string, status: 'SUCCEEDED' | 'FAILED'): Promise<void>;
}

/** Any registered kind of job. */
export type JobKind = RunKind | TaskKind<object>;
