import { Injectable } from '@nestjs/common';
import DataLoader from 'dataloader';
import { Executor } from '../database/database.service';
import { ProvenanceRepository } from './provenance.repository';
import {
  isResultInput,
  type InputKind,
  type ProvenanceGraph,
  type ResultInput,
  resultKey,
  type ResultKind,
  type StaleReason,
  staleReasons,
} from './staleness';

/** An input as a result's producer names it; the name is looked up, a site's or hypothesis' revision too when left out. */
export interface InputReference {
  readonly kind: InputKind;
  readonly id: string;
  /** The site column revision or hypothesis version that was read (read now when omitted). */
  readonly revision?: number;
}

/** A derived result, named by kind and id. */
export interface ResultReference {
  readonly kind: ResultKind;
  readonly id: string;
}

/** Steps a graph is followed upstream: analysis -> joint run -> age model run -> site. */
const MAX_HOPS = 6;

/**
 * Provenance of derived results: what each was computed from, and whether any of that changed
 * since, through any number of steps.
 *
 * A producer of results records their inputs in the transaction that inserts the result:
 *
 * ```ts
 * // a joint age model run: its hypothesis version and every site column it modelled
 * await provenance.record(tx, projectId, { kind: 'jointRun', id: run.id }, [
 *   { kind: 'hypothesis', id: hypothesis.id, revision: hypothesis.version },
 *   ...sites.map((site) => ({ kind: 'site', id: site.id, revision: site.columnRevision })),
 * ]);
 * // a recurrence analysis on that joint run
 * await provenance.record(tx, projectId, { kind: 'recurrenceAnalysis', id }, [{ kind: 'jointRun', id: run.id }]);
 * ```
 *
 * and answers `stale` with `isStale({ kind, id })` (or `loader()` per request). Age model runs
 * need no record: their site and column revision are in their own row.
 */
@Injectable()
export class ProvenanceService {
  constructor(private readonly repository: ProvenanceRepository) {}

  /** Record what a result was computed from; call inside the transaction that inserts it. */
  async record(executor: Executor, projectId: string, result: ResultReference, inputs: readonly InputReference[]): Promise<void> {
    const ids = (kind: InputKind) => [...new Set(inputs.filter((i) => i.kind === kind).map((i) => i.id))];
    const [siteRows, hypothesisRows, runRows] = await Promise.all([
      this.repository.sitesByIds(ids('site'), executor),
      this.repository.hypothesesByIds(ids('hypothesis'), executor),
      this.repository.runInputs(ids('ageModelRun'), executor),
    ]);
    const sites = new Map(siteRows.map((s) => [s.id, s]));
    const hypotheses = new Map(hypothesisRows.map((h) => [h.id, h]));
    const runs = new Map(runRows.map((r) => [r.id, r]));
    const named = (input: InputReference): { revision: number | null; name: string } => {
      switch (input.kind) {
        case 'site':
          return { revision: input.revision ?? sites.get(input.id)?.columnRevision ?? 0, name: sites.get(input.id)?.name ?? 'a deleted site' };
        case 'hypothesis':
          return { revision: input.revision ?? hypotheses.get(input.id)?.version ?? 0, name: hypotheses.get(input.id)?.name ?? 'a deleted hypothesis' };
        case 'ageModelRun':
          return { revision: null, name: runs.get(input.id)?.siteName ?? 'a deleted site' };
        case 'jointRun':
          return { revision: null, name: 'joint run' };
      }
    };
    await this.repository.insertInputs(
      inputs.map((input) => ({ projectId, resultKind: result.kind, resultId: result.id, inputKind: input.kind, inputId: input.id, inputRevision: named(input).revision, inputName: named(input).name })),
      executor,
    );
  }

  /** The recorded inputs of one result (for showing and for re-running it). */
  async inputsOf(result: ResultReference): Promise<ResultInput[]> {
    const graph = await this.loadGraph([result]);
    return [...(graph.inputsOf(result.kind, result.id) ?? [])];
  }

  /** Why each result is stale (empty when it is up to date), by `resultKey`. One graph read for all of them. */
  async staleness(results: readonly ResultReference[]): Promise<Map<string, readonly StaleReason[]>> {
    const graph = await this.loadGraph(results);
    const memo = new Map<string, readonly StaleReason[]>();
    return new Map(results.map((r) => [resultKey(r.kind, r.id), staleReasons(r.kind, r.id, graph, memo)]));
  }

  async isStale(result: ResultReference): Promise<boolean> {
    return ((await this.staleness([result])).get(resultKey(result.kind, result.id)) ?? []).length > 0;
  }

  /** The sites of age model runs. */
  async runSites(runIds: readonly string[]): Promise<string[]> {
    return [...new Set((await this.repository.runInputs(runIds)).map((r) => r.siteId))];
  }

  /** A project's name (for the names beside ids in exports). */
  async projectName(projectId: string): Promise<string | null> {
    return (await this.repository.projectOf(projectId))?.name ?? null;
  }

  segmentName(segmentId: string): Promise<string | null> {
    return this.repository.segmentName(segmentId);
  }

  /** A per-request batch loader of stale reasons, keyed by `resultKey(kind, id)`. */
  loader(): DataLoader<ResultReference, readonly StaleReason[], string> {
    return new DataLoader(
      async (refs) => {
        const reasons = await this.staleness(refs);
        return refs.map((r) => reasons.get(resultKey(r.kind, r.id)) ?? []);
      },
      { cacheKeyFn: (r) => resultKey(r.kind, r.id) },
    );
  }

  /**
   * The recorded inputs of the results and of everything upstream of them, with today's site
   * revisions and hypothesis versions. One query per kind per step upstream.
   */
  private async loadGraph(results: readonly ResultReference[]): Promise<ProvenanceGraph> {
    const recorded = new Map<string, ResultInput[]>();
    let frontier: ResultReference[] = [...results];
    for (let hop = 0; hop < MAX_HOPS && frontier.length > 0; hop++) {
      const next: ResultReference[] = [];
      const byKind = new Map<ResultKind, string[]>();
      for (const ref of frontier) {
        if (recorded.has(resultKey(ref.kind, ref.id))) continue;
        byKind.set(ref.kind, [...(byKind.get(ref.kind) ?? []), ref.id]);
      }
      for (const [kind, ids] of byKind) {
        if (kind === 'ageModelRun') {
          for (const run of await this.repository.runInputs(ids)) {
            recorded.set(resultKey(kind, run.id), [{ kind: 'site', id: run.siteId, revision: run.columnRevision, name: run.siteName }]);
          }
          continue;
        }
        for (const row of await this.repository.inputsOf(kind, ids)) {
          const key = resultKey(kind, row.resultId);
          const input: ResultInput = { kind: row.inputKind as InputKind, id: row.inputId, revision: row.inputRevision, name: row.inputName };
          recorded.set(key, [...(recorded.get(key) ?? []), input]);
          if (isResultInput(input.kind)) next.push({ kind: input.kind, id: input.id });
        }
      }
      frontier = next;
    }
    const inputIds = (kind: InputKind) => [...new Set([...recorded.values()].flat().filter((i) => i.kind === kind).map((i) => i.id))];
    // The sites of the runs results used: is each run still the one its site uses downstream?
    const runSiteIds = [...new Set([...recorded.entries()].filter(([key]) => key.startsWith('ageModelRun:')).flatMap(([, inputs]) => inputs.map((i) => i.id)))];
    const [siteRows, hypothesisRows, downstreamRows] = await Promise.all([
      this.repository.sitesByIds(inputIds('site')),
      this.repository.hypothesesByIds(inputIds('hypothesis')),
      this.repository.downstreamRuns(runSiteIds),
    ]);
    const sites = new Map(siteRows.map((s) => [s.id, { revision: s.columnRevision, name: s.name }]));
    const hypotheses = new Map(hypothesisRows.map((h) => [h.id, { version: h.version, name: h.name }]));
    const downstream = new Map(downstreamRows.map((r) => [r.siteId, { id: r.id, chosen: r.chosen }]));
    return {
      inputsOf: (kind, id) => recorded.get(resultKey(kind, id)) ?? (kind === 'recurrenceAnalysis' ? [] : undefined),
      site: (id) => sites.get(id),
      hypothesis: (id) => hypotheses.get(id),
      downstreamRun: (siteId) => downstream.get(siteId),
    };
  }
}
