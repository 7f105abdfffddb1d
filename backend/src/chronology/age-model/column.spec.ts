import { describe, expect, it } from 'vitest';
import { uniformDensity } from '../common/density';
import {
  AgeModelInput,
  buildOrderGraph,
  ColumnProblemCode,
  ColumnProblemError,
  ColumnSample,
  NodeKind,
  OrderGraph,
  validateColumn,
} from './column';

// Column rules from the issue and SPEC (units by position, horizons at adjacent contacts,
// events need something dated below) [common practice of stratigraphic ordering].

const flat = uniformDensity(1000, 1100);

function sample(id: string, unitId: string, extra: Partial<ColumnSample> = {}): ColumnSample {
  return { id, unitId, depthM: null, ageRelation: 'DATES_DEPOSIT', likelihood: flat, ...extra };
}

const good: AgeModelInput = {
  units: [
    { id: 'u1', name: 'Peat A', position: 1, topDepthM: 2, baseDepthM: 3 },
    { id: 'u2', name: 'Tidal mud B', position: 2, topDepthM: 1, baseDepthM: 2 },
    { id: 'u3', name: 'Soil C', position: 3, topDepthM: 0, baseDepthM: 1 },
  ],
  eventHorizons: [
    { id: 'h1', name: 'E1', unitBelowId: 'u1', unitAboveId: 'u2' },
    { id: 'h2', name: 'E2', unitBelowId: 'u2', unitAboveId: 'u3' },
  ],
  samples: [sample('s1', 'u1'), sample('s2', 'u1'), sample('s3', 'u2'), sample('s4', 'u3')],
};

function codes(input: AgeModelInput): ColumnProblemCode[] {
  return validateColumn(input).map((p) => p.code);
}

describe(validateColumn.name, () => {
  it('accepts a well-formed column', () => {
    expect(validateColumn(good)).toEqual([]);
  });

  it('reports two units with one position, naming both', () => {
    const input = { ...good, units: good.units.map((u) => (u.id === 'u3' ? { ...u, position: 2 } : u)) };
    const problems = validateColumn(input).filter((p) => p.code === 'DUPLICATE_POSITION');
    expect(problems).toHaveLength(1);
    expect(problems[0].message).toContain('"Tidal mud B"');
    expect(problems[0].message).toContain('"Soil C"');
  });

  it('reports a horizon whose units are not adjacent', () => {
    const input = { ...good, eventHorizons: [{ id: 'h9', name: 'E9', unitBelowId: 'u1', unitAboveId: 'u3' }] };
    const problems = validateColumn(input);
    expect(problems.map((p) => p.code)).toEqual(['HORIZON_NOT_ADJACENT']);
    expect(problems[0].message).toContain('"E9"');
    expect(problems[0].message).toContain('"Peat A"');
  });

  it('reports a horizon pointing at the unit above below it (reversed)', () => {
    const input = { ...good, eventHorizons: [{ id: 'h1', name: 'E1', unitBelowId: 'u2', unitAboveId: 'u1' }] };
    expect(codes(input)).toEqual(['HORIZON_NOT_ADJACENT']);
  });

  it('reports a horizon referring to missing units', () => {
    const input = { ...good, eventHorizons: [{ id: 'h1', name: 'E1', unitBelowId: 'u1', unitAboveId: 'gone' }] };
    const problems = validateColumn(input);
    expect(problems.map((p) => p.code)).toEqual(['HORIZON_UNKNOWN_UNIT']);
    expect(problems[0].message).toContain('"gone"');
  });

  it('reports an event with nothing datable at or below its unit below', () => {
    const input = {
      ...good,
      samples: [sample('s1', 'u1', { excluded: true }), sample('s3', 'u2'), sample('s4', 'u3')],
    };
    const problems = validateColumn(input);
    expect(problems.map((p) => p.code)).toEqual(['EVENT_NOT_DATED_BELOW']);
    expect(problems[0].message).toContain('"E1"');
  });

  it('accepts an event dated only further down the column', () => {
    const input = { ...good, samples: [sample('s1', 'u1'), sample('s4', 'u3')] };
    expect(validateColumn(input)).toEqual([]);
  });

  it('reports a column with no dated sample, and one whose samples are all excluded', () => {
    expect(codes({ ...good, eventHorizons: [], samples: [] })).toEqual(['NO_DATED_SAMPLE']);
    expect(codes({ ...good, eventHorizons: [], samples: [sample('s1', 'u1', { excluded: true })] })).toEqual([
      'NO_DATED_SAMPLE',
    ]);
  });

  it('reports two horizons at one contact, unknown units of samples and empty likelihoods', () => {
    const input: AgeModelInput = {
      ...good,
      eventHorizons: [...good.eventHorizons, { id: 'h3', name: 'E1 bis', unitBelowId: 'u1', unitAboveId: 'u2' }],
      samples: [
        ...good.samples,
        sample('s5', 'nowhere'),
        sample('s6', 'u2', { likelihood: { startCalBp: 10, probabilities: new Float64Array(5) } }),
      ],
    };
    expect(codes(input).sort()).toEqual(['HORIZONS_AT_ONE_CONTACT', 'SAMPLE_EMPTY_LIKELIHOOD', 'SAMPLE_UNKNOWN_UNIT']);
  });

  it('names units by id when they have no name', () => {
    const input = {
      ...good,
      units: good.units.map(({ name: _name, ...u }) => (u.id === 'u3' ? { ...u, position: 2 } : u)),
    };
    expect(validateColumn(input)[0].message).toContain('"u2"');
  });
});

function olderOf(graph: OrderGraph, node: number): number[] {
  return Array.from(graph.olderNeighbours.subarray(graph.olderOffsets[node], graph.olderOffsets[node + 1])).sort();
}

describe(buildOrderGraph.name, () => {
  it('throws ColumnProblemError with every problem for a bad column', () => {
    const input = { ...good, units: good.units.map((u) => ({ ...u, position: 1 })) };
    try {
      buildOrderGraph(input);
      throw new Error('expected a ColumnProblemError');
    } catch (error) {
      expect(error).toBeInstanceOf(ColumnProblemError);
      expect((error as ColumnProblemError).problems.length).toBeGreaterThanOrEqual(2);
    }
  });

  it('links each age only to its immediate neighbours in the order', () => {
    // Nodes: 0 end, 1 start, 2 E1, 3 E2, then s1, s2 (unit 1), s3 (unit 2), s4 (unit 3).
    const graph = buildOrderGraph(good);
    expect(Array.from(graph.kind)).toEqual([
      NodeKind.END,
      NodeKind.START,
      NodeKind.EVENT,
      NodeKind.EVENT,
      NodeKind.DEPOSIT,
      NodeKind.DEPOSIT,
      NodeKind.DEPOSIT,
      NodeKind.DEPOSIT,
    ]);
    expect(graph.events.map((e) => e.id)).toEqual(['h1', 'h2']);
    expect(olderOf(graph, 0)).toEqual([7]); // end boundary < s4
    expect(olderOf(graph, 7)).toEqual([3]); // s4 < E2
    expect(olderOf(graph, 3)).toEqual([6]); // E2 < s3
    expect(olderOf(graph, 6)).toEqual([2]); // s3 < E1
    expect(olderOf(graph, 2)).toEqual([4, 5]); // E1 < both samples of unit 1
    expect(olderOf(graph, 4)).toEqual([1]);
    expect(olderOf(graph, 5)).toEqual([1]);
  });

  it('orders a core by depth and leaves a sample without depth unordered within its unit', () => {
    const input: AgeModelInput = {
      orderSamplesByDepth: true,
      units: [
        { id: 'u1', position: 1, topDepthM: 1, baseDepthM: 3 },
        { id: 'u2', position: 2, topDepthM: 0, baseDepthM: 1 },
      ],
      eventHorizons: [],
      samples: [
        sample('deep', 'u1', { depthM: 2.5 }),
        sample('mid', 'u1', { depthM: 2.0 }),
        sample('twin', 'u1', { depthM: 2.0 }),
        sample('loose', 'u1'),
        sample('top', 'u2', { depthM: 0.5 }),
      ],
    };
    const graph = buildOrderGraph(input);
    const node = (id: string): number => 2 + graph.samples.findIndex((s) => s.id === id);
    expect(olderOf(graph, node('mid'))).toEqual([node('deep')]);
    expect(olderOf(graph, node('twin'))).toEqual([node('deep')]);
    expect(olderOf(graph, node('deep'))).toEqual([1]);
    expect(olderOf(graph, node('loose'))).toEqual([1]);
    // No event between the units: the top sample sits directly under every youngest unit-1 age.
    expect(olderOf(graph, node('top'))).toEqual([node('mid'), node('twin'), node('loose')].sort());
  });
});
