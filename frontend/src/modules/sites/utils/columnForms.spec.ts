import { describe, expect, it } from 'vitest';
import { emptyEventHorizonForm, readEventHorizonForm } from './eventHorizonForm';
import { emptyUnitForm, insertUnitForm, readUnitForm, unitsDisplacedBy } from './unitForm';

// The rules are the domain model's (SPEC.md: units ordered from the base, position 1 oldest;
// an event horizon between the unit below and the unit above; quality 1 to 4) and the server's
// column rules (backend/src/units/column-rules.ts).

const units = [
  { id: 'u1', position: 1, name: 'tidal mud', topDepthM: 1.1, baseDepthM: 2.3, facies: 'TIDAL_MUD' as const },
  { id: 'u2', position: 2, name: 'peat', topDepthM: 0.4, baseDepthM: 1.1, facies: 'PEAT' as const },
];

describe(emptyUnitForm.name, () => {
  it('puts a new unit on top of the youngest, its base at that unit top', () => {
    expect(emptyUnitForm(units)).toMatchObject({ position: '3', baseDepthM: '0.4', topDepthM: '' });
    expect(emptyUnitForm([])).toMatchObject({ position: '1', baseDepthM: '' });
  });
});

describe(insertUnitForm.name, () => {
  // A column with a 0.2 m gap between 1.1 and 1.3 m, and a youngest unit reaching the surface.
  const gapped = [
    { id: 'g1', position: 1, name: 'mud', topDepthM: 1.3, baseDepthM: 2, facies: 'TIDAL_MUD' as const },
    { id: 'g2', position: 2, name: 'peat', topDepthM: 0, baseDepthM: 1.1, facies: 'PEAT' as const },
  ];

  it('above a unit takes the next position up and fills the gap to the younger neighbour', () => {
    expect(insertUnitForm(gapped, gapped[0]!, 'above')).toMatchObject({ position: '2', baseDepthM: '1.3', topDepthM: '1.1' });
  });

  it('below a unit takes its position and fills the gap to the older neighbour', () => {
    expect(insertUnitForm(gapped, gapped[1]!, 'below')).toMatchObject({ position: '2', topDepthM: '1.1', baseDepthM: '1.3' });
  });

  it('leaves the far depth blank where the neighbours touch, and opens below the base unit', () => {
    expect(insertUnitForm(units, units[0]!, 'above')).toMatchObject({ position: '2', baseDepthM: '1.1', topDepthM: '' });
    expect(insertUnitForm(units, units[0]!, 'below')).toMatchObject({ position: '1', topDepthM: '2.3', baseDepthM: '' });
  });

  it('names the units that would move up', () => {
    expect(unitsDisplacedBy(units, 2).map((u) => u.name)).toEqual(['peat']);
    expect(unitsDisplacedBy(units, 3)).toEqual([]);
  });
});

describe(readUnitForm.name, () => {
  it('builds the unit input', () => {
    const result = readUnitForm({ position: '3', name: ' soil ', topDepthM: '0', baseDepthM: '0.4', facies: 'SOIL', basalErosionM: '', notes: '' });
    expect(result).toEqual({
      ok: true,
      input: { position: 3, name: 'soil', topDepthM: 0, baseDepthM: 0.4, facies: 'SOIL', basalErosionM: null, notes: null },
    });
  });

  it('reads an eroded thickness under a bed, from 0 m', () => {
    const bed = { position: '3', name: 'T1', topDepthM: '0.2', baseDepthM: '0.35', facies: 'TURBIDITE' as const, notes: '' };
    expect(readUnitForm({ ...bed, basalErosionM: '0.02' })).toMatchObject({ ok: true, input: { basalErosionM: 0.02 } });
    expect(readUnitForm({ ...bed, basalErosionM: '-0.01' })).toEqual({ ok: false, errors: { basalErosionM: 'must be at least 0' } });
  });

  it('asks for the base below the top and a whole position from 1', () => {
    const result = readUnitForm({ position: '0', name: 'x', topDepthM: '1', baseDepthM: '1', facies: 'SOIL', basalErosionM: '', notes: '' });
    expect(result).toEqual({ ok: false, errors: { position: 'must be at least 1', baseDepthM: 'the base must be deeper than the top' } });
  });
});

describe(emptyEventHorizonForm.name, () => {
  it('proposes the contact between the two youngest units', () => {
    expect(emptyEventHorizonForm(units)).toMatchObject({ unitBelowId: 'u1', unitAboveId: 'u2' });
  });
});

describe(readEventHorizonForm.name, () => {
  const form = {
    name: 'E3',
    unitBelowId: 'u1',
    unitAboveId: 'u2',
    quality: '1',
    evidence: [' buried soil', 'buried soil', ''],
    notes: '',
    subsidenceM: '',
    subsidenceErrorM: '',
    displacementM: '',
    displacementErrorM: '',
  };

  it('builds the horizon input with trimmed, unique evidence tags', () => {
    expect(readEventHorizonForm(form, units)).toEqual({
      ok: true,
      input: {
        name: 'E3',
        unitBelowId: 'u1',
        unitAboveId: 'u2',
        quality: 1,
        evidence: ['buried soil'],
        notes: null,
        subsidenceM: null,
        subsidenceErrorM: null,
        displacementM: null,
        displacementErrorM: null,
      },
    });
  });

  it('reads measured sizes: subsidence may be negative (uplift), errors above 0 and only with their value', () => {
    expect(readEventHorizonForm({ ...form, subsidenceM: '-0.4', subsidenceErrorM: '0.15', displacementM: '2.5', displacementErrorM: '0.5' }, units)).toMatchObject({
      ok: true,
      input: { subsidenceM: -0.4, subsidenceErrorM: 0.15, displacementM: 2.5, displacementErrorM: 0.5 },
    });
    expect(readEventHorizonForm({ ...form, subsidenceM: '0.8', subsidenceErrorM: '0' }, units)).toMatchObject({
      ok: false,
      errors: { subsidenceErrorM: 'must be greater than 0' },
    });
    expect(readEventHorizonForm({ ...form, displacementM: '-1' }, units)).toMatchObject({ ok: false, errors: { displacementM: 'must be at least 0' } });
    expect(readEventHorizonForm({ ...form, displacementErrorM: '0.3' }, units)).toMatchObject({
      ok: false,
      errors: { displacementM: 'give the displacement its error belongs to' },
    });
  });

  it('refuses the same unit on both sides and an upside-down pair', () => {
    expect(readEventHorizonForm({ ...form, unitAboveId: 'u1' }, units)).toMatchObject({
      ok: false,
      errors: { unitAboveId: 'must be a different unit from the one below' },
    });
    expect(readEventHorizonForm({ ...form, unitBelowId: 'u2', unitAboveId: 'u1' }, units)).toMatchObject({
      ok: false,
      errors: { unitAboveId: 'must be younger (higher in the column) than the unit below' },
    });
  });

  it('keeps quality between 1 and 4', () => {
    expect(readEventHorizonForm({ ...form, quality: '5' }, units)).toMatchObject({ ok: false, errors: { quality: 'must be at most 4' } });
  });
});
