import { describe, expect, it } from 'vitest';
import { emptyEventHorizonForm, readEventHorizonForm } from './eventHorizonForm';
import { emptyUnitForm, readUnitForm } from './unitForm';

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
  const form = { name: 'E3', unitBelowId: 'u1', unitAboveId: 'u2', quality: '1', evidence: [' buried soil', 'buried soil', ''], notes: '' };

  it('builds the horizon input with trimmed, unique evidence tags', () => {
    expect(readEventHorizonForm(form, units)).toEqual({
      ok: true,
      input: { name: 'E3', unitBelowId: 'u1', unitAboveId: 'u2', quality: 1, evidence: ['buried soil'], notes: null },
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
