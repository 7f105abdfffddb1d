import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { diffSnapshots } from '../releases/release-diff';
import { buildBundle, ProjectRecords } from './bundle-builder';
import { bundleContent, bundleJsonSchema, validateBundle } from './bundle';
import { BUNDLE_TABLE_MAX_ITEMS, ProjectBundle } from './bundle-format';

/** An invented two-site project with every kind of record. */
function records(prefix = ''): ProjectRecords {
  const id = (name: string) => `${prefix}${name}`;
  return {
    project: { name: 'Harlow Reach', description: null, tectonicSetting: 'SUBDUCTION_INTERFACE' },
    segments: [{ id: id('seg'), name: 'North', startKm: 0, endKm: 150, notes: null }],
    sites: [
      { id: id('s2'), segmentId: null, name: 'Tarn core', kind: 'CORE', latitude: -40, longitude: 175, alongStrikeKm: 90, elevationM: null, waterDepthM: 1200, notes: null },
      { id: id('s1'), segmentId: id('seg'), name: 'Bell marsh', kind: 'MARSH', latitude: -41, longitude: 174, alongStrikeKm: 10, elevationM: 2, waterDepthM: null, notes: '=SUM(A1)' },
    ],
    units: [
      { id: id('u2'), siteId: id('s1'), position: 2, name: 'Peat', topDepthM: 0, baseDepthM: 1, facies: 'PEAT', basalErosionM: null, notes: null },
      { id: id('u1'), siteId: id('s1'), position: 1, name: 'Mud', topDepthM: 1, baseDepthM: 2, facies: 'TIDAL_MUD', basalErosionM: null, notes: null },
      { id: id('u3'), siteId: id('s2'), position: 1, name: 'T1', topDepthM: 0, baseDepthM: 0.2, facies: 'TURBIDITE', basalErosionM: null, notes: null },
      { id: id('u4'), siteId: id('s2'), position: 2, name: 'Hemi', topDepthM: 0, baseDepthM: 0.1, facies: 'HEMIPELAGIC_MUD', basalErosionM: 0.02, notes: null },
    ],
    eventHorizons: [
      { id: id('e1'), siteId: id('s1'), name: 'E1', unitBelowId: id('u1'), unitAboveId: id('u2'), quality: 1, evidence: ['subsidence'], notes: null },
      { id: id('e2'), siteId: id('s2'), name: 'T1', unitBelowId: id('u3'), unitAboveId: id('u4'), quality: 2, evidence: [], notes: null },
    ],
    samples: [
      {
        id: id('x1'), siteId: id('s1'), unitId: id('u1'), labCode: 'HX-2', method: 'RADIOCARBON', material: 'IN_SITU_PLANT', depthM: 1.1,
        ageRelation: 'DATES_DEPOSIT', c14Age: 1000, c14Error: 30, delta13C: -27, curve: 'INTCAL20', deltaR: null, deltaRError: null, deltaRSource: null, inheritanceScaleYears: 40,
        calendarAgeBp: null, calendarErrorYears: null, measurementYear: null, excluded: false, exclusionReason: null, notes: null,
      },
    ],
    hypotheses: [{ id: id('h1'), name: 'Long ruptures', description: null, preferred: true, copiedFromId: null }],
    ties: [{ id: id('t1'), hypothesisId: id('h1'), eventAId: id('e1'), eventBId: id('e2'), confidence: 2, evidence: ['age overlap'], note: null }],
  };
}

const AT = new Date('2025-01-02T03:04:05Z');

describe(buildBundle.name, () => {
  it('orders records by content so two databases holding the same data agree', () => {
    const a = buildBundle(records('a-'), AT);
    const b = buildBundle(records('b-'), new Date('2026-01-01T00:00:00Z'));
    expect(a.sites.map((s) => s.name)).toEqual(['Bell marsh', 'Tarn core']);
    expect(a.units.map((u) => u.name)).toEqual(['Mud', 'Peat', 'T1', 'Hemi']);
    expect(bundleContent(a)).toEqual(bundleContent(b));
    expect(a.ties[0]).toMatchObject({ hypothesisRef: 'a-h1', eventARef: 'a-e1', eventBRef: 'a-e2' });
  });

  it('drops a copiedFrom link to a hypothesis outside the project', () => {
    const input = records();
    input.hypotheses[0].copiedFromId = 'elsewhere';
    expect(buildBundle(input, AT).hypotheses[0].copiedFromRef).toBeNull();
  });
});

describe(validateBundle.name, () => {
  const valid = () => buildBundle(records(), AT);

  it('accepts what the builder writes', () => {
    expect(validateBundle(JSON.parse(JSON.stringify(valid())))).toMatchObject({ ok: true });
  });

  it('reads a version 1 bundle (without the version 2 fields) as version 2 with those fields null', () => {
    const v2 = valid();
    const v1 = {
      ...v2,
      version: 1,
      units: v2.units.map(({ basalErosionM: _e, ...u }) => u),
      samples: v2.samples.map(({ deltaRSource: _d, inheritanceScaleYears: _i, ...s }) => s),
    };
    const result = validateBundle(v1);
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.bundle.version).toBe(2);
      expect(result.bundle.units.every((u) => u.basalErosionM === null)).toBe(true);
      expect(result.bundle.samples[0]).toMatchObject({ deltaRSource: null, inheritanceScaleYears: null });
    }
    // A version 1 bundle carrying a version 2 field is refused: the field is not in its version.
    const mixed = validateBundle({ ...v1, units: v2.units });
    expect(mixed.ok).toBe(false);
    if (!mixed.ok) expect(mixed.problems[0]).toMatchObject({ path: 'units[0].basalErosionM', message: 'is not a field of this format version' });
  });

  it('keeps a unit\'s basal erosion and a sample\'s Delta-R source and inheritance scale', () => {
    const result = validateBundle(valid());
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.bundle.units.find((u) => u.facies === 'HEMIPELAGIC_MUD')?.basalErosionM).toBe(0.02);
      expect(result.bundle.samples[0].inheritanceScaleYears).toBe(40);
    }
    const bad = validateBundle({ ...valid(), samples: valid().samples.map((s) => ({ ...s, inheritanceScaleYears: 0.5 })) });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.problems[0].path).toBe('samples[0].inheritanceScaleYears');
  });

  it('refuses another format or version', () => {
    const result = validateBundle({ ...valid(), format: 'other', version: 3 });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems.map((p) => p.path)).toEqual(['format', 'version']);
  });

  it('reports field problems with their paths', () => {
    const bundle = valid() as unknown as Record<string, unknown[]>;
    (bundle.sites[0] as Record<string, unknown>).latitude = 91;
    (bundle.units[0] as Record<string, unknown>).facies = 'LAVA';
    delete (bundle.samples[0] as Record<string, unknown>).notes;
    (bundle.ties[0] as Record<string, unknown>).extra = 1;
    const result = validateBundle(bundle);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.problems.map((p) => p.path)).toEqual(['sites[0].latitude', 'units[0].facies', 'samples[0].notes', 'ties[0].extra']);
    }
  });

  it('refuses __proto__ and constructor keys as unknown fields (issue 17: `in` took them for fields)', () => {
    const text = JSON.stringify(valid()).replace('"ref":"s1"', '"__proto__":{"x":1},"constructor":"y","ref":"s1"');
    const result = validateBundle(JSON.parse(text));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems.map((p) => p.path)).toEqual(['sites[0].__proto__', 'sites[0].constructor']);
  });

  it('refuses a table above its record cap and an age error above 20,000 years', () => {
    const bundle = valid();
    bundle.ties = Array.from({ length: BUNDLE_TABLE_MAX_ITEMS.ties + 1 }, () => bundle.ties[0]);
    const capped = validateBundle(bundle);
    expect(capped.ok).toBe(false);
    if (!capped.ok) expect(capped.problems[0]).toEqual({ path: 'ties', message: `holds ${BUNDLE_TABLE_MAX_ITEMS.ties + 1} records; a bundle may hold at most ${BUNDLE_TABLE_MAX_ITEMS.ties}` });
    const wide = valid();
    wide.samples[0].c14Error = 100_000;
    const result = validateBundle(wide);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems).toEqual([{ path: 'samples[0].c14Error', message: 'must be at most 20000' }]);
  });

  it('checks the rules between records', () => {
    const bundle: ProjectBundle = valid();
    bundle.units[1].position = 1; // duplicate position at Bell marsh
    bundle.eventHorizons[1].unitBelowRef = bundle.units[0].ref; // a unit of another site
    bundle.samples[0].curve = null; // radiocarbon without a curve
    bundle.ties[0].eventBRef = 'nowhere';
    bundle.hypotheses.push({ ...bundle.hypotheses[0], ref: 'h2' }); // two preferred
    const result = validateBundle(bundle);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.problems.map((p) => p.path).sort()).toEqual(
        ['eventHorizons[1].unitBelowRef', 'hypotheses', 'samples[0].curve', 'ties[0].eventBRef', 'units[1].position'].sort(),
      );
    }
  });
});

describe(bundleJsonSchema.name, () => {
  it('is what bundle.schema.json holds', () => {
    const file = JSON.parse(readFileSync(join(__dirname, 'bundle.schema.json'), 'utf8'));
    expect(file).toEqual(bundleJsonSchema());
  });

  it('requires every field the builder writes, in each table', () => {
    const schema = bundleJsonSchema() as { $defs: Record<string, { required: string[] }>; required: string[] };
    const bundle = valid();
    expect([...schema.required].sort()).toEqual(Object.keys(bundle).sort());
    for (const table of ['segments', 'sites', 'units', 'eventHorizons', 'samples', 'hypotheses', 'ties'] as const) {
      expect([...schema.$defs[table].required].sort()).toEqual(Object.keys(bundle[table][0]).sort());
    }
  });

  function valid() {
    return buildBundle(records(), AT);
  }
});

describe(diffSnapshots.name, () => {
  it('lists a renamed site as changed, a new sample as added and a deleted tie as removed', () => {
    const from = buildBundle(records(), AT);
    const to = structuredClone(from);
    to.sites[0].name = 'Bell marsh west';
    to.samples.push({ ...to.samples[0], ref: 'x2', labCode: 'HX-3' });
    to.ties = [];
    expect(diffSnapshots(from, to)).toEqual([
      { objectType: 'site', objectId: 's1', label: 'Bell marsh west', change: 'changed', fields: ['name'] },
      { objectType: 'sample', objectId: 'x2', label: 'HX-3', change: 'added', fields: [] },
      { objectType: 'tie', objectId: 't1', label: 'E1 – T1', change: 'removed', fields: [] },
    ]);
  });

  it('finds nothing between a snapshot and itself', () => {
    const bundle = buildBundle(records(), AT);
    expect(diffSnapshots(bundle, structuredClone(bundle))).toEqual([]);
  });
});
