import { describe, expect, it } from 'vitest';
import { fitMapProjection, MIN_SPAN_DEGREES, nearAndFarSites, positionAtKm, segmentTrackLine, siteBounds, siteTrack, smoothTrack, type MapSite } from './mapGeometry';

// An invented margin: four sites along a coast running roughly north-south.
const SITES: MapSite[] = [
  { id: 'a', longitude: -124.1, latitude: 46.0, alongStrikeKm: 0 },
  { id: 'b', longitude: -124.0, latitude: 44.0, alongStrikeKm: 220 },
  { id: 'c', longitude: -124.3, latitude: 42.0, alongStrikeKm: 440 },
  { id: 'd', longitude: -125.2, latitude: 42.1, alongStrikeKm: 440 },
];

describe(siteBounds.name, () => {
  it('pads the box by the given fraction of its span on each side', () => {
    const bounds = siteBounds(SITES, 0.1);
    // latitude span 4 degrees -> 4.8 with 10 % each side, centred on 44.
    expect(bounds.south).toBeCloseTo(41.6, 10);
    expect(bounds.north).toBeCloseTo(46.4, 10);
    // longitude span 1.2 -> 1.44, but widened to the minimum span about the centre -124.6.
    expect(bounds.east - bounds.west).toBeCloseTo(MIN_SPAN_DEGREES, 10);
    expect((bounds.east + bounds.west) / 2).toBeCloseTo(-124.6, 10);
  });

  it('gives one site the minimum span around it', () => {
    const bounds = siteBounds([{ longitude: 10, latitude: 20 }]);
    expect(bounds).toEqual({ west: 10 - MIN_SPAN_DEGREES / 2, east: 10 + MIN_SPAN_DEGREES / 2, south: 20 - MIN_SPAN_DEGREES / 2, north: 20 + MIN_SPAN_DEGREES / 2 });
  });

  it('shows the world when there are no sites', () => {
    expect(siteBounds([]).west).toBe(-180);
  });
});

describe(fitMapProjection.name, () => {
  it('puts every site inside the frame less its margin', () => {
    const projection = fitMapProjection(SITES, 800, 400, 30);
    for (const site of SITES) {
      const [x, y] = projection([site.longitude, site.latitude]) ?? [NaN, NaN];
      expect(x).toBeGreaterThanOrEqual(30);
      expect(x).toBeLessThanOrEqual(770);
      expect(y).toBeGreaterThanOrEqual(30);
      expect(y).toBeLessThanOrEqual(370);
    }
  });

  it('draws north up and east right (Mercator: y falls as latitude rises)', () => {
    const projection = fitMapProjection(SITES, 800, 400);
    const north = projection([-124, 46]) ?? [0, 0];
    const south = projection([-124, 42]) ?? [0, 0];
    const east = projection([-123, 44]) ?? [0, 0];
    const west = projection([-125, 44]) ?? [0, 0];
    expect(north[1]).toBeLessThan(south[1]);
    expect(east[0]).toBeGreaterThan(west[0]);
  });

  it('centres a single site in the frame', () => {
    const projection = fitMapProjection([{ id: 'x', longitude: 30, latitude: -10, alongStrikeKm: 0 }], 600, 300, 20);
    const [x, y] = projection([30, -10]) ?? [NaN, NaN];
    expect(x).toBeCloseTo(300, 6);
    // The box is centred in degrees; Mercator stretches its poleward half a little more
    // (y grows as ln tan(pi/4 + lat/2)), so the site sits a fraction of a pixel off centre.
    expect(Math.abs(y - 150)).toBeLessThan(0.5);
  });

  it('fills the limiting dimension: the padded latitude range spans the inner height (a tall margin in a wide frame)', () => {
    const projection = fitMapProjection(SITES, 800, 400, 20);
    const bounds = siteBounds(SITES);
    const top = projection([-124.6, bounds.north]) ?? [0, 0];
    const bottom = projection([-124.6, bounds.south]) ?? [0, 0];
    expect(bottom[1] - top[1]).toBeCloseTo(360, 4);
  });
});

describe(siteTrack.name, () => {
  it('orders by along-strike km and averages sites at the same km', () => {
    const track = siteTrack(SITES);
    expect(track.map((point) => point.km)).toEqual([0, 220, 440]);
    expect(track[2]?.position[0]).toBeCloseTo(-124.75, 10);
    expect(track[2]?.position[1]).toBeCloseTo(42.05, 10);
  });
});

describe(positionAtKm.name, () => {
  const track = siteTrack(SITES);

  it('interpolates linearly between track points', () => {
    const [lon, lat] = positionAtKm(track, 110) ?? [NaN, NaN];
    expect(lon).toBeCloseTo(-124.05, 10);
    expect(lat).toBeCloseTo(45.0, 10);
  });

  it('extrapolates beyond the ends from the two nearest points', () => {
    const [, latNorth] = positionAtKm(track, -110) ?? [NaN, NaN];
    expect(latNorth).toBeCloseTo(47.0, 10);
    const [, latSouth] = positionAtKm(track, 660) ?? [NaN, NaN];
    expect(latSouth).toBeCloseTo(42.05 - (44 - 42.05), 10);
  });

  it('hits track points exactly', () => {
    expect(positionAtKm(track, 220)).toEqual([-124.0, 44.0]);
  });

  it('has nothing without a track, and one point for a one-point track', () => {
    expect(positionAtKm([], 5)).toBeNull();
    expect(positionAtKm([{ km: 3, position: [1, 2] }], 500)).toEqual([1, 2]);
  });
});

describe(segmentTrackLine.name, () => {
  const track = siteTrack(SITES);

  it('runs from the start km through the inner track points to the end km', () => {
    const line = segmentTrackLine(track, 110, 330);
    expect(line).toHaveLength(3);
    expect(line[1]).toEqual([-124.0, 44.0]);
    expect(line[0]?.[1]).toBeCloseTo(45.0, 10);
    expect(line[2]?.[1]).toBeCloseTo(43.025, 10);
  });

  it('reads a reversed extent the same way and gives nothing for an empty one', () => {
    expect(segmentTrackLine(track, 330, 110)).toEqual(segmentTrackLine(track, 110, 330));
    expect(segmentTrackLine(track, 100, 100)).toEqual([]);
    expect(segmentTrackLine([], 0, 100)).toEqual([]);
  });
});

describe(smoothTrack.name, () => {
  it('keeps a straight track exactly, ends included (local linear fit is exact for linear data)', () => {
    const straight = [0, 50, 120, 300, 410].map((km) => ({ km, position: [-120 + km / 100, 40 - km / 200] as const }));
    const smoothed = smoothTrack(straight, 80);
    smoothed.forEach((point, index) => {
      expect(point.position[0]).toBeCloseTo(straight[index]?.position[0] ?? NaN, 9);
      expect(point.position[1]).toBeCloseTo(straight[index]?.position[1] ?? NaN, 9);
    });
  });

  it('pulls a zigzag across the coast towards its centre line', () => {
    // Sites alternate 0.5 degrees either side of longitude -124 every 50 km.
    const zigzag = [0, 50, 100, 150, 200, 250, 300].map((km, index) => ({ km, position: [-124 + (index % 2 === 0 ? 0.5 : -0.5), 44 - km / 100] as const }));
    const smoothed = smoothTrack(zigzag, 60);
    const interior = smoothed.slice(1, -1);
    for (const point of interior) expect(Math.abs(point.position[0] + 124)).toBeLessThan(0.25);
    // Latitude is linear in km and so kept.
    interior.forEach((point) => expect(point.position[1]).toBeCloseTo(44 - point.km / 100, 9));
  });

  it('leaves tracks of fewer than three points as they are', () => {
    const two = [
      { km: 0, position: [1, 2] as const },
      { km: 10, position: [3, 4] as const },
    ];
    expect(smoothTrack(two)).toEqual(two);
  });
});

describe(nearAndFarSites.name, () => {
  const margin: MapSite[] = Array.from({ length: 8 }, (_, index) => ({ id: `s${index}`, longitude: 176 + index * 0.3, latitude: -39 + index * 0.4, alongStrikeKm: index * 40 }));

  it('leaves a site half a world away out of the fit, so the margin keeps its spread', () => {
    const distant = { id: 'far', longitude: 10, latitude: 50, alongStrikeKm: 400 };
    const { near, far } = nearAndFarSites([...margin, distant]);
    expect(far.map((site) => site.id)).toEqual(['far']);
    expect(near).toHaveLength(8);
    // Fitted to the near sites, the margin spans most of a 600 px frame, not a few pixels.
    const projection = fitMapProjection(near, 600, 400, 24);
    const xs = near.map((site) => projection([site.longitude, site.latitude])?.[0] ?? NaN);
    expect(Math.max(...xs) - Math.min(...xs)).toBeGreaterThan(150);
  });

  it('keeps every site of a compact project', () => {
    expect(nearAndFarSites(margin).far).toEqual([]);
  });
});

describe('fitMapProjection with band ends', () => {
  it('keeps points beyond the outermost sites (segment band ends) inside the margin', () => {
    const sites: MapSite[] = [
      { id: 'a', longitude: 176, latitude: -39, alongStrikeKm: 100 },
      { id: 'b', longitude: 177, latitude: -38, alongStrikeKm: 200 },
    ];
    const bandEnd = [178.5, -36.5] as const;
    const projection = fitMapProjection(sites, 500, 300, 24, [bandEnd]);
    const [x, y] = projection([bandEnd[0], bandEnd[1]]) ?? [NaN, NaN];
    expect(x).toBeGreaterThanOrEqual(24);
    expect(x).toBeLessThanOrEqual(500 - 24);
    expect(y).toBeGreaterThanOrEqual(24);
    expect(y).toBeLessThanOrEqual(300 - 24);
  });
});
