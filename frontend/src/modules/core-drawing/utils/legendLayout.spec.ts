import { describe, expect, it } from 'vitest';
import { flowLegend } from './legendLayout';

describe('flowLegend', () => {
  // Widths: 21 + 4.7 per character, 14 between entries.
  it('wraps an entry that would cross the right edge onto the next row', () => {
    const placed = flowLegend(
      [
        { key: 'a', label: 'aaaaaaaaaa' }, // 68 wide, next starts at 82
        { key: 'b', label: 'bbbbbbbbbb' }, // 82 + 68 = 150 fits in 170
        { key: 'c', label: 'cc' }, // 164 + 30.4 > 170: next row
      ],
      170,
    );
    expect(placed.map((entry) => [entry.key, Number(entry.x.toFixed(1)), entry.row])).toEqual([
      ['a', 0, 0],
      ['b', 82, 0],
      ['c', 0, 1],
    ]);
  });

  it('puts an entry wider than a row on a row of its own', () => {
    const placed = flowLegend([{ key: 'long', label: 'x'.repeat(60) }, { key: 'next', label: 'y' }], 100);
    expect(placed.map((entry) => entry.row)).toEqual([0, 1]);
  });
});
