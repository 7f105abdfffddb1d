import { describe, expect, it } from 'vitest';
import { emptySampleForm, methodFields, readSampleForm, sampleFormFrom, withMaterial, type SampleFormValues } from './sampleForm';

// Expected fields per method follow the API contract (schema.graphql, Sample): 14C age, error,
// delta13C, curve and Delta-R for radiocarbon; age before the measurement year, error and the
// year for luminescence; centre and half-width for historical and tephra ties. Limits are the
// server's (backend/src/samples/dto/create-sample.input.ts).

const units = [{ id: 'u1', name: 'peat', topDepthM: 1.0, baseDepthM: 1.5 }];
const form = (overrides: Partial<SampleFormValues>): SampleFormValues => ({ ...emptySampleForm('u1'), labCode: 'VKR-1', ...overrides });

describe(methodFields.name, () => {
  it('asks Delta-R only of radiocarbon on a marine curve', () => {
    expect(methodFields('RADIOCARBON', 'INTCAL20')).toEqual(['c14Age', 'c14Error', 'delta13C', 'curve']);
    expect(methodFields('RADIOCARBON', 'MARINE20')).toEqual(['c14Age', 'c14Error', 'delta13C', 'curve', 'deltaR', 'deltaRError', 'deltaRSource']);
  });

  it('asks luminescence for its measurement year, and ties for a centre and half-width', () => {
    expect(methodFields('LUMINESCENCE', '')).toEqual(['calendarAgeBp', 'calendarErrorYears', 'measurementYear']);
    expect(methodFields('TEPHRA', '')).toEqual(['calendarAgeBp', 'calendarErrorYears']);
  });
});

describe(readSampleForm.name, () => {
  it('builds a radiocarbon input and nulls the fields of other methods', () => {
    const result = readSampleForm(form({ c14Age: '1835', c14Error: '25', depthM: '1,42', calendarAgeBp: '99' }), units);
    expect(result).toEqual({
      ok: true,
      input: expect.objectContaining({
        labCode: 'VKR-1',
        c14Age: 1835,
        c14Error: 25,
        depthM: 1.42,
        curve: 'INTCAL20',
        deltaR: null,
        calendarAgeBp: null,
        measurementYear: null,
        exclusionReason: null,
        notes: null,
      }),
    });
  });

  it('names every missing radiocarbon value at once', () => {
    const result = readSampleForm(form({ labCode: '', curve: '' }), units);
    expect(result).toEqual({
      ok: false,
      errors: { labCode: 'required', c14Age: 'required', c14Error: 'required', curve: 'choose a calibration curve' },
    });
  });

  it('refuses a zero 14C error, a negative age and characters the server refuses', () => {
    const result = readSampleForm(form({ labCode: 'VKR#1', c14Age: '-5', c14Error: '0' }), units);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(Object.keys(result.errors).sort()).toEqual(['c14Age', 'c14Error', 'labCode']);
    }
  });

  it('refuses a depth outside the unit, beyond the 5 mm the server tolerates', () => {
    const outside = readSampleForm(form({ c14Age: '1', c14Error: '1', depthM: '1.6' }), units);
    expect(outside.ok ? null : outside.errors.depthM).toBe('outside unit peat (1–1.5 m)');
    expect(readSampleForm(form({ c14Age: '1', c14Error: '1', depthM: '1.504' }), units).ok).toBe(true);
  });

  it('keeps Delta-R for a marine curve and asks for Delta-R when only its error is given', () => {
    const marine = readSampleForm(form({ curve: 'MARINE20', c14Age: '2410', c14Error: '30', deltaR: '-40', deltaRError: '55' }), units);
    expect(marine.ok && marine.input.deltaR).toBe(-40);
    const halfGiven = readSampleForm(form({ curve: 'MARINE20', c14Age: '2410', c14Error: '30', deltaRError: '55' }), units);
    expect(halfGiven.ok ? null : halfGiven.errors.deltaR).toBe('give Delta-R with its error');
  });

  it('drops Delta-R typed before the curve was switched back to a land curve', () => {
    const result = readSampleForm(form({ curve: 'INTCAL20', c14Age: '2410', c14Error: '30', deltaR: '-40' }), units);
    expect(result.ok && result.input.deltaR).toBeNull();
  });

  it('asks luminescence for a whole measurement year from 1950 on, and sends no curve', () => {
    const bad = readSampleForm(form({ method: 'LUMINESCENCE', calendarAgeBp: '1075', calendarErrorYears: '70', measurementYear: '2019.5' }), units);
    expect(bad.ok ? null : bad.errors.measurementYear).toBe('must be a whole number');
    const good = readSampleForm(form({ method: 'LUMINESCENCE', calendarAgeBp: '1075', calendarErrorYears: '70', measurementYear: '2019' }), units);
    expect(good.ok && good.input).toMatchObject({ calendarAgeBp: 1075, measurementYear: 2019, curve: null, c14Age: null });
  });

  it('accepts a historical tie centred after 1950 (a negative cal BP age)', () => {
    const result = readSampleForm(form({ method: 'HISTORICAL', calendarAgeBp: '-10', calendarErrorYears: '1' }), units);
    expect(result.ok && result.input.calendarAgeBp).toBe(-10);
  });

  it('asks for a reason when a sample is excluded', () => {
    const result = readSampleForm(form({ c14Age: '1', c14Error: '1', excluded: true }), units);
    expect(result.ok ? null : result.errors.exclusionReason).toBe('say why the sample is excluded');
  });

  it('sends an inherited sample\'s own inheritance scale within 1-10,000 years, and none for a sample dating its deposit', () => {
    const inherited = readSampleForm(form({ c14Age: '1835', c14Error: '25', ageRelation: 'OLDER_THAN_DEPOSIT', inheritanceScaleYears: '250' }), units);
    expect(inherited).toEqual({ ok: true, input: expect.objectContaining({ inheritanceScaleYears: 250 }) });
    const empty = readSampleForm(form({ c14Age: '1835', c14Error: '25', ageRelation: 'OLDER_THAN_DEPOSIT' }), units);
    expect(empty).toEqual({ ok: true, input: expect.objectContaining({ inheritanceScaleYears: null }) });
    const dating = readSampleForm(form({ c14Age: '1835', c14Error: '25', inheritanceScaleYears: '250' }), units);
    expect(dating).toEqual({ ok: true, input: expect.objectContaining({ inheritanceScaleYears: null }) });
    const tooLarge = readSampleForm(form({ c14Age: '1835', c14Error: '25', ageRelation: 'YOUNGER_THAN_DEPOSIT', inheritanceScaleYears: '20000' }), units);
    expect(tooLarge.ok).toBe(false);
    if (!tooLarge.ok) expect(Object.keys(tooLarge.errors)).toEqual(['inheritanceScaleYears']);
  });

  it('sends a marine sample\'s Delta-R source, trimmed', () => {
    const result = readSampleForm(
      form({ c14Age: '1835', c14Error: '25', material: 'PLANKTIC_FORAMS', curve: 'MARINE20', deltaR: '150', deltaRError: '40', deltaRSource: ' Velmora shelf ' }),
      units,
    );
    expect(result).toEqual({ ok: true, input: expect.objectContaining({ deltaRSource: 'Velmora shelf' }) });
  });

  it('asks for a unit of the site', () => {
    const result = readSampleForm(form({ unitId: 'elsewhere', c14Age: '1', c14Error: '1' }), units);
    expect(result.ok ? null : result.errors.unitId).toBe('choose the unit the sample came from');
  });
});

describe(withMaterial.name, () => {
  it('suggests Marine20 for forams and shells, and IntCal20 again for land material', () => {
    const marine = withMaterial(emptySampleForm(), 'PLANKTIC_FORAMS');
    expect(marine.curve).toBe('MARINE20');
    expect(withMaterial(marine, 'DETRITAL_CHARCOAL').curve).toBe('INTCAL20');
  });

  it('keeps SHCal20 for land material', () => {
    expect(withMaterial({ ...emptySampleForm(), curve: 'SHCAL20' }, 'IN_SITU_PLANT').curve).toBe('SHCAL20');
  });
});

describe(sampleFormFrom.name, () => {
  it('turns a stored sample back into form text, and reads it back the same', () => {
    const stored = {
      unitId: 'u1', labCode: 'TSH-0042', method: 'RADIOCARBON' as const, material: 'SHELL' as const, depthM: 1.2,
      ageRelation: 'DATES_DEPOSIT' as const, c14Age: 2410, c14Error: 30, delta13C: null, curve: 'MARINE20' as const,
      deltaR: -40, deltaRError: 55, deltaRSource: 'Tasman shelf', inheritanceScaleYears: null, calendarAgeBp: null, calendarErrorYears: null, measurementYear: null,
      excluded: false, exclusionReason: null, notes: null,
    };
    const values = sampleFormFrom(stored);
    expect(values.c14Age).toBe('2410');
    expect(values.delta13C).toBe('');
    expect(readSampleForm(values, units)).toEqual({ ok: true, input: stored });
  });
});
