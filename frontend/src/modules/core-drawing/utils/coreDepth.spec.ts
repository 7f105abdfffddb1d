import { describe, expect, it } from 'vitest';
import { coreScale, depthLinks, erosionMarks, hasMudWithDepths, thicknessLabel, traceOnAxis, type CoreUnit } from './coreDepth';

// A hand-made core, top down: mud 0-0.5 m, bed T1 0.5-0.7 m (scoured 3 cm into the mud below),
// mud 0.7-1.2 m, bed T2 1.2-1.25 m, mud 1.25-2.0 m. Beds total 0.25 m, so the core is 1.75 m of
// event-free depth. Expected values below are worked by hand from that layout.
const core: CoreUnit[] = [
  { id: 'm1', position: 1, name: 'mud 3', topDepthM: 1.25, baseDepthM: 2.0, facies: 'HEMIPELAGIC_MUD' },
  { id: 't2', position: 2, name: 'T2', topDepthM: 1.2, baseDepthM: 1.25, facies: 'TURBIDITE' },
  { id: 'm2', position: 3, name: 'mud 2', topDepthM: 0.7, baseDepthM: 1.2, facies: 'HEMIPELAGIC_MUD' },
  { id: 't1', position: 4, name: 'T1', topDepthM: 0.5, baseDepthM: 0.7, facies: 'TURBIDITE', basalErosionM: 0.03 },
  { id: 'm3', position: 5, name: 'mud 1', topDepthM: 0, baseDepthM: 0.5, facies: 'HEMIPELAGIC_MUD', basalErosionM: 0 },
];

describe('coreScale', () => {
  const scale = coreScale(core)!;

  it('removes the beds above a point, and only the part of a bed above it', () => {
    expect(scale.eventFreeDepth(0.3)).toBeCloseTo(0.3, 12);
    expect(scale.eventFreeDepth(0.6)).toBeCloseTo(0.5, 12); // inside T1: its top
    expect(scale.eventFreeDepth(1.0)).toBeCloseTo(0.8, 12);
    expect(scale.eventFreeDepth(1.22)).toBeCloseTo(1.0, 12);
    expect(scale.eventFreeLengthM).toBeCloseTo(1.75, 12);
  });

  it('lists the units top down and collapses each bed to one event-free depth', () => {
    expect(scale.segments.map((segment) => segment.unit.id)).toEqual(['m3', 't1', 'm2', 't2', 'm1']);
    const t1 = scale.segments[1]!;
    expect(t1.isBed).toBe(true);
    expect(t1.eventFreeTopM).toBeCloseTo(0.5, 12);
    expect(t1.eventFreeBaseM).toBeCloseTo(0.5, 12);
    const mud2 = scale.segments[2]!;
    expect([mud2.eventFreeTopM, mud2.eventFreeBaseM].map((v) => Number(v.toFixed(9)))).toEqual([0.5, 1.0]);
  });

  it('measures event-free depth from the top of the uppermost unit', () => {
    const shifted = coreScale(core.map((unit) => ({ ...unit, topDepthM: unit.topDepthM + 0.1, baseDepthM: unit.baseDepthM + 0.1 })))!;
    expect(shifted.topDepthM).toBeCloseTo(0.1, 12);
    expect(shifted.eventFreeDepth(1.1)).toBeCloseTo(0.8, 12);
  });

  it('has nothing to draw without a unit of some thickness', () => {
    expect(coreScale([])).toBeNull();
    expect(coreScale([{ id: 'x', position: 1, name: 'x', topDepthM: 1, baseDepthM: 1, facies: 'OTHER' }])).toBeNull();
  });
});

describe('depthLinks', () => {
  it('links round true depths outside beds to their event-free depths', () => {
    const links = depthLinks(coreScale(core)!, [0, 0.5, 0.6, 1, 1.5, 2, 2.5]);
    expect(links.map((link) => link.depthM)).toEqual([0, 0.5, 1, 1.5, 2]);
    expect(links.map((link) => Number(link.eventFreeDepthM.toFixed(9)))).toEqual([0, 0.5, 0.8, 1.25, 1.75]);
  });
});

describe('erosionMarks', () => {
  it('marks only bases with an erosion estimate above zero', () => {
    const marks = erosionMarks(coreScale(core)!);
    expect(marks).toHaveLength(1);
    expect(marks[0]).toMatchObject({ unitId: 't1', depthM: 0.7, erosionM: 0.03 });
    expect(marks[0]!.eventFreeDepthM).toBeCloseTo(0.5, 12);
  });
});

describe('hasMudWithDepths', () => {
  it('needs a hemipelagic unit with a thickness', () => {
    expect(hasMudWithDepths(core)).toBe(true);
    expect(hasMudWithDepths([{ facies: 'HEMIPELAGIC_MUD', topDepthM: 1, baseDepthM: 1 }])).toBe(false);
    expect(hasMudWithDepths([{ facies: 'TURBIDITE', topDepthM: 0, baseDepthM: 1 }])).toBe(false);
  });
});

describe('thicknessLabel', () => {
  it('writes centimetres below a metre', () => {
    expect(thicknessLabel(0.03)).toBe('3 cm');
    expect(thicknessLabel(0.025)).toBe('2.5 cm');
    expect(thicknessLabel(0.4)).toBe('40 cm');
    expect(thicknessLabel(1.234)).toBe('1.23 m');
  });
});

describe('traceOnAxis', () => {
  const scale = coreScale(core)!;

  it('keeps true depths as they are and skips missing readings', () => {
    expect(traceOnAxis([0.1, 0.6, 1.0], [5, Number.NaN, 7], scale, 'TRUE')).toEqual([
      { depth: 0.1, value: 5 },
      { depth: 1.0, value: 7 },
    ]);
  });

  it('puts a bed readings at the bed one event-free depth and drops readings outside the core', () => {
    const points = traceOnAxis([0.55, 0.65, 1.0, 2.4], [10, 12, 7, 1], scale, 'EVENT_FREE');
    expect(points.map((p) => Number(p.depth.toFixed(9)))).toEqual([0.5, 0.5, 0.8]);
    expect(points.map((p) => p.value)).toEqual([10, 12, 7]);
  });
});
