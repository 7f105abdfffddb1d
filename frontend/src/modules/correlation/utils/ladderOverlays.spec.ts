import { describe, expect, it } from 'vitest';
import type { EventAnchor } from './ladderLayout';
import { orderLoopKey, orderLoopMarks, suggestionKey, suggestionMarks } from './ladderOverlays';

// Three columns at 100, 200 and 300 px; 0-2000 cal BP over 400 px, so 5 years a pixel.
const columnX = (id: string) => ({ A: 100, B: 200, C: 300 })[id];
const time = (calBp: number) => calBp / 5;
const anchor = (eventId: string, columnId: string, medianCalBp: number | null): [string, EventAnchor] => [eventId, { eventId, columnId, medianCalBp }];

describe(orderLoopMarks.name, () => {
  // The three-site loop of issue 13: X above Z at A, Y above X at B, Z above Y at C.
  const anchors = new Map<string, EventAnchor>([
    anchor('xA', 'A', 1000),
    anchor('zA', 'A', 1200),
    anchor('xB', 'B', 900),
    anchor('yB', 'B', 800),
    anchor('yC', 'C', 1100),
    anchor('zC', 'C', 1050),
  ]);
  const loop = {
    regionalEventIds: ['Z', 'X', 'Y'],
    ties: [
      { id: 't1', eventA: { id: 'xA' }, eventB: { id: 'xB' } },
      { id: 't2', eventA: { id: 'yC' }, eventB: { id: 'yB' } },
      { id: 't3', eventA: { id: 'zC' }, eventB: { id: 'zA' } },
    ],
    steps: [
      { site: { id: 'A' }, older: { id: 'zA' }, younger: { id: 'xA' } },
      { site: { id: 'B' }, older: { id: 'xB' }, younger: { id: 'yB' } },
      { site: { id: 'C' }, older: { id: 'yC' }, younger: { id: 'zC' } },
    ],
  };

  it('draws every tie left to right between medians and every step up its column', () => {
    const [mark] = orderLoopMarks([loop], anchors, columnX, time);
    expect(mark!.key).toBe('Z>X>Y');
    expect(mark!.number).toBe(1);
    // 1000 cal BP is 200 px down, 900 is 180, 800 is 160, 1100 is 220, 1050 is 210, 1200 is 240.
    expect(mark!.ties).toEqual([
      { tieId: 't1', x1: 100, y1: 200, x2: 200, y2: 180 },
      { tieId: 't2', x1: 200, y1: 160, x2: 300, y2: 220 },
      { tieId: 't3', x1: 100, y1: 240, x2: 300, y2: 210 },
    ]);
    // Steps sit 4 px left of their axis, from the older (lower) member up to the younger.
    expect(mark!.steps).toEqual([
      { x1: 96, y1: 240, x2: 96, y2: 200 },
      { x1: 196, y1: 180, x2: 196, y2: 160 },
      { x1: 296, y1: 220, x2: 296, y2: 210 },
    ]);
    // The label sits halfway along the first tie: (100 + 200) / 2, (200 + 180) / 2.
    expect(mark!.label).toEqual({ x: 150, y: 190 });
  });

  it('leaves out pieces whose events are not on the ladder and keeps the loop numbers', () => {
    const partial = new Map(anchors);
    partial.set('xA', { eventId: 'xA', columnId: 'A', medianCalBp: null });
    partial.delete('yC');
    const marks = orderLoopMarks([{ regionalEventIds: ['P', 'Q'], ties: [], steps: [] }, loop], partial, columnX, time);
    expect(marks.map((mark) => mark.number)).toEqual([1, 2]);
    expect(marks[0]!.label).toBeNull();
    // t1 (xA has no median) and t2 (yC is gone) drop out; only t3 and the step at B remain.
    expect(marks[1]!.ties.map((tie) => tie.tieId)).toEqual(['t3']);
    expect(marks[1]!.steps).toEqual([{ x1: 196, y1: 180, x2: 196, y2: 160 }]);
    expect(marks[1]!.label).toEqual({ x: 200, y: 225 });
  });
});

describe(orderLoopKey.name, () => {
  it('joins the regional events in loop order', () => {
    expect(orderLoopKey({ regionalEventIds: ['a', 'b'] })).toBe('a>b');
  });
});

describe(suggestionMarks.name, () => {
  const anchors = new Map<string, EventAnchor>([anchor('a1', 'A', 600), anchor('a2', 'A', 1500), anchor('c1', 'C', 900), anchor('c2', 'C', 1200), anchor('c3', 'C', null)]);
  const suggestion = (a: string, b: string, score: number, tied = false) => ({ eventA: { id: a }, eventB: { id: b }, score, tied });

  it('joins the untied proposals left to right and writes the score a third or two thirds along', () => {
    const marks = suggestionMarks([suggestion('c1', 'a1', 0.8134), suggestion('a1', 'c1', 0.9, true), suggestion('a2', 'c2', 0.5)], anchors, columnX, time);
    // a1 at (100, 120) and c1 at (300, 180): a third along is (166.67, 140).
    expect(marks[0]).toMatchObject({ key: 'c1+a1', score: 0.8134, x1: 100, y1: 120, x2: 300, y2: 180 });
    expect(marks[0]!.label.x).toBeCloseTo(166.667, 3);
    expect(marks[0]!.label.y).toBeCloseTo(140, 9);
    expect(marks[0]!.label.text).toBe('0.81');
    // The tied pair is skipped; a2 (100, 300) to c2 (300, 240), two thirds along: (233.33, 260).
    expect(marks).toHaveLength(2);
    expect(marks[1]!.label.x).toBeCloseTo(233.333, 3);
    expect(marks[1]!.label.y).toBeCloseTo(260, 9);
    expect(marks[1]!.label.text).toBe('0.50');
  });

  it('skips proposals whose events have no median or are off the ladder', () => {
    expect(suggestionMarks([suggestion('a1', 'c3', 0.7), suggestion('a1', 'zz', 0.7)], anchors, columnX, time)).toEqual([]);
    expect(suggestionKey(suggestion('x', 'y', 1))).toBe('x+y');
  });
});
