import { describe, expect, it } from 'vitest';
import { BUNDLE_FORMAT, ProjectBundle } from './bundle-format';
import { tableCsv } from './csv-tables';

const bundle: ProjectBundle = {
  format: BUNDLE_FORMAT, version: 2, exportedAt: '2025-01-01T00:00:00.000Z',
  project: { name: 'P', description: null, tectonicSetting: 'CRUSTAL' },
  segments: [],
  sites: [{ ref: 's1', segmentRef: null, name: 'Dry, "old" pit', kind: 'TRENCH', latitude: 10.5, longitude: -3, alongStrikeKm: -12, elevationM: null, waterDepthM: null, notes: '=HYPERLINK("x")' }],
  units: [], eventHorizons: [], samples: [], hypotheses: [], ties: [],
};

describe(tableCsv.name, () => {
  it('quotes per RFC 4180, keeps negative numbers and neutralises a formula in text', () => {
    const lines = tableCsv(bundle, 'sites').split('\r\n');
    expect(lines[0]).toBe('id,name,kind,latitude,longitude,along_strike_km,elevation_m,water_depth_m,segment_id,segment,notes');
    expect(lines[1]).toBe(`s1,"Dry, ""old"" pit",TRENCH,10.5,-3,-12,,,,,"'=HYPERLINK(""x"")"`);
    expect(lines[2]).toBe('');
  });

  it('writes a header only for an empty table', () => {
    expect(tableCsv(bundle, 'ties')).toBe('id,hypothesis_id,hypothesis,event_a_id,event_a,event_b_id,event_b,confidence,evidence,note\r\n');
  });
});
