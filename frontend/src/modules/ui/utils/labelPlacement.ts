/**
 * Collision avoidance for chart labels along a horizontal line (column headers, site names over a
 * distance axis): each label keeps its anchor x, goes to the first of `rows` text rows where it
 * clears the label before it, and when no row is free the label before it in the least crowded
 * row is shortened with an ellipsis (never below `minChars`); if even that leaves an overlap the
 * new label moves right. Labels are also kept inside [minX, maxX]. Plain arithmetic: the caller
 * passes the text measure (`textWidth` in the browser, a per-character width in tests).
 */

export type LabelRequest = {
  id: string;
  /** The anchor: the label's left edge ('start') or centre ('middle'). */
  x: number;
  text: string;
  anchor?: 'start' | 'middle';
};

export type PlacedLabel = {
  id: string;
  /** Left edge of the text as drawn (draw with text-anchor start). */
  x: number;
  text: string;
  row: number;
  /** The text was shortened; show the whole of it in a tooltip. */
  truncated: boolean;
  /** Room to the right before the next label of the row (or maxX), px: for a second line under it. */
  room: number;
};

export type PlacementOptions = {
  rows: number;
  minX: number;
  maxX: number;
  measure: (text: string) => number;
  /** Space kept between two labels of one row, px. */
  gap?: number;
  /** Shortest a label is cut to, in characters before the ellipsis. */
  minChars?: number;
};

/** `text` shortened with an ellipsis until it fits `width` (not below `minChars` characters). */
export function fitText(text: string, width: number, measure: (text: string) => number, minChars = 3): string {
  if (measure(text) <= width) return text;
  for (let n = text.length - 1; n > minChars; n -= 1) {
    const cut = `${text.slice(0, n).trimEnd()}…`;
    if (measure(cut) <= width) return cut;
  }
  return `${text.slice(0, minChars).trimEnd()}…`;
}

export function placeLabels(requests: readonly LabelRequest[], options: PlacementOptions): PlacedLabel[] {
  const { rows, minX, maxX, measure, gap = 6, minChars = 3 } = options;
  const placed: PlacedLabel[] = [];
  const lastInRow: (PlacedLabel | null)[] = Array.from({ length: Math.max(1, rows) }, () => null);
  const rightOf = (label: PlacedLabel | null) => (label ? label.x + measure(label.text) : -Infinity);
  const order = [...requests].sort((a, b) => a.x - b.x || a.id.localeCompare(b.id));

  for (const request of order) {
    const fullWidth = measure(request.text);
    let left = request.anchor === 'middle' ? request.x - fullWidth / 2 : request.x;
    if (request.anchor === 'middle' && left + fullWidth > maxX) left = maxX - fullWidth;
    left = Math.max(left, minX);

    let row = lastInRow.findIndex((last) => rightOf(last) + gap <= left);
    if (row === -1) {
      // No free row: shorten the label before this one in the row where it ends soonest.
      row = 0;
      for (let r = 1; r < lastInRow.length; r += 1) if (rightOf(lastInRow[r]!) < rightOf(lastInRow[row]!)) row = r;
      const previous = lastInRow[row]!;
      const shortened = fitText(previous.text, Math.max(0, left - gap - previous.x), measure, minChars);
      if (shortened !== previous.text) {
        previous.text = shortened;
        previous.truncated = true;
      }
      left = Math.max(left, rightOf(previous) + gap);
    }
    const text = fitText(request.text, Math.max(0, maxX - left), measure, minChars);
    const label: PlacedLabel = { id: request.id, x: left, text, row, truncated: text !== request.text, room: 0 };
    placed.push(label);
    lastInRow[row] = label;
  }
  // Room to the next label of the same row.
  for (let r = 0; r < lastInRow.length; r += 1) {
    const inRow = placed.filter((label) => label.row === r);
    inRow.forEach((label, index) => {
      const next = inRow[index + 1];
      label.room = (next ? next.x - gap : maxX) - label.x;
    });
  }
  const byId = new Map(placed.map((label) => [label.id, label]));
  return requests.map((request) => byId.get(request.id)!);
}

let context: CanvasRenderingContext2D | null | undefined;

/**
 * Width of `text` in px drawn in `font` (a CSS font shorthand), measured on a canvas in the
 * page's own font family; about 0.6 em per character where no canvas is available (tests).
 */
export function textWidth(text: string, font = '12px'): number {
  if (context === undefined) {
    try {
      context = typeof document === 'undefined' ? null : document.createElement('canvas').getContext('2d');
    } catch {
      context = null;
    }
  }
  const size = Number(/(\d+(?:\.\d+)?)px/.exec(font)?.[1] ?? 12);
  if (!context) return text.length * size * 0.6;
  const family = typeof document !== 'undefined' ? getComputedStyle(document.body).fontFamily || 'sans-serif' : 'sans-serif';
  context.font = `${font} ${family}`;
  return context.measureText(text).width;
}
