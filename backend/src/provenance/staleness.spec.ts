import { describe, expect, it } from 'vitest';
import { type ProvenanceGraph, type ResultInput, type ResultKind, resultKey, staleReasons } from './staleness';

/** A small project: two site runs, a joint run over both, analyses on the joint run and on one site run. */
function graph(sites: Record<string, number>, hypothesisVersion: number | undefined, missing: string[] = []): ProvenanceGraph {
  const inputs = new Map<string, ResultInput[]>([
    [resultKey('ageModelRun', 'runA'), [{ kind: 'site', id: 'A', revision: 3, name: 'Tarn Flat' }]],
    [resultKey('ageModelRun', 'runB'), [{ kind: 'site', id: 'B', revision: 5, name: 'Wren Core' }]],
    [resultKey('jointRun', 'joint'), [
      { kind: 'hypothesis', id: 'H', revision: 2, name: 'One to one' },
      { kind: 'site', id: 'A', revision: 3, name: 'Tarn Flat' },
      { kind: 'site', id: 'B', revision: 5, name: 'Wren Core' },
    ]],
    [resultKey('recurrenceAnalysis', 'onJoint'), [{ kind: 'jointRun', id: 'joint', revision: null, name: 'One to one' }]],
    [resultKey('recurrenceAnalysis', 'onB'), [{ kind: 'ageModelRun', id: 'runB', revision: null, name: 'Wren Core' }]],
    [resultKey('recurrenceAnalysis', 'segment'), [
      { kind: 'hypothesis', id: 'H', revision: 2, name: 'One to one' },
      { kind: 'ageModelRun', id: 'runA', revision: null, name: 'Tarn Flat' },
      { kind: 'ageModelRun', id: 'runB', revision: null, name: 'Wren Core' },
    ]],
  ]);
  for (const key of missing) inputs.delete(key);
  const names: Record<string, string> = { A: 'Tarn Flat', B: 'Wren Core' };
  return {
    inputsOf: (kind: ResultKind, id: string) => inputs.get(resultKey(kind, id)),
    site: (id) => (id in sites ? { revision: sites[id], name: names[id] } : undefined),
    hypothesis: () => (hypothesisVersion === undefined ? undefined : { version: hypothesisVersion, name: 'One to one' }),
  };
}

const stale = (g: ProvenanceGraph, kind: ResultKind, id: string) => staleReasons(kind, id, g).length > 0;

describe('staleReasons', () => {
  it('finds nothing while every input is as it was read', () => {
    const g = graph({ A: 3, B: 5 }, 2);
    for (const [kind, id] of [['ageModelRun', 'runA'], ['jointRun', 'joint'], ['recurrenceAnalysis', 'onJoint'], ['recurrenceAnalysis', 'segment']] as const) {
      expect(staleReasons(kind, id, g)).toEqual([]);
    }
  });

  it('carries a change at one site through every step that used it, and to nothing else', () => {
    const g = graph({ A: 4, B: 5 }, 2);
    expect(stale(g, 'ageModelRun', 'runA')).toBe(true);
    expect(stale(g, 'jointRun', 'joint')).toBe(true);
    expect(stale(g, 'recurrenceAnalysis', 'onJoint')).toBe(true);
    expect(stale(g, 'recurrenceAnalysis', 'segment')).toBe(true);
    expect(stale(g, 'ageModelRun', 'runB')).toBe(false);
    expect(stale(g, 'recurrenceAnalysis', 'onB')).toBe(false);
    const [reason] = staleReasons('recurrenceAnalysis', 'onJoint', g);
    expect(reason).toMatchObject({ inputKind: 'site', inputId: 'A', via: ['joint age model run of One to one'] });
    expect(reason.message).toContain('Tarn Flat');
  });

  it('names a new hypothesis version and a deleted input', () => {
    expect(staleReasons('recurrenceAnalysis', 'segment', graph({ A: 3, B: 5 }, 4))[0].message).toContain('now version 4, this used version 2');
    expect(staleReasons('recurrenceAnalysis', 'onB', graph({ A: 3, B: 5 }, 2, [resultKey('ageModelRun', 'runB')]))[0].message).toContain('was deleted');
    expect(staleReasons('ageModelRun', 'runA', graph({ B: 5 }, 2))[0].message).toBe('site Tarn Flat was deleted');
  });

  it('checks a shared run once across calls with one memo', () => {
    const g = graph({ A: 4, B: 5 }, 2);
    let reads = 0;
    const counting: ProvenanceGraph = { ...g, inputsOf: (kind, id) => ((reads += kind === 'ageModelRun' && id === 'runA' ? 1 : 0), g.inputsOf(kind, id)) };
    const memo = new Map();
    staleReasons('recurrenceAnalysis', 'segment', counting, memo);
    const before = reads;
    staleReasons('ageModelRun', 'runA', counting, memo);
    expect(reads).toBe(before);
  });

  it('marks a result stale when a run it used is no longer the run its site uses downstream, and only then', () => {
    const base = graph({ A: 3, B: 5 }, 2);
    const withDownstream = (runs: Record<string, { id: string; chosen: boolean }>): ProvenanceGraph => ({ ...base, downstreamRun: (siteId) => runs[siteId] });
    // Both sites still use the runs the analyses used: nothing is stale.
    const same = withDownstream({ A: { id: 'runA', chosen: false }, B: { id: 'runB', chosen: true } });
    expect(staleReasons('recurrenceAnalysis', 'segment', same)).toEqual([]);
    expect(staleReasons('recurrenceAnalysis', 'onB', same)).toEqual([]);

    // A researcher chose another run of Wren Core: the analyses that used runB say so; the run itself and the joint run are not stale.
    const chosen = withDownstream({ A: { id: 'runA', chosen: false }, B: { id: 'runB2', chosen: true } });
    const [reason] = staleReasons('recurrenceAnalysis', 'onB', chosen);
    expect(reason).toMatchObject({ inputKind: 'ageModelRun', inputId: 'runB', inputName: 'Wren Core', via: [] });
    expect(reason.message).toContain('chosen by a researcher');
    expect(reason.message).toContain('Wren Core');
    expect(staleReasons('recurrenceAnalysis', 'segment', chosen).map((r) => r.inputId)).toEqual(['runB']);
    expect(stale(chosen, 'ageModelRun', 'runB')).toBe(false);
    expect(stale(chosen, 'recurrenceAnalysis', 'onJoint')).toBe(false);

    // Back to the newest run, which is not the one the analysis used either.
    const newest = withDownstream({ A: { id: 'runA2', chosen: false }, B: { id: 'runB', chosen: false } });
    const [onA] = staleReasons('recurrenceAnalysis', 'segment', newest);
    expect(onA).toMatchObject({ inputId: 'runA', inputName: 'Tarn Flat' });
    expect(onA.message).toContain('newest successful');
    // A site with no run used downstream (not read) adds nothing.
    expect(staleReasons('recurrenceAnalysis', 'segment', withDownstream({}))).toEqual([]);
  });
});
