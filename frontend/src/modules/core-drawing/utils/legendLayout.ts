/** Legend entries laid out in rows, left to right, wrapping before `maxWidth`. */
export type LegendEntry = { key: string; label: string };
export type PlacedEntry<TEntry extends LegendEntry> = TEntry & { x: number; row: number };

/** Width of one character of the legend's 9.5 px face, a generous average. */
export const LEGEND_CHAR_WIDTH = 4.7;
/** Room for the swatch before the label, and the gap after an entry. */
export const LEGEND_SWATCH = 21;
export const LEGEND_GAP = 14;

/** Each entry's x and row; an entry wider than a row gets a row of its own. */
export function flowLegend<TEntry extends LegendEntry>(entries: readonly TEntry[], maxWidth: number): PlacedEntry<TEntry>[] {
  let x = 0;
  let row = 0;
  return entries.map((entry) => {
    const width = LEGEND_SWATCH + entry.label.length * LEGEND_CHAR_WIDTH;
    if (x > 0 && x + width > maxWidth) {
      row += 1;
      x = 0;
    }
    const placed = { ...entry, x, row };
    x += width + LEGEND_GAP;
    return placed;
  });
}
