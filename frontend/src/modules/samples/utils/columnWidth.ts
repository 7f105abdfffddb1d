/** Rough width in px of text in the table's 12-13 px font (a mean glyph of about 7 px), plus cell padding. */
const CHARACTER_PX = 7;
const CELL_PADDING_PX = 22;

/**
 * A column's width from its content: wide enough for its header and its longest cell text (so
 * nothing is cut to "…" on a normal screen), within [min, max] so one very long cell (a long
 * warning) does not push the rest off screen; that one still shows whole in its tooltip.
 */
export function fitColumnWidth(header: string, texts: readonly string[], min: number, max: number): number {
  const longest = texts.reduce((widest, text) => Math.max(widest, text.length), header.length + 2);
  return Math.round(Math.min(max, Math.max(min, longest * CHARACTER_PX + CELL_PADDING_PX)));
}
