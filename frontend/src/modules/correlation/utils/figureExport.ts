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
