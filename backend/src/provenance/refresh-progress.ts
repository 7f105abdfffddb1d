/** What the progress of a refresh plan is counted from: its steps' statuses and dependencies. */
export interface ProgressStep {
  readonly id: string;
  readonly label: string;
  readonly status: string;
  readonly dependsOn: readonly string[];
}

export interface RefreshProgress {
  total: number;
  waiting: number;
  running: number;
  succeeded: number;
  failed: number;
  blocked: number;
  skipped: number;
  fraction: number;
}

/** The labels of the steps `step` still waits for: those it needs that have not succeeded (none once it has left WAITING). */
export function waitingFor(step: ProgressStep, steps: readonly ProgressStep[]): string[] {
  if (step.status !== 'WAITING') return [];
  const byId = new Map(steps.map((s) => [s.id, s]));
  return step.dependsOn.flatMap((id) => {
    const needed = byId.get(id);
    return needed && needed.status !== 'SUCCEEDED' ? [needed.label] : [];
  });
}

/** A plan's steps counted by status; `fraction` is the share that ended (1 for an empty plan). */
export function refreshProgress(steps: readonly ProgressStep[], skipped: number): RefreshProgress {
  const count = (...statuses: string[]) => steps.filter((s) => statuses.includes(s.status)).length;
  const progress = {
    total: steps.length,
    waiting: count('WAITING'),
    running: count('STARTING', 'QUEUED'),
    succeeded: count('SUCCEEDED'),
    failed: count('FAILED'),
    blocked: count('BLOCKED'),
    skipped,
  };
  const ended = progress.succeeded + progress.failed + progress.blocked;
  return { ...progress, fraction: steps.length === 0 ? 1 : ended / steps.length };
}
