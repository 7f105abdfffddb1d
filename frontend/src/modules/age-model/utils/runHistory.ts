/**
 * Pure pieces of a site's run history: which run's results the page shows while another run works,
 * which run is the one in progress, and a one-line summary of a run's settings.
 */

/** What the history needs of a run. */
export type RunHistoryEntry = { id: string; status: string; createdAt: string };

/** Newest first (by when the run was queued; ties by id so the order is stable). */
export function newestFirst<T extends RunHistoryEntry>(runs: readonly T[]): T[] {
  return [...runs].sort((a, b) => (a.createdAt === b.createdAt ? b.id.localeCompare(a.id) : b.createdAt.localeCompare(a.createdAt)));
}

function isActive(status: string): boolean {
  return status === 'QUEUED' || status === 'RUNNING';
}

/**
 * Which run's results the page shows, and which run is in progress.
 *
 * - `activeId`: the run just started here when the list does not hold it yet, else the newest
 *   queued or running run of the list; null when nothing works.
 * - `shownId`: the run the user picked in the history when the list holds it; else the newest
 *   successful run (so its results stay on the page while a new run is queued or running); else
 *   the newest run that has ended (a failure or cancellation, to say why); else null.
 */
export function runsToShow(
  runs: readonly RunHistoryEntry[],
  selectedId: string | null,
  startedId: string | null,
): { shownId: string | null; activeId: string | null } {
  const ordered = newestFirst(runs);
  const known = new Set(ordered.map((run) => run.id));
  const activeId = startedId !== null && !known.has(startedId) ? startedId : (ordered.find((run) => isActive(run.status))?.id ?? null);
  if (selectedId !== null && known.has(selectedId)) return { shownId: selectedId, activeId };
  const shown = ordered.find((run) => run.status === 'SUCCEEDED') ?? ordered.find((run) => !isActive(run.status));
  return { shownId: shown?.id ?? null, activeId };
}

const DEPTH_MODEL_WORDS: Record<string, string> = { ORDER_ONLY: 'order only', HEMIPELAGIC_RATE: 'hemipelagic rate' };

/** A whole number with comma thousands separators, e.g. 20000 -> "20,000". */
function grouped(value: number): string {
  return Math.round(value).toLocaleString('en-GB');
}

/**
 * A run's settings in one line, e.g. "order only · seed 42 · 20,000 iterations × 4 chains".
 * Settings the run did not record are left out.
 */
export function runSettingsSummary(depthModel: string, seed: number, settings: unknown): string {
  const stored = (settings ?? {}) as { iterations?: unknown; chains?: unknown };
  const parts = [DEPTH_MODEL_WORDS[depthModel] ?? depthModel.toLowerCase(), `seed ${seed}`];
  if (typeof stored.iterations === 'number') {
    parts.push(`${grouped(stored.iterations)} iterations${typeof stored.chains === 'number' ? ` × ${stored.chains} chains` : ''}`);
  }
  return parts.join(' · ');
}

/** Which run of the site feeds the ladder, regional events and recurrence, and whether a researcher chose it. */
export type DownstreamState = {
  /** The run used downstream (Site.downstreamRun); null while the site has no successful run. */
  downstreamId: string | null;
  /** The chosen run (Site.downstreamRunChoice); null when the site follows its newest successful run. */
  chosenId: string | null;
};

/** What a history row says of a run's part downstream, and the one action it offers there. */
export type DownstreamRow = {
  /** The mark beside the run; null for a run nothing downstream reads. */
  mark: string | null;
  /** `choose`: use this run downstream; `followNewest`: follow the newest successful run again. */
  action: 'choose' | 'followNewest' | null;
};

/**
 * A run's part downstream in the history: the run used downstream is marked (as chosen, or as the
 * newest successful run); any other successful run can be chosen, and the chosen run can be given
 * up for the newest again, when the reader may run age models.
 */
export function downstreamRow(run: { id: string; status: string }, state: DownstreamState, mayChoose: boolean): DownstreamRow {
  const chosen = state.chosenId !== null && run.id === state.chosenId;
  if (run.id === state.downstreamId) {
    return { mark: chosen ? 'used downstream · chosen' : 'used downstream · newest', action: chosen && mayChoose ? 'followNewest' : null };
  }
  return { mark: null, action: mayChoose && run.status === 'SUCCEEDED' ? 'choose' : null };
}

/**
 * The sentence above an earlier run's results: does the ladder read this run, and if not which one.
 */
export function downstreamSentence(shownId: string, state: DownstreamState): string {
  if (shownId === state.downstreamId) {
    return state.chosenId === shownId
      ? 'The ladder, regional events and recurrence use this run: it was chosen in place of the newest.'
      : 'The ladder, regional events and recurrence use this run, the newest successful one.';
  }
  if (state.downstreamId === null) return 'Nothing downstream reads this site yet: it has no successful run.';
  return state.chosenId !== null
    ? 'The ladder, regional events and recurrence use another run, chosen for this site, not this one.'
    : 'The ladder, regional events and recurrence use the newest successful run, not this one.';
}
