import { describe, expect, it } from 'vitest';
import { keepLabelInFrame, layoutMarkers, placeBandLabel } from './markerLayout';

function distance(a: { drawX: number; drawY: number }, b: { drawX: number; drawY: number }): number {
  return Math.hypot(a.drawX - b.drawX, a.drawY - b.drawY);
}

describe(layoutMarkers.name, () => {
  it('leaves markers that are far enough apart where they are', () => {
    const placed = layoutMarkers(
      [
        { id: 'a', x: 0, y: 0 },
        { id: 'b', x: 30, y: 0 },
      ],
      12,
    );
    expect(placed.map((marker) => [marker.drawX, marker.drawY, marker.displaced])).toEqual([
      [0, 0, false],
      [30, 0, false],
    ]);
  });

  it('fans coincident markers out on a ring, neighbours one spacing apart, centred on their place', () => {
    const placed = layoutMarkers(
      [
        { id: 'c', x: 100, y: 50 },
        { id: 'a', x: 100, y: 50 },
        { id: 'b', x: 100, y: 50 },
      ],
      12,
    );
    for (let i = 0; i < placed.length; i += 1) {
      for (let j = i + 1; j < placed.length; j += 1) {
        const a = placed[i];
        const b = placed[j];
        // three on a ring: every pair are neighbours, so each pair is exactly one spacing apart.
        if (a && b) expect(distance(a, b)).toBeCloseTo(12, 9);
      }
    }
    const cx = placed.reduce((sum, marker) => sum + marker.drawX, 0) / 3;
    const cy = placed.reduce((sum, marker) => sum + marker.drawY, 0) / 3;
    expect(cx).toBeCloseTo(100, 9);
    expect(cy).toBeCloseTo(50, 9);
    // Id order round the ring from the top: 'a' is placed straight above the centre.
    const a = placed.find((marker) => marker.id === 'a');
    expect(a?.drawX).toBeCloseTo(100, 9);
    expect(a?.drawY).toBeLessThan(50);
    expect(placed.every((marker) => marker.displaced)).toBe(true);
    // The true positions are kept for the tooltip and the leader line.
    expect(placed.map((marker) => [marker.x, marker.y])).toEqual([
      [100, 50],
      [100, 50],
      [100, 50],
    ]);
  });

  it('joins chains of near markers into one cluster (single linkage)', () => {
    const placed = layoutMarkers(
      [
        { id: 'a', x: 0, y: 0 },
        { id: 'b', x: 8, y: 0 },
        { id: 'c', x: 16, y: 0 },
        { id: 'd', x: 200, y: 0 },
      ],
      10,
    );
    expect(placed.map((marker) => marker.displaced)).toEqual([true, true, true, false]);
  });

  it('places nothing for no markers', () => {
    expect(layoutMarkers([], 10)).toEqual([]);
  });
});

describe(placeBandLabel.name, () => {
  // A band running straight down the screen through x = 100.
  const from = [100, 0] as const;
  const to = [100, 200] as const;

  it('puts the label on the side without markers', () => {
    const label = placeBandLabel([100, 100], from, to, [{ drawX: 80, drawY: 100 }], 30);
    expect(label).toEqual({ x: 130, y: 100, textAnchor: 'start' });
  });

  it('goes left, with the text ending at the label, when the right side is crowded', () => {
    const label = placeBandLabel([100, 100], from, to, [{ drawX: 128, drawY: 102 }], 30);
    expect(label.x).toBeCloseTo(70, 9);
    expect(label.textAnchor).toBe('end');
  });

  it('takes the right side when nothing is near', () => {
    expect(placeBandLabel([100, 100], from, to, [], 20).textAnchor).toBe('start');
  });
});

describe(keepLabelInFrame.name, () => {
  it('turns a label running off the right edge to run left, inside the frame', () => {
    const kept = keepLabelInFrame({ x: 580, y: 100, textAnchor: 'start' }, 120, 2, 600, 400, 8);
    expect(kept.textAnchor).toBe('end');
    expect(kept.x - 120).toBeGreaterThanOrEqual(8);
    expect(kept.x).toBeLessThanOrEqual(592);
  });

  it('moves a label below the frame up so both lines show', () => {
    const kept = keepLabelInFrame({ x: 100, y: 399, textAnchor: 'start' }, 80, 2, 600, 400, 8);
    expect(kept.y + 13).toBeLessThanOrEqual(392);
    expect(kept.x).toBe(100);
  });
});
