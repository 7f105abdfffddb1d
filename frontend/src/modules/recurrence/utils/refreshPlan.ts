/** A refresh step as the panel reads it. */
export type RefreshStepView = {
  status: string;
  message?: string | null;
  waitingFor: readonly string[];
};

/** What a step's row says about where it stands, in our own words. */
export function stepNote(step: RefreshStepView): string {
  switch (step.status) {
    case 'WAITING':
      return step.waitingFor.length > 0 ? `waits for ${listed(step.waitingFor)}` : 'about to start';
    case 'STARTING':
      return 'being queued';
    case 'QUEUED':
      return 'queued now; computing';
    case 'SUCCEEDED':
      return 'done';
    case 'FAILED':
      return step.message ?? 'failed';
    case 'BLOCKED':
      return step.message ?? 'not started: something it needs failed';
    default:
      return step.message ?? '';
  }
}

/** The plan's progress in one line: "3 of 5 steps ended · 1 failed · 2 skipped". */
export function progressLine(progress: { total: number; succeeded: number; failed: number; blocked: number; running: number; waiting: number; skipped: number }): string {
  const ended = progress.succeeded + progress.failed + progress.blocked;
  const parts = [`${ended} of ${progress.total} ${progress.total === 1 ? 'step' : 'steps'} ended`];
  if (progress.running > 0) parts.push(`${progress.running} computing`);
  if (progress.waiting > 0) parts.push(`${progress.waiting} waiting`);
  if (progress.failed > 0) parts.push(`${progress.failed} failed`);
  if (progress.blocked > 0) parts.push(`${progress.blocked} not started`);
  if (progress.skipped > 0) parts.push(`${progress.skipped} skipped`);
  return parts.join(' · ');
}

function listed(labels: readonly string[]): string {
  if (labels.length <= 1) return labels.join('');
  return `${labels.slice(0, -1).join(', ')} and ${labels[labels.length - 1]}`;
}

/** A site's chosen run used downstream, as the refresh panel reads it. */
export type ChosenRunView = {
  site: { id: string; name: string };
  run: { id: string; createdAt: string };
  newestRun: { id: string; createdAt: string };
  newerRunExists: boolean;
};

/**
 * One line per site whose chosen run is not its newest successful run: a refresh re-runs and
 * follows the chosen run, so a newer run stays out of the ladder and analyses until the choice is
 * given up on the site's age model page. `when` formats a time.
 */
export function chosenRunNotes(choices: readonly ChosenRunView[], when: (iso: string) => string): string[] {
  return choices
    .filter((choice) => choice.newerRunExists)
    .map(
      (choice) =>
        `${choice.site.name}: the run queued ${when(choice.run.createdAt)} was chosen to feed the ladder and analyses, not its newest successful run (queued ${when(choice.newestRun.createdAt)}).`,
    );
}
