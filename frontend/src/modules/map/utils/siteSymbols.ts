import { symbol, symbolCircle, symbolDiamond, symbolSquare, symbolTriangle, symbolWye, type SymbolType } from 'd3';
import type { SiteKind } from '@/gql/graphql';

/** How a kind of site is drawn on the map: a shape and a sediment tone of Stratochron's own. */
export type SiteSymbol = { shape: SymbolType; fill: string; label: string };

/** Sites under water are drawn in the sea tone, whatever their shape. */
export const MARINE_FILL = '#2f6f8f';

export const SITE_SYMBOLS: Record<SiteKind, SiteSymbol> = {
  TRENCH: { shape: symbolSquare, fill: '#a0522d', label: 'Trench' },
  OUTCROP: { shape: symbolTriangle, fill: '#b07d2b', label: 'Outcrop' },
  MARSH: { shape: symbolDiamond, fill: '#6b6b3a', label: 'Marsh' },
  LAKE: { shape: symbolWye, fill: '#5e4633', label: 'Lake' },
  CORE: { shape: symbolCircle, fill: MARINE_FILL, label: 'Core' },
};

export const SITE_KIND_ORDER: readonly SiteKind[] = ['TRENCH', 'OUTCROP', 'MARSH', 'LAKE', 'CORE'];

/** Marker area in square pixels (d3 symbol size). */
export const MARKER_AREA = 90;

/** Whether a site is marine: a core, or any site with a water depth. */
export function isMarineSite(site: { kind: SiteKind; waterDepthM?: number | null }): boolean {
  return site.kind === 'CORE' || (site.waterDepthM !== null && site.waterDepthM !== undefined);
}

const pathCache = new Map<SymbolType, string>();

/** The SVG path of a kind's marker centred on 0,0. */
export function siteSymbolPath(kind: SiteKind): string {
  const shape = SITE_SYMBOLS[kind].shape;
  let path = pathCache.get(shape);
  if (!path) {
    path = symbol(shape, MARKER_AREA)() ?? '';
    pathCache.set(shape, path);
  }
  return path;
}

/** The tone a site is drawn in. */
export function siteFill(site: { kind: SiteKind; waterDepthM?: number | null }): string {
  return isMarineSite(site) ? MARINE_FILL : SITE_SYMBOLS[site.kind].fill;
}

/** Tones for segment bands along the track, alternating so neighbours stay apart. */
export const SEGMENT_TONES = ['#c9a25e', '#8a8478', '#b8866b', '#7d8a6a'] as const;
