import { describe, expect, it } from 'vitest';
import {
  columnDepthDomain,
  columnLanes,
  truncateLabel,
  columnHeightFor,
  createDepthScale,
  eventContactDepth,
  layoutUnitBoxes,
  sampleDrawingDepth,
  spreadLabels,
  type ColumnSample,
  type ColumnUnit,
} from './columnLayout';

// Every expected value here is worked by hand from the linear map
// y = top + (depth - d0) / (d1 - d0) * (bottom - top) [analytic].

const units: ColumnUnit[] = [
  { id: 'u2', position: 2, name: 'peat', topDepthM: 0.4, baseDepthM: 1.1 },
  { id: 'u1', position: 1, name: 'tidal mud', topDepthM: 1.1, baseDepthM: 2.35 },
  { id: 'u3', position: 3, name: 'soil', topDepthM: 0, baseDepthM: 0.4 },
];
const unitsById = new Map(units.map((unit) => [unit.id, unit]));
const sample = (depthM: number | null, unitId = 'u1'): ColumnSample => ({
  id: `s${depthM}`,
  labCode: 'VX-1',
  unitId,
  depthM,
  excluded: false,
});

describe(columnDepthDomain.name, () => {
  it('runs from the surface to the deepest unit base', () => {
    expect(columnDepthDomain(units, [])).toEqual([0, 2.35]);
  });

  it('reaches a sample below the deepest unit', () => {
    expect(columnDepthDomain(units, [sample(2.6)])).toEqual([0, 2.6]);
  });

  it('gives an empty column one metre', () => {
    expect(columnDepthDomain([], [])).toEqual([0, 1]);
  });

  it('starts above the surface when a unit does', () => {
    expect(columnDepthDomain([{ ...units[0]!, topDepthM: -0.2 }], [])).toEqual([-0.2, 1.1]);
  });
});

describe(columnHeightFor.name, () => {
  it('draws 150 px per metre within 420 to 960 px', () => {
    expect(columnHeightFor([0, 4])).toBe(600);
    expect(columnHeightFor([0, 1])).toBe(420);
    expect(columnHeightFor([0, 12])).toBe(960);
  });

  it('gives a short core with many thin units 30 px per unit', () => {
    expect(columnHeightFor([0, 1.4], 20)).toBe(600);
    expect(columnHeightFor([0, 4], 5)).toBe(600);
  });
});

describe(createDepthScale.name, () => {
  it('maps depth linearly downwards and rounds the domain out to nice metres', () => {
    const scale = createDepthScale([0, 2.35], { top: 10, bottom: 260 });
    expect(scale.domain()).toEqual([0, 2.5]);
    expect(scale(0)).toBe(10);
    expect(scale(2.5)).toBe(260);
    expect(scale(1)).toBeCloseTo(110, 10);
  });
});

describe(layoutUnitBoxes.name, () => {
  it('gives each unit a box from its top to its base, oldest first', () => {
    const scale = createDepthScale([0, 2.5], { top: 0, bottom: 250 });
    const boxes = layoutUnitBoxes(units, scale);
    expect(boxes.map((box) => box.unit.id)).toEqual(['u1', 'u2', 'u3']);
    expect(boxes[0]!.y).toBeCloseTo(110, 10);
    expect(boxes[0]!.height).toBeCloseTo(125, 10);
    expect(boxes[2]!.y).toBe(0);
    expect(boxes[2]!.height).toBeCloseTo(40, 10);
  });
});

describe(eventContactDepth.name, () => {
  it('puts the horizon at the top of the unit below it', () => {
    const horizon = { id: 'e1', name: 'E1', quality: 1, unitBelowId: 'u1', unitAboveId: 'u2' };
    expect(eventContactDepth(horizon, unitsById)).toBe(1.1);
  });

  it('has no depth when the unit below is unknown', () => {
    const horizon = { id: 'e1', name: 'E1', quality: 1, unitBelowId: 'gone', unitAboveId: 'u2' };
    expect(eventContactDepth(horizon, unitsById)).toBeNull();
  });
});

describe(sampleDrawingDepth.name, () => {
  it('uses the sample depth when it has one, else the middle of its unit', () => {
    expect(sampleDrawingDepth(sample(1.5), unitsById)).toBe(1.5);
    expect(sampleDrawingDepth(sample(null, 'u2'), unitsById)).toBeCloseTo(0.75, 10);
    expect(sampleDrawingDepth(sample(null, 'gone'), unitsById)).toBeNull();
  });
});

describe(spreadLabels.name, () => {
  it('leaves labels that do not collide where they are', () => {
    expect(spreadLabels([10, 50, 90], 12, [0, 100])).toEqual([10, 50, 90]);
  });

  it('pushes colliding labels apart by the gap, keeping their order', () => {
    expect(spreadLabels([50, 52, 51], 10, [0, 100])).toEqual([50, 70, 60]);
  });

  it('pushes labels back up from the lower bound', () => {
    expect(spreadLabels([95, 96], 10, [0, 100])).toEqual([90, 100]);
  });

  it('spreads labels evenly when they cannot all fit', () => {
    expect(spreadLabels([5, 5, 5], 60, [0, 100])).toEqual([0, 50, 100]);
  });

  it('returns nothing for no labels', () => {
    expect(spreadLabels([], 10, [0, 100])).toEqual([]);
  });
});

describe(columnLanes.name, () => {
  it('gives the column what the fixed lanes leave, within 72 to 200 px', () => {
    // 44 axis + 104 horizon labels + 104 sample labels + 24 gaps = 276 px of fixed lanes
    expect(columnLanes(400).columnWidth).toBe(124);
    expect(columnLanes(300).columnWidth).toBe(72);
    expect(columnLanes(900).columnWidth).toBe(200);
  });

  it('places the lanes left to right without overlap', () => {
    const lanes = columnLanes(420);
    expect(lanes.axisX).toBeLessThan(lanes.horizonLabelX);
    expect(lanes.horizonLabelX).toBeLessThan(lanes.columnX);
    expect(lanes.columnX + lanes.columnWidth).toBeLessThan(lanes.sampleMarkerX);
    expect(lanes.sampleMarkerX).toBeLessThan(lanes.sampleLabelX);
  });
});

describe(truncateLabel.name, () => {
  it('keeps short labels and cuts long ones with an ellipsis within the limit', () => {
    expect(truncateLabel('peat', 10)).toBe('peat');
    expect(truncateLabel('hemipelagic mud', 8)).toBe('hemipel…');
    expect(truncateLabel('hemipelagic mud', 8)).toHaveLength(8);
    expect(truncateLabel('mud', 0)).toBe('');
  });
});
