import { describe, expect, it } from 'vitest';
import { fitText, placeLabels, type PlacedLabel } from './labelPlacement';

// Geometry only: a fixed 7 px per character stands in for the font, so overlaps are exact.
const measure = (text: string) => text.length * 7;

function overlaps(labels: readonly PlacedLabel[], gap = 6): string[] {
  const found: string[] = [];
  for (const a of labels) {
    for (const b of labels) {
      if (a === b || a.row !== b.row || a.x > b.x) continue;
      if (a.x + measure(a.text) + gap > b.x + 1e-9 && a.id !== b.id) found.push(`${a.id}/${b.id}`);
    }
  }
  return found;
}

describe(placeLabels.name, () => {
  it('keeps short labels on the first row at their anchors', () => {
    const placed = placeLabels([{ id: 'a', x: 0, text: 'A' }, { id: 'b', x: 100, text: 'B' }], { rows: 2, minX: 0, maxX: 400, measure });
    expect(placed.map((label) => [label.x, label.row, label.text])).toEqual([[0, 0, 'A'], [100, 0, 'B']]);
  });

  it('never overlaps long names in narrow columns (ten columns 60 px apart, as a 1024 px ladder)', () => {
    const requests = Array.from({ length: 10 }, (_, i) => ({ id: `s${i}`, x: 40 + i * 60, text: `Very long site name number ${i}` }));
    const placed = placeLabels(requests, { rows: 2, minX: 0, maxX: 660, measure });
    expect(overlaps(placed)).toEqual([]);
    expect(placed.every((label) => label.x + measure(label.text) <= 660)).toBe(true);
    expect(placed.some((label) => label.truncated)).toBe(true);
    // Alternate rows give each label nearly two columns of room.
    expect(placed[0]!.row).toBe(0);
    expect(placed[1]!.row).toBe(1);
  });

  it('separates centred labels at unevenly spaced anchors (sites along strike), inside the plot', () => {
    const kms = [0, 3, 5, 6, 80, 200, 205];
    const requests = kms.map((km, i) => ({ id: `k${i}`, x: 20 + km * 3, text: `Site ${i} marsh`, anchor: 'middle' as const }));
    const placed = placeLabels(requests, { rows: 2, minX: 0, maxX: 640, measure });
    expect(overlaps(placed)).toEqual([]);
    expect(Math.min(...placed.map((label) => label.x))).toBeGreaterThanOrEqual(0);
    expect(Math.max(...placed.map((label) => label.x + measure(label.text)))).toBeLessThanOrEqual(640);
  });

  it('cuts the last label at the right edge instead of running past it', () => {
    const [label] = placeLabels([{ id: 'z', x: 380, text: 'Eastern trench' }], { rows: 1, minX: 0, maxX: 420, measure });
    expect(label!.x + measure(label!.text)).toBeLessThanOrEqual(420);
    expect(label!.text.endsWith('…')).toBe(true);
  });
});

describe(fitText.name, () => {
  it('shortens with an ellipsis, not below the minimum', () => {
    expect(fitText('Tidal marsh', 1000, measure)).toBe('Tidal marsh');
    expect(fitText('Tidal marsh', 42, measure)).toBe('Tidal…');
    expect(fitText('Tidal marsh', 1, measure)).toBe('Tid…');
  });
});
