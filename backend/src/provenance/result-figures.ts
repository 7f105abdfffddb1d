/**
 * Figures for a release bundle, drawn on the server as SVG text from the same rows as its tables
 * (no browser, no chart library): an event-age figure with each event's 95.4 % and 68.3 %
 * highest-density ranges and its median on a calendar axis in cal BP, with CE/BCE under each tick.
 * Each drawn mark carries its numbers as data attributes, so a figure can be checked against its
 * table. Pure functions.
 */
import type { HpdRange } from '../chronology/common/density';
import { ceBce } from './result-tables';

/** One event of a figure: its label and the ages of its row in the table. */
export interface FigureEvent {
  readonly label: string;
  readonly medianCalBp: number;
  readonly hpd68: readonly HpdRange[];
  readonly hpd95: readonly HpdRange[];
}

export interface EventAgeFigureInput {
  readonly title: string;
  /** One line under the title: what the ages came from (run, seed). */
  readonly subtitle: string;
  readonly events: readonly FigureEvent[];
}

/** A figure as the bundle carries it. */
export interface BundleFigure {
  readonly name: string;
  readonly title: string;
  /** The bundle table it draws. */
  readonly table: string;
  readonly mediaType: 'image/svg+xml';
  readonly svg: string;
}

const WIDTH = 780;
const LABEL_WIDTH = 230;
const PLOT_LEFT = LABEL_WIDTH + 10;
const PLOT_RIGHT = WIDTH - 30;
const TOP = 62;
const ROW = 24;
const AXIS_SPACE = 70;
const COLOURS = { hpd95: '#b7cbd9', hpd68: '#3f6f8c', median: '#15232d', axis: '#4a5560', grid: '#e3e8ec', text: '#1d262d', muted: '#5d6b76' };
/** Tick spacings tried, years: the first giving at most eight ticks is used. */
const TICK_STEPS = [1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000, 2500, 5000, 10_000, 20_000, 50_000];

/** Text for an SVG text node or attribute. */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);
}

const fixed = (value: number) => Number(value.toFixed(2));

/**
 * The calendar axis of a figure: older ages on the left, time running to the right. The domain
 * is the events' 95.4 % span widened by 5 % each side (at least 10 years).
 */
export function figureScale(events: readonly FigureEvent[]): { olderCalBp: number; youngerCalBp: number; x: (calBp: number) => number } {
  const ages = events.flatMap((e) => [e.medianCalBp, ...e.hpd95.flatMap((r) => [r.olderCalBp, r.youngerCalBp])]);
  const oldest = ages.length > 0 ? Math.max(...ages) : 1000;
  const youngest = ages.length > 0 ? Math.min(...ages) : 0;
  const pad = Math.max(10, (oldest - youngest) * 0.05);
  const olderCalBp = oldest + pad;
  const youngerCalBp = youngest - pad;
  return { olderCalBp, youngerCalBp, x: (calBp) => PLOT_LEFT + ((olderCalBp - calBp) / (olderCalBp - youngerCalBp)) * (PLOT_RIGHT - PLOT_LEFT) };
}

/** Round tick ages inside the domain, at the first spacing giving eight or fewer. */
export function figureTicks(olderCalBp: number, youngerCalBp: number): number[] {
  const span = olderCalBp - youngerCalBp;
  const step = TICK_STEPS.find((s) => span / s <= 8) ?? TICK_STEPS[TICK_STEPS.length - 1];
  const ticks: number[] = [];
  for (let t = Math.ceil(youngerCalBp / step) * step; t <= olderCalBp; t += step) ticks.push(t);
  return ticks;
}

/** The event-age figure of one table, as a standalone SVG document. */
export function eventAgeFigureSvg({ title, subtitle, events }: EventAgeFigureInput): string {
  const { olderCalBp, youngerCalBp, x } = figureScale(events);
  const plotBottom = TOP + Math.max(1, events.length) * ROW;
  const height = plotBottom + AXIS_SPACE;
  const ticks = figureTicks(olderCalBp, youngerCalBp);
  const parts: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${height}" viewBox="0 0 ${WIDTH} ${height}" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
    `<title>${escapeXml(title)}</title>`,
    `<rect x="0" y="0" width="${WIDTH}" height="${height}" fill="#ffffff"/>`,
    `<text x="12" y="22" font-size="15" font-weight="bold" fill="${COLOURS.text}">${escapeXml(title)}</text>`,
    `<text x="12" y="42" fill="${COLOURS.muted}">${escapeXml(subtitle)}</text>`,
  ];
  for (const tick of ticks) {
    const tx = fixed(x(tick));
    parts.push(
      `<line x1="${tx}" y1="${TOP - 6}" x2="${tx}" y2="${plotBottom}" stroke="${COLOURS.grid}"/>`,
      `<line class="tick" data-cal-bp="${tick}" x1="${tx}" y1="${plotBottom}" x2="${tx}" y2="${plotBottom + 5}" stroke="${COLOURS.axis}"/>`,
      `<text x="${tx}" y="${plotBottom + 18}" text-anchor="middle" fill="${COLOURS.text}">${tick}</text>`,
      `<text x="${tx}" y="${plotBottom + 32}" text-anchor="middle" font-size="10" fill="${COLOURS.muted}">${escapeXml(ceBce(tick))}</text>`,
    );
  }
  parts.push(
    `<line x1="${PLOT_LEFT}" y1="${plotBottom}" x2="${PLOT_RIGHT}" y2="${plotBottom}" stroke="${COLOURS.axis}"/>`,
    `<text x="${(PLOT_LEFT + PLOT_RIGHT) / 2}" y="${plotBottom + 50}" text-anchor="middle" fill="${COLOURS.text}">Age (cal BP; calendar year below) · older to the left</text>`,
    `<text x="12" y="${height - 6}" font-size="10" fill="${COLOURS.muted}">Thin bar: 95.4 % highest-density range; thick bar: 68.3 %; dark tick: median.</text>`,
  );
  events.forEach((event, i) => {
    const mid = TOP + i * ROW + ROW / 2;
    parts.push(`<g class="event" data-label="${escapeXml(event.label)}">`);
    parts.push(`<text x="${LABEL_WIDTH}" y="${fixed(mid + 4)}" text-anchor="end" fill="${COLOURS.text}">${escapeXml(clip(event.label, 34))}</text>`);
    for (const range of event.hpd95) parts.push(rangeRect('hpd95', range, x, mid, 6, COLOURS.hpd95));
    for (const range of event.hpd68) parts.push(rangeRect('hpd68', range, x, mid, 12, COLOURS.hpd68));
    const mx = fixed(x(event.medianCalBp));
    parts.push(`<line class="median" data-median-cal-bp="${event.medianCalBp}" x1="${mx}" y1="${fixed(mid - 9)}" x2="${mx}" y2="${fixed(mid + 9)}" stroke="${COLOURS.median}" stroke-width="2"/>`);
    parts.push('</g>');
  });
  if (events.length === 0) parts.push(`<text x="${PLOT_LEFT}" y="${TOP + 16}" fill="${COLOURS.muted}">No events.</text>`);
  parts.push('</svg>');
  return parts.join('\n');
}

function rangeRect(kind: string, range: HpdRange, x: (calBp: number) => number, mid: number, thickness: number, fill: string): string {
  const left = x(range.olderCalBp);
  const right = x(range.youngerCalBp);
  return (
    `<rect class="${kind}" data-older-cal-bp="${range.olderCalBp}" data-younger-cal-bp="${range.youngerCalBp}" ` +
    `x="${fixed(left)}" y="${fixed(mid - thickness / 2)}" width="${fixed(Math.max(1, right - left))}" height="${thickness}" fill="${fill}"/>`
  );
}

function clip(text: string, max: number): string {
  return text.length <= max ? text : `${text.slice(0, max - 1)}…`;
}

/** The figure events of a bundle table's rows (the shared age columns with their range arrays). */
export function figureEventsOf(rows: readonly Record<string, unknown>[], labelOf: (row: Record<string, unknown>) => string): FigureEvent[] {
  return rows.flatMap((row) => {
    if (typeof row.medianCalBp !== 'number') return [];
    return [{ label: labelOf(row), medianCalBp: row.medianCalBp, hpd68: (row.hpd68 as HpdRange[]) ?? [], hpd95: (row.hpd95 as HpdRange[]) ?? [] }];
  });
}
