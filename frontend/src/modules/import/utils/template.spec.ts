import { describe, expect, it } from 'vitest';
import {
  csvField,
  csvRecord,
  REQUIRED_IMPORT_COLUMNS,
  SAMPLE_IMPORT_COLUMN_SPECS,
  SAMPLE_IMPORT_COLUMNS,
  sampleImportTemplateCsv,
  splitFirstCsvRecord,
} from './template';

// Quoting rules: RFC 4180 section 2, rules 6 and 7 (fields with commas, quotes or line breaks
// are enclosed in double quotes; a quote inside is written twice) [published].

describe(csvField.name, () => {
  it('leaves plain text alone', () => {
    expect(csvField('VKR-1021')).toBe('VKR-1021');
  });

  it('quotes commas, quotes and line breaks, doubling inner quotes', () => {
    expect(csvField('charcoal, rounded')).toBe('"charcoal, rounded"');
    expect(csvField('so-called "root"')).toBe('"so-called ""root"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
  });
});

describe(csvRecord.name, () => {
  it('joins fields with commas and ends the line with CRLF', () => {
    expect(csvRecord(['a', 'b,c', ''])).toBe('a,"b,c",\r\n');
  });
});

describe(sampleImportTemplateCsv.name, () => {
  const lines = sampleImportTemplateCsv().split('\r\n').filter((line) => line !== '');

  it('starts with the import columns in their documented order', () => {
    expect(lines[0]).toBe(SAMPLE_IMPORT_COLUMNS.join(','));
    expect(SAMPLE_IMPORT_COLUMNS).toEqual([
      'labCode', 'unit', 'depthM', 'method', 'material', 'ageRelation', 'c14Age', 'c14Error',
      'delta13C', 'curve', 'deltaR', 'deltaRError', 'deltaRSource', 'inheritanceScaleYears', 'calendarAgeBp', 'calendarErrorYears',
      'measurementYear', 'excluded', 'exclusionReason', 'notes',
    ]);
  });

  it('gives every example row one field per column', () => {
    expect(lines.length).toBeGreaterThan(1);
    for (const line of lines.slice(1)) {
      expect(splitFirstCsvRecord(line)).toHaveLength(SAMPLE_IMPORT_COLUMNS.length);
    }
  });

  it('fills the required columns in every example row', () => {
    for (const line of lines.slice(1)) {
      const fields = splitFirstCsvRecord(line);
      for (const column of REQUIRED_IMPORT_COLUMNS) {
        expect(fields[SAMPLE_IMPORT_COLUMNS.indexOf(column)]).not.toBe('');
      }
    }
  });

  it('can leave the examples out', () => {
    expect(sampleImportTemplateCsv({ withExamples: false })).toBe(`${SAMPLE_IMPORT_COLUMNS.join(',')}\r\n`);
  });
});

describe('SAMPLE_IMPORT_COLUMN_SPECS', () => {
  it('describes every column once, in order', () => {
    expect(SAMPLE_IMPORT_COLUMN_SPECS.map((spec) => spec.column)).toEqual([...SAMPLE_IMPORT_COLUMNS]);
  });
});

describe(splitFirstCsvRecord.name, () => {
  it('reads quoted fields with commas and doubled quotes, and stops at the line end', () => {
    expect(splitFirstCsvRecord('a,"b, ""c""",d\r\ne,f')).toEqual(['a', 'b, "c"', 'd']);
  });
});
