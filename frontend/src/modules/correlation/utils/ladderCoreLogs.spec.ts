import { describe, expect, it } from 'vitest';
import type { CoreUnit } from '@/modules/core-drawing/utils/coreDepth';
import type { EventAnchor } from './ladderLayout';
import { bedLogMarks, bedPixelsPerMetre, logChannels } from './ladderCoreLogs';

const unit = (id: string, position: number, topDepthM: number, baseDepthM: number, facies: string): CoreUnit => ({ id, position, name: id.toUpperCase(), topDepthM, baseDepthM, facies });

// A core from the top: mud 0-0.3, bed T1 0.3-0.4, mud 0.4-0.7, bed T2 0.7-0.9, mud 0.9-1.0 (m).
const units = [
  unit('m1', 5, 0, 0.3, 'HEMIPELAGIC_MUD'),
  unit('t1', 4, 0.3, 0.4, 'TURBIDITE'),
  unit('m2', 3, 0.4, 0.7, 'HEMIPELAGIC_MUD'),
  unit('t2', 2, 0.7, 0.9, 'TURBIDITE'),
  unit('m3', 1, 0.9, 1.0, 'HEMIPELAGIC_MUD'),
];
const horizons = [
  { id: 'e1', unitAboveId: 't1' },
  { id: 'e2', unitAboveId: 't2' },
];
// Readings every 10 cm: 20 in mud, 40 and 60 in T1, 80 at the top of T2 and 30 at its base.
const trace = { depthsM: [0.2, 0.3, 0.4, 0.5, 0.7, 0.9, 1.0], values: [20, 40, 60, 20, 80, 30, 20] };
const anchors = new Map<string, EventAnchor>([
  ['e1', { eventId: 'e1', columnId: 'core', medianCalBp: 500 }],
  ['e2', { eventId: 'e2', columnId: 'core', medianCalBp: 1000 }],
]);
// Axis at x = 200; 1 px a year; lane 30 px wide ending 6 px left of the axis, so it spans 164-194.
const columnX = (id: string) => (id === 'core' ? 200 : undefined);
const time = (calBp: number) => calBp;
const lane = { width: 30, gap: 6 };

describe(bedLogMarks.name, () => {
  it("puts each bed's base at its event's median and its readings up the bed at a fixed scale", () => {
    const marks = bedLogMarks([{ siteId: 'core', units, horizons, trace }], anchors, columnX, time, 100, lane);
    expect(marks.map((mark) => [mark.eventId, mark.bedName, mark.top, mark.base, mark.laneLeft])).toEqual([
      // T1: 0.1 m at 100 px/m is 10 px tall, base at 500 px.
      ['e1', 'T1', 490, 500, 164],
      // T2: 0.2 m is 20 px tall, base at 1000 px.
      ['e2', 'T2', 980, 1000, 164],
    ]);
    // Values 20..80 across 30 px: 40 is a third (174), 60 two thirds (184), 80 the right edge (194), 30 at 169.
    const rounded = (points: { x: number; y: number }[]) => points.map((point) => ({ x: Number(point.x.toFixed(6)), y: Number(point.y.toFixed(6)) }));
    expect(rounded(marks[0]!.points)).toEqual([
      { x: 174, y: 490 },
      { x: 184, y: 500 },
    ]);
    expect(rounded(marks[1]!.points)).toEqual([
      { x: 194, y: 980 },
      { x: 169, y: 1000 },
    ]);
  });

  it('skips beds without an event on the ladder, cores off the ladder and cores without the channel', () => {
    const partial = new Map(anchors);
    partial.set('e2', { eventId: 'e2', columnId: 'core', medianCalBp: null });
    expect(bedLogMarks([{ siteId: 'core', units, horizons, trace }], partial, columnX, time, 100, lane).map((mark) => mark.eventId)).toEqual(['e1']);
    expect(bedLogMarks([{ siteId: 'gone', units, horizons, trace }], anchors, columnX, time, 100, lane)).toEqual([]);
    expect(bedLogMarks([{ siteId: 'core', units, horizons, trace: null }], anchors, columnX, time, 100, lane)).toEqual([]);
  });
});

describe(bedPixelsPerMetre.name, () => {
  it('keeps the preferred scale unless the thickest bed would pass the limit', () => {
    // Thickest bed 0.2 m: 200 px/m would make it 40 px, under 60.
    expect(bedPixelsPerMetre([{ units }])).toBe(200);
    // With a 0.5 m bed, 60 px / 0.5 m = 120 px/m.
    expect(bedPixelsPerMetre([{ units: [...units, unit('t3', 0, 1.0, 1.5, 'TURBIDITE')] }])).toBe(120);
    expect(bedPixelsPerMetre([])).toBe(200);
  });
});

describe(logChannels.name, () => {
  it('lists each channel once in first-seen order', () => {
    expect(logChannels([{ channels: ['density', 'MS'] }, { channels: ['MS', 'CT'] }])).toEqual(['density', 'MS', 'CT']);
  });
});
