import { describe, expect, it } from 'vitest';
import { profileSeries, quantitiesOf, valueExtent, type SizePoint } from '@/modules/correlation/utils/sizeProfile';

const point = (km: number | null, values: Partial<SizePoint>): SizePoint => ({
  eventHorizon: { id: `e${km}`, name: `E${km}` },
  site: { id: `s${km}`, name: `Site ${km}` },
  alongStrikeKm: km,
  ...values,
});

const POINTS = [
  point(120, { subsidenceM: 0.8, subsidenceErrorM: 0.2 }),
  point(40, { subsidenceM: -0.3, subsidenceErrorM: 0.1, displacementM: 2 }),
  point(80, { bedThicknessM: 0.12 }),
  point(null, { subsidenceM: 1 }),
];

describe('profileSeries', () => {
  it('keeps the members measuring the quantity, along strike, with their errors', () => {
    expect(profileSeries(POINTS, 'subsidence')).toEqual([
      { km: 40, value: -0.3, error: 0.1, siteName: 'Site 40', eventName: 'E40' },
      { km: 120, value: 0.8, error: 0.2, siteName: 'Site 120', eventName: 'E120' },
    ]);
    expect(profileSeries(POINTS, 'displacement')).toEqual([{ km: 40, value: 2, error: null, siteName: 'Site 40', eventName: 'E40' }]);
    expect(profileSeries(POINTS, 'bedThickness').map((p) => p.value)).toEqual([0.12]);
    expect(quantitiesOf(POINTS)).toEqual(['subsidence', 'displacement', 'bedThickness']);
    expect(quantitiesOf([point(10, {})])).toEqual([]);
  });
});

describe('valueExtent', () => {
  it('spans zero and every error bar', () => {
    const [low, high] = valueExtent(profileSeries(POINTS, 'subsidence'));
    expect(low).toBeLessThan(-0.4);
    expect(high).toBeGreaterThan(1.0);
    const [zeroLow] = valueExtent([{ km: 0, value: 0.5, error: 0.1, siteName: '', eventName: '' }]);
    expect(zeroLow).toBe(0);
  });
});
