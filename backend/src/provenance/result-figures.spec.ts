import { describe, expect, it } from 'vitest';
import { eventAgeFigureSvg, figureEventsOf, figureTicks, type FigureEvent } from './result-figures';
import { ageCells } from './result-tables';

// Invented events, one with a split 95.4 % range.
const EVENTS: FigureEvent[] = [
  { label: 'Tarn Flat: E3', medianCalBp: 640, hpd68: [{ olderCalBp: 700, youngerCalBp: 590, probability: 0.683 }], hpd95: [{ olderCalBp: 780, youngerCalBp: 540, probability: 0.954 }] },
  {
    label: 'Wren Core: E2 <twin> & co',
    medianCalBp: 1510,
    hpd68: [{ olderCalBp: 1560, youngerCalBp: 1470, probability: 0.683 }],
    hpd95: [
      { olderCalBp: 1720, youngerCalBp: 1650, probability: 0.12 },
      { olderCalBp: 1600, youngerCalBp: 1420, probability: 0.834 },
    ],
  },
  { label: 'Sedge Bank: E1', medianCalBp: 2405, hpd68: [{ olderCalBp: 2450, youngerCalBp: 2360, probability: 0.683 }], hpd95: [{ olderCalBp: 2510, youngerCalBp: 2310, probability: 0.954 }] },
];

const attributes = (tag: string) => Object.fromEntries([...tag.matchAll(/([\w-]+)="([^"]*)"/g)].map((m) => [m[1], m[2]]));

/**
 * Read the figure as a reader of the drawing would: the axis from two tick marks and their printed
 * labels, then every bar's ends and every median tick back through that axis into years.
 */
function readBack(svg: string) {
  const tickTexts = [...svg.matchAll(/<text x="([\d.]+)" y="[\d.]+" text-anchor="middle" fill="[^"]+">(-?\d+)<\/text>/g)].map((m) => ({ x: Number(m[1]), calBp: Number(m[2]) }));
  expect(tickTexts.length).toBeGreaterThanOrEqual(2);
  const [a, b] = [tickTexts[0], tickTexts[tickTexts.length - 1]];
  const calBpAt = (px: number) => a.calBp + ((px - a.x) / (b.x - a.x)) * (b.calBp - a.calBp);
  const bars = [...svg.matchAll(/<rect class="(hpd95|hpd68)"[^>]*\/>/g)].map((m) => {
    const at = attributes(m[0]);
    return { kind: m[1], older: calBpAt(Number(at.x)), younger: calBpAt(Number(at.x) + Number(at.width)) };
  });
  const medians = [...svg.matchAll(/<line class="median"[^>]*\/>/g)].map((m) => calBpAt(Number(attributes(m[0]).x1)));
  return { bars, medians, yearsPerPixel: Math.abs((b.calBp - a.calBp) / (b.x - a.x)) };
}

describe('eventAgeFigureSvg', () => {
  const svg = eventAgeFigureSvg({ title: 'Event ages of Tarn Flat', subtitle: 'age model run r1, seed 11', events: EVENTS });

  it('draws every range and median where its table says, read back through the printed axis', () => {
    const { bars, medians, yearsPerPixel } = readBack(svg);
    const expected = EVENTS.flatMap((e) => [...e.hpd95.map((r) => ({ kind: 'hpd95', ...r })), ...e.hpd68.map((r) => ({ kind: 'hpd68', ...r }))]);
    expect(bars).toHaveLength(expected.length);
    // Coordinates are written to 0.01 px: read back within a twentieth of a pixel's worth of years.
    const tolerance = yearsPerPixel * 0.05;
    for (const want of expected) {
      const got = bars.find((bar) => bar.kind === want.kind && Math.abs(bar.older - want.olderCalBp) < tolerance);
      expect(got, `${want.kind} ${want.olderCalBp}`).toBeDefined();
      expect(Math.abs(got!.younger - want.youngerCalBp)).toBeLessThan(tolerance);
    }
    expect(medians.map((m) => Math.round(m))).toEqual(EVENTS.map((e) => e.medianCalBp));
  });

  it('puts older ages on the left, labels the axis with its unit, and escapes text', () => {
    const { bars } = readBack(svg);
    expect(bars.every((bar) => bar.older > bar.younger)).toBe(true);
    expect(svg).toContain('Age (cal BP; calendar year below)');
    expect(svg).toContain('Wren Core: E2 &lt;twin&gt; &amp; co');
    expect(svg).not.toContain('<twin>');
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.trim().endsWith('</svg>')).toBe(true);
  });

  it('prints the calendar year under each tick (1950 - cal BP, no year 0)', () => {
    // 2000 cal BP is 51 BCE [common practice: cal BP counts back from AD 1950, 1 BCE follows 1 CE].
    const wide = eventAgeFigureSvg({ title: 't', subtitle: 's', events: [{ label: 'x', medianCalBp: 2000, hpd68: [], hpd95: [{ olderCalBp: 3000, youngerCalBp: 1000, probability: 0.954 }] }] });
    expect(wide).toMatch(/>2000<\/text>\n<text [^>]*>51 BCE<\/text>/);
    expect(wide).toMatch(/>1000<\/text>\n<text [^>]*>950 CE<\/text>/);
  });
});

describe('figureTicks', () => {
  it('gives round ticks inside the domain, at most eight', () => {
    expect(figureTicks(2600, 430)).toEqual([500, 1000, 1500, 2000, 2500]);
    expect(figureTicks(125, 80)).toEqual([80, 90, 100, 110, 120]);
  });
});

describe('figureEventsOf', () => {
  it('takes the ages of table rows built by ageCells, and leaves rows without ages out', () => {
    const summary = { medianCalBp: 640, hpd68: EVENTS[0].hpd68, hpd95: EVENTS[0].hpd95 };
    const rows = [{ event: 'E3', ...ageCells(summary) }, { event: 'E9', ...ageCells(null) }];
    expect(figureEventsOf(rows, (row) => String(row.event))).toEqual([{ label: 'E3', ...summary }]);
  });
});
