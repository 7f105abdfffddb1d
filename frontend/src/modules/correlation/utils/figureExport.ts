/**
 * Turning an on-screen chart into a stand-alone SVG file. The chart draws with presentation
 * attributes (fill, stroke) rather than stylesheet classes, so the markup alone carries the
 * look; this adds what a file opened outside the app needs: the namespaces, an explicit size,
 * a background and the fonts by name.
 */

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';
const XLINK_NAMESPACE = 'http://www.w3.org/1999/xlink';

/** Fonts named in an exported figure; a viewer without them falls back to the generic family. */
export const FIGURE_FONT_STYLE =
  "text{font-family:'Source Sans 3',Helvetica,Arial,sans-serif}.num,text.num{font-family:'Roboto Mono',Menlo,monospace}";

export type SvgDocumentOptions = {
  width: number;
  height: number;
  /** Fill behind the figure; transparent when null. */
  background?: string | null;
  title?: string;
};

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/**
 * A complete SVG document from a chart's `outerHTML`: XML declaration, the SVG and XLink
 * namespaces (kept once), width, height and viewBox from the chart's size, a font style, an
 * optional title and a background rectangle under everything drawn.
 */
export function svgDocumentText(markup: string, { width, height, background = '#ffffff', title }: SvgDocumentOptions): string {
  const open = /^\s*<svg\b([^>]*)>/i.exec(markup);
  if (!open) throw new Error('the figure is not an <svg> element');
  const attributes = (open[1] ?? '')
    .replace(/\s(xmlns(:xlink)?|width|height|viewBox)="[^"]*"/gi, '')
    .replace(/\s+$/, '');
  const body = markup.slice(open[0].length).replace(/<\/svg>\s*$/i, '');
  const head = [
    `<svg xmlns="${SVG_NAMESPACE}" xmlns:xlink="${XLINK_NAMESPACE}" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}"${attributes}>`,
    title ? `<title>${escapeXml(title)}</title>` : '',
    `<style>${FIGURE_FONT_STYLE}</style>`,
    background ? `<rect x="0" y="0" width="${width}" height="${height}" fill="${escapeXml(background)}"/>` : '',
  ].join('');
  return `<?xml version="1.0" encoding="UTF-8"?>\n${head}${body}</svg>\n`;
}

/** A file name from a figure title: lower case, words joined by hyphens, only safe characters. */
export function figureFileName(title: string, extension: 'svg' | 'png' | 'csv' | 'json'): string {
  const stem = title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return `${stem || 'figure'}.${extension}`;
}

/** A box in the chart's own pixels. */
export type DrawnBox = { x: number; y: number; width: number; height: number };

export type FigureOptions = {
  /** The chart's size on screen. */
  width: number;
  height: number;
  /** Printed above the chart, and the file's <title>. */
  title: string;
  /** Printed under the chart: units, what the marks mean, where the numbers come from. */
  caption?: string;
  /** Everything drawn (the SVG's getBBox()): labels running past the chart's edges stay in the file. */
  drawn?: DrawnBox | null;
  background?: string | null;
};

const TITLE_BAND_PX = 30;
const CAPTION_LINE_PX = 14;
const CAPTION_CHAR_PX = 5.8;
const FRAME_PAD_PX = 8;

/** Words of `text` in lines of at most `maxChars` characters. */
export function wrapWords(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if (line && line.length + 1 + word.length > maxChars) {
      lines.push(line);
      line = word;
    } else {
      line = line ? `${line} ${word}` : word;
    }
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * A figure-ready SVG document from a chart: the title above, the chart (grown to hold anything
 * drawn past its edges, so no label is cut), the caption wrapped beneath. Every chart's export
 * goes through here (FigureExportButtons), so each file carries its title, units and legend.
 */
export function figureDocument(markup: string, options: FigureOptions): { text: string; width: number; height: number } {
  const open = /^\s*<svg\b[^>]*>/i.exec(markup);
  if (!open) throw new Error('the figure is not an <svg> element');
  const body = markup.slice(open[0].length).replace(/<\/svg>\s*$/i, '');
  const drawn = options.drawn;
  const left = Math.floor(Math.min(0, drawn ? drawn.x - FRAME_PAD_PX / 2 : 0));
  const top = Math.floor(Math.min(0, drawn ? drawn.y - FRAME_PAD_PX / 2 : 0));
  const right = Math.ceil(Math.max(options.width, drawn ? drawn.x + drawn.width + FRAME_PAD_PX / 2 : 0));
  const bottom = Math.ceil(Math.max(options.height, drawn ? drawn.y + drawn.height + FRAME_PAD_PX / 2 : 0));
  const chartWidth = right - left;
  const chartHeight = bottom - top;
  const width = chartWidth + 2 * FRAME_PAD_PX;
  const captionLines = options.caption ? wrapWords(options.caption, Math.max(20, Math.floor((width - 2 * FRAME_PAD_PX) / CAPTION_CHAR_PX))) : [];
  const captionTop = TITLE_BAND_PX + chartHeight + FRAME_PAD_PX;
  const height = captionTop + captionLines.length * CAPTION_LINE_PX + FRAME_PAD_PX;
  const framed = [
    '<svg>',
    `<text x="${FRAME_PAD_PX}" y="20" font-size="14" font-weight="600" fill="#1c2127">${escapeXml(options.title)}</text>`,
    `<svg x="${FRAME_PAD_PX}" y="${TITLE_BAND_PX}" width="${chartWidth}" height="${chartHeight}" viewBox="${left} ${top} ${chartWidth} ${chartHeight}" overflow="visible">${body}</svg>`,
    ...captionLines.map(
      (line, index) =>
        `<text x="${FRAME_PAD_PX}" y="${captionTop + (index + 1) * CAPTION_LINE_PX - 3}" font-size="11" fill="#5f6b7c">${escapeXml(line)}</text>`,
    ),
    '</svg>',
  ].join('');
  return { text: svgDocumentText(framed, { width, height, title: options.title, background: options.background }), width, height };
}
