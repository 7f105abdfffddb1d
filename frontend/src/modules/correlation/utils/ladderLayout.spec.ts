import { describe, expect, it } from 'vitest';
import { scaleBand, scaleLinear, zoomIdentity } from 'd3';
import {
  eventInDirection,
  canTieEvents,
  createColumnScale,
  createTimeScale,
  hpdExtent,
  ladderTimeWindow,
  nextEventSelection,
  orderAlongStrike,
  regionalBands,
  spaceTimeBars,
  tieSegments,
  zoomedTimeWindow,
  type EventAnchor,
} from './ladderLayout';

const column = (id: string, name: string, alongStrikeKm: number) => ({ site: { id, name, alongStrikeKm } });

describe(orderAlongStrike.name, () => {
  it('puts the lowest along-strike position on the left and keeps same-km sites in name order', () => {
    const ordered = orderAlongStrike([column('c', 'Core C', 410), column('a', 'Marsh A', 12.5), column('b2', 'Trench B', 12.5), column('b1', 'Lake B', 12.5)]);
    expect(ordered.map((entry) => entry.site.id)).toEqual(['b1', 'a', 'b2', 'c']);
  });

  it('does not reorder its input', () => {
    const input = [column('x', 'X', 5), column('y', 'Y', 1)];
    orderAlongStrike(input);
    expect(input.map((entry) => entry.site.id)).toEqual(['x', 'y']);
  });
});

describe(createTimeScale.name, () => {
  it('draws the young end at the top and older ages further down', () => {
    const time = createTimeScale([200, 3200], 20, 620);
    expect(time(200)).toBe(20);
    expect(time(3200)).toBe(620);
    // Brute force: 1700 cal BP is halfway through the window, so halfway down the plot.
    expect(time(1700)).toBe(320);
    expect(time(2500)).toBeGreaterThan(time(1000));
  });

  it('accepts the window in either order', () => {
    expect(createTimeScale([3200, 200], 0, 100)(200)).toBe(0);
  });
});

describe(ladderTimeWindow.name, () => {
  it('covers every density with a margin, rounded out to centuries', () => {
    const [younger, older] = ladderTimeWindow([
      [
        { calBp: 480, probability: 0.5 },
        { calBp: 520, probability: 0.5 },
      ],
      [{ calBp: 2990, probability: 1 }],
    ]);
    expect(younger).toBeLessThanOrEqual(480);
    expect(older).toBeGreaterThanOrEqual(2990);
    expect(younger % 100).toBe(0);
    expect(older % 100).toBe(0);
  });

  it('falls back to the last millennium with nothing to draw', () => {
    expect(ladderTimeWindow([])).toEqual([0, 1000]);
  });
});

describe(createColumnScale.name, () => {
  it('keeps the given column order left to right', () => {
    const columns = createColumnScale(['b1', 'a', 'c'], 0, 600);
    expect(columns('b1')!).toBeLessThan(columns('a')!);
    expect(columns('a')!).toBeLessThan(columns('c')!);
    expect(columns.bandwidth()).toBeGreaterThan(0);
  });
});

describe(hpdExtent.name, () => {
  it('spans split ranges from the youngest end to the oldest', () => {
    expect(
      hpdExtent([
        { olderCalBp: 1320, youngerCalBp: 1280, probability: 0.3 },
        { olderCalBp: 1250, youngerCalBp: 1190, probability: 0.65 },
      ]),
    ).toEqual([1190, 1320]);
    expect(hpdExtent([])).toBeNull();
  });
});

describe(tieSegments.name, () => {
  const anchors = new Map<string, EventAnchor>([
    ['e1', { eventId: 'e1', columnId: 'right', medianCalBp: 1000 }],
    ['e2', { eventId: 'e2', columnId: 'left', medianCalBp: 1100 }],
    ['e3', { eventId: 'e3', columnId: 'left', medianCalBp: null }],
  ]);
  const columnX = (id: string) => ({ left: 100, right: 300 })[id];
  const time = scaleLinear().domain([0, 2000]).range([0, 400]);

  it('joins the two medians left to right and flags conflicting ties', () => {
    const segments = tieSegments([{ id: 't1', eventA: { id: 'e1' }, eventB: { id: 'e2' } }], anchors, columnX, time, new Set(['t1']));
    expect(segments).toHaveLength(1);
    const [segment] = segments;
    expect(segment).toMatchObject({ tieId: 't1', x1: 100, x2: 300, conflict: true });
    // 1100 cal BP on a 0-2000 yr, 400 px axis is 220 px down; 1000 cal BP is 200 px.
    expect(segment!.y1).toBeCloseTo(220, 9);
    expect(segment!.y2).toBeCloseTo(200, 9);
  });

  it('skips ties to events without a median or off the ladder', () => {
    const ties = [
      { id: 't2', eventA: { id: 'e1' }, eventB: { id: 'e3' } },
      { id: 't3', eventA: { id: 'e1' }, eventB: { id: 'gone' } },
    ];
    expect(tieSegments(ties, anchors, columnX, time, new Set())).toEqual([]);
  });
});

describe(regionalBands.name, () => {
  it('spans from the leftmost member column edge to the rightmost and down the combined range', () => {
    const columns = scaleBand<string>().domain(['a', 'b', 'c']).range([0, 300]);
    const time = scaleLinear().domain([0, 1000]).range([0, 500]);
    const anchors = new Map<string, EventAnchor>([
      ['x', { eventId: 'x', columnId: 'a', medianCalBp: 500 }],
      ['y', { eventId: 'y', columnId: 'c', medianCalBp: 520 }],
    ]);
    const [band] = regionalBands(
      [{ id: 'r', members: [{ id: 'x' }, { id: 'y' }], combinedHpd95: [{ olderCalBp: 600, youngerCalBp: 400, probability: 0.954 }] }],
      anchors,
      columns,
      time,
    );
    // Band scale without padding: columns are 100 px each, so a..c covers 0..300.
    expect(band).toEqual({ regionalEventId: 'r', x: 0, width: 300, y: 200, height: 100 });
  });
});

describe(spaceTimeBars.name, () => {
  it('spans the along-strike positions of the member sites', () => {
    const bars = spaceTimeBars(
      [
        {
          id: 'r',
          combinedMedianCalBp: 800,
          members: [{ id: 'x' }, { id: 'y' }, { id: 'z' }],
          combinedHpd95: [{ olderCalBp: 900, youngerCalBp: 700, probability: 0.954 }],
        },
      ],
      new Map([
        ['x', 240],
        ['y', 15],
        ['z', 610],
      ]),
    );
    expect(bars).toEqual([{ regionalEventId: 'r', fromKm: 15, toKm: 610, medianCalBp: 800, youngerCalBp: 700, olderCalBp: 900, memberCount: 3 }]);
  });
});

describe(nextEventSelection.name, () => {
  it('keeps the two most recent picks and drops a clicked selected event', () => {
    expect(nextEventSelection([], 'a')).toEqual(['a']);
    expect(nextEventSelection(['a', 'b'], 'c')).toEqual(['b', 'c']);
    expect(nextEventSelection(['a', 'b'], 'a')).toEqual(['b']);
  });
});

describe(canTieEvents.name, () => {
  it('ties only two events of different columns', () => {
    const a = { eventId: 'a', columnId: 's1', medianCalBp: 1 };
    const b = { eventId: 'b', columnId: 's1', medianCalBp: 2 };
    const c = { eventId: 'c', columnId: 's2', medianCalBp: 3 };
    expect(canTieEvents(a, c)).toBe(true);
    expect(canTieEvents(a, b)).toBe(false);
    expect(canTieEvents(a, undefined)).toBe(false);
  });
});

describe(zoomedTimeWindow.name, () => {
  const base = createTimeScale([0, 1000], 0, 500);

  it('agrees with d3-zoom rescaleY for a zoom and pan', () => {
    // Reference: d3-zoom's own ZoomTransform.rescaleY on the same scale.
    const transform = zoomIdentity.translate(0, -150).scale(2);
    expect(zoomedTimeWindow(base, transform)).toEqual(transform.rescaleY(base).domain());
  });

  it('halves the visible span at zoom factor 2 about the top', () => {
    expect(zoomedTimeWindow(base, { k: 2, y: 0 })).toEqual([0, 500]);
  });
});

describe(eventInDirection.name, () => {
  const event = (id: string, medianCalBp: number | null) => ({ eventHorizon: { id }, medianCalBp });
  const columns = [
    { site: { id: 'a' }, events: [event('a2', 900), event('a1', 300)] },
    { site: { id: 'empty' }, events: [] },
    { site: { id: 'b' }, events: [event('b1', 350), event('b2', 820), event('b3', 1500)] },
  ];

  it('moves up to younger and down to older events of the column, and stops at the ends', () => {
    expect(eventInDirection(columns, 'a1', 'ArrowDown')).toBe('a2');
    expect(eventInDirection(columns, 'a2', 'ArrowUp')).toBe('a1');
    expect(eventInDirection(columns, 'a1', 'ArrowUp')).toBeNull();
    expect(eventInDirection(columns, 'b3', 'ArrowDown')).toBeNull();
  });

  it('moves across to the nearest-in-age event of the next column with events', () => {
    expect(eventInDirection(columns, 'a2', 'ArrowRight')).toBe('b2');
    expect(eventInDirection(columns, 'b1', 'ArrowLeft')).toBe('a1');
    expect(eventInDirection(columns, 'a1', 'ArrowLeft')).toBeNull();
  });

  it('starts at the youngest event of the first column', () => {
    expect(eventInDirection(columns, null, 'ArrowRight')).toBe('a1');
  });
});
