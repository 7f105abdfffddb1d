/**
 * Sites as GeoJSON (RFC 7946): a FeatureCollection of Point features whose coordinates are
 * [longitude, latitude] in WGS84 decimal degrees (section 3.1.1: "longitude, latitude" order;
 * section 4: WGS84 is the only coordinate reference system, so there is no `crs` member).
 */

export interface GeoJsonSite {
  id: string;
  name: string;
  kind: string;
  latitude: number;
  longitude: number;
  alongStrikeKm: number;
  segment: string | null;
}

export interface SiteFeature {
  type: 'Feature';
  id: string;
  geometry: { type: 'Point'; coordinates: [number, number] };
  properties: { name: string; kind: string; alongStrikeKm: number; segment: string | null };
}

export interface SiteFeatureCollection {
  type: 'FeatureCollection';
  features: SiteFeature[];
}

/** The RFC 7946 media type (section 12). */
export const GEOJSON_MEDIA_TYPE = 'application/geo+json';

/** A site position as GeoJSON coordinates; throws on a position outside WGS84's range. */
export function pointCoordinates(latitude: number, longitude: number): [number, number] {
  if (!Number.isFinite(latitude) || latitude < -90 || latitude > 90) throw new RangeError(`latitude ${latitude} is outside -90..90`);
  if (!Number.isFinite(longitude) || longitude < -180 || longitude > 180) throw new RangeError(`longitude ${longitude} is outside -180..180`);
  return [longitude, latitude];
}

/** The sites of a project as a FeatureCollection, one Point feature per site in the order given. */
export function sitesFeatureCollection(sites: readonly GeoJsonSite[]): SiteFeatureCollection {
  return {
    type: 'FeatureCollection',
    features: sites.map((site) => ({
      type: 'Feature',
      id: site.id,
      geometry: { type: 'Point', coordinates: pointCoordinates(site.latitude, site.longitude) },
      properties: { name: site.name, kind: site.kind, alongStrikeKm: site.alongStrikeKm, segment: site.segment },
    })),
  };
}
