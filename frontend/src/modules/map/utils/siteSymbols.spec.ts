import { describe, expect, it } from 'vitest';
import { isMarineSite, MARINE_FILL, SITE_KIND_ORDER, SITE_SYMBOLS, siteFill, siteSymbolPath } from './siteSymbols';

describe(isMarineSite.name, () => {
  it('counts cores and any site with a water depth as marine', () => {
    expect(isMarineSite({ kind: 'CORE' })).toBe(true);
    expect(isMarineSite({ kind: 'LAKE', waterDepthM: 12 })).toBe(true);
    expect(isMarineSite({ kind: 'MARSH', waterDepthM: null })).toBe(false);
  });
});

describe(siteFill.name, () => {
  it('draws marine sites in the sea tone and land sites in their kind’s tone', () => {
    expect(siteFill({ kind: 'CORE' })).toBe(MARINE_FILL);
    expect(siteFill({ kind: 'TRENCH' })).toBe(SITE_SYMBOLS.TRENCH.fill);
    expect(siteFill({ kind: 'OUTCROP', waterDepthM: 40 })).toBe(MARINE_FILL);
  });
});

describe(siteSymbolPath.name, () => {
  it('gives every kind its own closed shape', () => {
    const paths = SITE_KIND_ORDER.map(siteSymbolPath);
    expect(new Set(paths).size).toBe(SITE_KIND_ORDER.length);
    // d3 draws polygons closed with Z and the circle as two arcs back to its start.
    for (const path of paths) expect(path).toMatch(/^M.*(Z|A[^A]*,0)$/i);
  });
});
