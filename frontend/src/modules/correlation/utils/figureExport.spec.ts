import { describe, expect, it } from 'vitest';
import { figureDocument, figureFileName, svgDocumentText, wrapWords } from './figureExport';

describe(svgDocumentText.name, () => {
  const markup = '<svg width="640" height="400" class="sc-chart" role="img"><g><path d="M0 0L1 1" fill="#8a6d4b"></path></g></svg>';

  it('makes a stand-alone document with namespaces, size, viewBox and a background first', () => {
    const text = svgDocumentText(markup, { width: 800, height: 500, title: 'Ladder A & B' });
    expect(text.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(text).toContain('width="800" height="500" viewBox="0 0 800 500"');
    expect(text).not.toContain('width="640"');
    expect(text).toContain('class="sc-chart" role="img"');
    expect(text).toContain('<title>Ladder A &amp; B</title>');
    expect(text.indexOf('<rect x="0" y="0" width="800" height="500" fill="#ffffff"/>')).toBeLessThan(text.indexOf('<path'));
    expect(text.trimEnd().endsWith('</g></svg>')).toBe(true);
  });

  it('keeps a single xmlns when the markup already has one, and parses as XML', async () => {
    const text = svgDocumentText('<svg xmlns="http://www.w3.org/2000/svg"><text class="num">1 &lt; 2</text></svg>', {
      width: 10,
      height: 10,
      background: null,
    });
    expect(text.match(/xmlns="/g)).toHaveLength(1);
    expect(text).not.toContain('<rect');
    // Well-formedness check without a DOM: every opened element is closed in order.
    const stack: string[] = [];
    for (const [, closing, name, selfClosing] of text.matchAll(/<(\/?)([a-zA-Z][\w:-]*)[^>]*?(\/?)>/g)) {
      if (closing) expect(stack.pop()).toBe(name);
      else if (!selfClosing) stack.push(name!);
    }
    expect(stack).toEqual([]);
  });

  it('refuses markup that is not an svg element', () => {
    expect(() => svgDocumentText('<div></div>', { width: 1, height: 1 })).toThrow(/not an <svg>/);
  });
});

describe(figureFileName.name, () => {
  it('turns a title into a safe file name', () => {
    expect(figureFileName('Event ladder — Velmora Margin (Hypothèse 2)', 'png')).toBe('event-ladder-velmora-margin-hypothese-2.png');
    expect(figureFileName('***', 'svg')).toBe('figure.svg');
  });
});

describe(figureDocument.name, () => {
  const chart = '<svg width="300" height="200" role="img"><text x="280" y="10">Eastern trench</text></svg>';

  it('puts the title above the chart and the caption, wrapped, beneath it', () => {
    const { text, width, height } = figureDocument(chart, {
      width: 300, height: 200, title: 'Event ladder · Demo', caption: 'Ages in cal BP (before 1950 CE). Bands: combined 95.4 % ranges of regional events.',
    });
    expect(width).toBe(316);
    expect(text).toContain('font-weight="600" fill="#1c2127">Event ladder · Demo</text>');
    const captions = [...text.matchAll(/font-size="11" fill="#5f6b7c">([^<]*)</g)].map((m) => m[1]);
    expect(captions.join(' ')).toBe('Ages in cal BP (before 1950 CE). Bands: combined 95.4 % ranges of regional events.');
    expect(captions.length).toBeGreaterThan(1);
    expect(height).toBeGreaterThan(200 + 30 + captions.length * 14);
  });

  it('grows the frame to hold a label drawn past the right edge, so it is not cut', () => {
    const { text } = figureDocument(chart, { width: 300, height: 200, title: 'T', drawn: { x: 0, y: 0, width: 352, height: 200 } });
    const inner = /<svg x="8" y="30" width="(\d+)" height="(\d+)" viewBox="([^"]+)"/.exec(text);
    expect(Number(inner![1])).toBeGreaterThanOrEqual(352);
    expect(inner![3]!.split(' ').map(Number)[2]).toBeGreaterThanOrEqual(352);
  });
});

describe(wrapWords.name, () => {
  it('breaks at word boundaries within the limit', () => {
    expect(wrapWords('one two three four', 9)).toEqual(['one two', 'three', 'four']);
  });
});
