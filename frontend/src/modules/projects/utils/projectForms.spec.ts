import { describe, expect, it } from 'vitest';
import { readSegmentForm } from './segmentForm';
import { EMPTY_SITE_FORM, readSiteForm } from './siteForm';

// Ranges: WGS84 latitude -90..90 and longitude -180..180 (the datum's definition); a segment's
// extent must end after it starts (the server's segments_extent_ordered rule).

describe(readSegmentForm.name, () => {
  it('builds a segment input', () => {
    expect(readSegmentForm({ name: 'North', startKm: '0', endKm: '210', downDipWidthKm: '', notes: '' })).toEqual({
      ok: true,
      input: { name: 'North', startKm: 0, endKm: 210, downDipWidthKm: null, notes: null },
    });
  });

  it('takes a down-dip width above 0 and at most 1,000 km (the server rule)', () => {
    expect(readSegmentForm({ name: 'North', startKm: '0', endKm: '210', downDipWidthKm: '85', notes: '' })).toMatchObject({
      ok: true,
      input: { downDipWidthKm: 85 },
    });
    expect(readSegmentForm({ name: 'North', startKm: '0', endKm: '210', downDipWidthKm: '0', notes: '' })).toMatchObject({
      ok: false,
      errors: { downDipWidthKm: 'must be greater than 0' },
    });
    expect(readSegmentForm({ name: 'North', startKm: '0', endKm: '210', downDipWidthKm: '1200', notes: '' })).toMatchObject({ ok: false });
  });

  it('asks for an extent that ends after it starts', () => {
    expect(readSegmentForm({ name: 'North', startKm: '210', endKm: '0', downDipWidthKm: '', notes: '' })).toEqual({
      ok: false,
      errors: { endKm: 'must be greater than the start' },
    });
  });
});

describe(readSiteForm.name, () => {
  const site = { ...EMPTY_SITE_FORM, name: 'Skarrow Marsh', latitude: '-41.2', longitude: '174.9', alongStrikeKm: '132.5' };

  it('builds a site input, with no segment as null', () => {
    expect(readSiteForm(site)).toEqual({
      ok: true,
      input: expect.objectContaining({ name: 'Skarrow Marsh', segmentId: null, latitude: -41.2, waterDepthM: null }),
    });
  });

  it('keeps coordinates on the globe and water depths positive', () => {
    expect(readSiteForm({ ...site, latitude: '91', longitude: '-181', waterDepthM: '-3' })).toEqual({
      ok: false,
      errors: { latitude: 'must be at most 90', longitude: 'must be at least -180', waterDepthM: 'must be at least 0' },
    });
  });
});
