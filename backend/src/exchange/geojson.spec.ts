import { describe, expect, it } from 'vitest';
import { pointCoordinates, sitesFeatureCollection } from './geojson';

const site = { id: 's1', name: 'Ashwick marsh', kind: 'MARSH', latitude: -41.25, longitude: 174.75, alongStrikeKm: 212.5, segment: 'Central' };

describe(sitesFeatureCollection.name, () => {
  it('writes [longitude, latitude] per RFC 7946 section 3.1.1 and the site properties', () => {
    const collection = sitesFeatureCollection([site]);
    expect(collection).toEqual({
      type: 'FeatureCollection',
      features: [
        {
          type: 'Feature',
          id: 's1',
          geometry: { type: 'Point', coordinates: [174.75, -41.25] },
          properties: { name: 'Ashwick marsh', kind: 'MARSH', alongStrikeKm: 212.5, segment: 'Central' },
        },
      ],
    });
  });

  it('has no crs member (RFC 7946 section 4 removed it) and survives a JSON round trip', () => {
    const collection = JSON.parse(JSON.stringify(sitesFeatureCollection([site, { ...site, id: 's2', segment: null }])));
    expect(collection).not.toHaveProperty('crs');
    expect(collection.features[1].properties.segment).toBeNull();
  });

  it('gives an empty collection for no sites', () => {
    expect(sitesFeatureCollection([])).toEqual({ type: 'FeatureCollection', features: [] });
  });
});

describe(pointCoordinates.name, () => {
  it('accepts the edges of the WGS84 range and refuses beyond them', () => {
    expect(pointCoordinates(90, -180)).toEqual([-180, 90]);
    expect(() => pointCoordinates(90.5, 0)).toThrow(RangeError);
    expect(() => pointCoordinates(0, 180.01)).toThrow(RangeError);
    expect(() => pointCoordinates(Number.NaN, 0)).toThrow(RangeError);
  });
});
