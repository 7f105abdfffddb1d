/**
 * When a derived result went stale, and why: pure functions over a provenance graph. A result is
 * stale when any of its inputs changed after it was computed, through any number of steps: a site
 * column or hypothesis moved past the revision it read, a result it used (an age model run, a
 * joint run) is itself stale or gone, or an age model run it used is no longer the run its site
 * uses downstream (a researcher chose another, or a newer run succeeded). No framework imports,
 * no I/O.
 */

/** Kinds of derived results. New kinds (joint runs) need no change here. */
export type ResultKind = 'ageModelRun' | 'jointRun' | 'recurrenceAnalysis';

/** Kinds of inputs: raw data with a revision, or another result. */
export type InputKind = 'site' | 'hypothesis' | 'ageModelRun' | 'jointRun';

/** One input a result was computed from, as recorded when it was queued. */
export interface ResultInput {
  readonly kind: InputKind;
  readonly id: string;
  /** The site's column revision or the hypothesis' version that was read; null for a result. */
  readonly revision: number | null;
  /** Its name when it was used. */
  readonly name: string;
}

/** What the staleness check reads: the recorded inputs and today's revisions. */
export interface ProvenanceGraph {
  /** The recorded inputs of a result; undefined when the result no longer exists. */
  inputsOf(kind: ResultKind, id: string): readonly ResultInput[] | undefined;
  /** A site's current column revision and name; undefined when the site was deleted. */
  site(id: string): { revision: number; name: string } | undefined;
  /** A hypothesis' current version and name; undefined when it was deleted. */
  hypothesis(id: string): { version: number; name: string } | undefined;
  /**
   * The age model run a site uses downstream today, and whether a researcher chose it (else it is
   * the newest successful run); undefined when the site has none or it was not read.
   */
  downstreamRun?(siteId: string): { id: string; chosen: boolean } | undefined;
}

/** One changed input, as people read it. */
export interface StaleReason {
  readonly inputKind: InputKind;
  readonly inputId: string;
  readonly inputName: string;
  readonly message: string;
  /** The results the change reached this one through, nearest first (empty for a direct input). */
  readonly via: readonly string[];
}

/** Results are results of their inputs only: a chain deeper than this is a recording error. */
const MAX_DEPTH = 8;

export function resultKey(kind: ResultKind | InputKind, id: string): string {
  return `${kind}:${id}`;
}

/** True for input kinds that are themselves derived results. */
export function isResultInput(kind: InputKind): kind is 'ageModelRun' | 'jointRun' {
  return kind === 'ageModelRun' || kind === 'jointRun';
}

const RESULT_LABEL: Record<'ageModelRun' | 'jointRun', string> = { ageModelRun: 'age model run', jointRun: 'joint age model run' };

/**
 * Every changed input of a result, direct or through the results it used; empty when it is up to
 * date. `memo` may be shared across calls over one graph so a run used by many analyses is
 * checked once.
 */
export function staleReasons(
  kind: ResultKind,
  id: string,
  graph: ProvenanceGraph,
  memo: Map<string, readonly StaleReason[]> = new Map(),
  depth = 0,
): readonly StaleReason[] {
  const key = resultKey(kind, id);
  const known = memo.get(key);
  if (known) return known;
  if (depth > MAX_DEPTH) throw new Error(`provenance deeper than ${MAX_DEPTH} steps at ${key}`);
  const inputs = graph.inputsOf(kind, id) ?? [];
  const reasons: StaleReason[] = [];
  for (const input of inputs) {
    if (input.kind === 'site') {
      const site = graph.site(input.id);
      if (!site) reasons.push(direct(input, `site ${input.name} was deleted`));
      else if (site.revision !== input.revision) reasons.push(direct(input, `the column of site ${site.name} changed (units, event horizons or samples)`));
    } else if (input.kind === 'hypothesis') {
      const hypothesis = graph.hypothesis(input.id);
      if (!hypothesis) reasons.push(direct(input, `hypothesis ${input.name} was deleted`));
      else if (hypothesis.version !== input.revision) {
        reasons.push(direct(input, `hypothesis ${hypothesis.name} changed: now version ${hypothesis.version}, this used version ${input.revision}`));
      }
    } else {
      const label = `${RESULT_LABEL[input.kind]} of ${input.name}`;
      if (graph.inputsOf(input.kind, input.id) === undefined) {
        reasons.push(direct(input, `the ${label} it used was deleted`));
        continue;
      }
      for (const upstream of staleReasons(input.kind, input.id, graph, memo, depth + 1)) {
        reasons.push({ ...upstream, via: [label, ...upstream.via] });
      }
      if (input.kind === 'ageModelRun') {
        const siteId = graph.inputsOf('ageModelRun', input.id)?.find((i) => i.kind === 'site')?.id;
        const current = siteId === undefined ? undefined : graph.downstreamRun?.(siteId);
        if (current && current.id !== input.id) {
          reasons.push(
            direct(
              input,
              current.chosen
                ? `site ${input.name} now uses another age model run downstream, chosen by a researcher, not the run this used`
                : `site ${input.name} now uses its newest successful age model run downstream, not the run this used`,
            ),
          );
        }
      }
    }
  }
  memo.set(key, reasons);
  return reasons;
}

function direct(input: ResultInput, message: string): StaleReason {
  return { inputKind: input.kind, inputId: input.id, inputName: input.name, message, via: [] };
}
