import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calibrationForSample, CurveLookup, SampleDating } from '../chronology/calibration/sample-calibration';
import { CalibrationInputError } from '../chronology/calibration/errors';
import { builtInCurve, isBuiltInCurve } from '../reference-data/reference-data';
import {
  checkLabSheet,
  enumSpelling,
  FieldProblem,
  HeaderChoice,
  headerKey,
  LAB_SHEET_COLUMNS,
  LabSheetCalibration,
  LabSheetContext,
  LabSheetUnit,
  listedProblems,
  MAX_LAB_SHEET_ROWS,
  readBoolean,
  readLabSheet,
  readNumber,
} from './lab-sheet';
import { sampleFormRules } from './sample-form-rules';

const builtInOnly: CurveLookup = (code) => (isBuiltInCurve(code) ? builtInCurve(code) : undefined);

/** The engine behind CalibrationService.sampleCalibrator, without Nest. */
function engineCalibrator(dating: SampleDating): LabSheetCalibration | FieldProblem {
  try {
    return calibrationForSample(dating, builtInOnly, { latestMeasurementYear: 2026 });
  } catch (error) {
    if (error instanceof CalibrationInputError) return { field: error.field, message: error.message };
    throw error;
  }
}

const UNITS: LabSheetUnit[] = [
  { id: 'u1', name: 'Lower peat', position: 1, topDepthM: 2, baseDepthM: 3 },
  { id: 'u2', name: 'Sand sheet', position: 2, topDepthM: 1, baseDepthM: 2 },
  { id: 'u3', name: 'Upper peat', position: 3, topDepthM: 0, baseDepthM: 1 },
];

function context(overrides: Partial<LabSheetContext<LabSheetCalibration>> = {}): LabSheetContext<LabSheetCalibration> {
  return { units: UNITS, takenLabCodes: new Set(), latitude: -41, calibrate: engineCalibrator, fieldRules: sampleFormRules, ...overrides };
}

const HEADER = 'labCode,unit,depthM,method,material,c14Age,c14Error,curve';
const sheet = (...rows: string[]) => [HEADER, ...rows].join('\n');

describe(readNumber.name, () => {
  it('reads plain decimal notation, with sign, exponent and surrounding spaces', () => {
    expect(readNumber('1835')).toBe(1835);
    expect(readNumber(' -27.1 ')).toBe(-27.1);
    expect(readNumber('+40')).toBe(40);
    expect(readNumber('.5')).toBe(0.5);
    expect(readNumber('1.')).toBe(1);
    expect(readNumber('1.2e3')).toBe(1200);
  });

  it('refuses trailing letters, words and hex', () => {
    for (const cell of ['12a', 'abc', 'NaN', 'Infinity', '0x10', '1835 ± 25', '12 3']) {
      expect(readNumber(cell)).toBe(`"${cell}" is not a number`);
    }
  });

  it('refuses commas (thousands separator or decimal comma) with advice rather than guessing', () => {
    expect(readNumber('1,234')).toMatch(/has a comma; write numbers with a point/);
    expect(readNumber('1,5')).toMatch(/has a comma/);
  });

  it('refuses spreadsheet formulas', () => {
    expect(readNumber('=A2+25')).toMatch(/spreadsheet formula/);
  });
});

describe(readBoolean.name, () => {
  it('reads true/false, yes/no and 1/0 in any case, and nothing else', () => {
    expect(['TRUE', 'yes', '1', ' True '].map(readBoolean)).toEqual([true, true, true, true]);
    expect(['false', 'No', '0'].map(readBoolean)).toEqual([false, false, false]);
    expect(readBoolean('maybe')).toBeNull();
  });
});

describe(enumSpelling.name, () => {
  it('upper-cases and joins words with underscores', () => {
    expect(enumSpelling('radiocarbon')).toBe('RADIOCARBON');
    expect(enumSpelling('Detrital charcoal')).toBe('DETRITAL_CHARCOAL');
    expect(enumSpelling('older-than-deposit')).toBe('OLDER_THAN_DEPOSIT');
    expect(enumSpelling('IntCal20')).toBe('INTCAL20');
  });
});

describe('LAB_SHEET_COLUMNS', () => {
  it('is the column list of the frontend template, in the same order', () => {
    const template = readFileSync(join(__dirname, '../../../frontend/src/modules/import/utils/template.ts'), 'utf8');
    const list = /SAMPLE_IMPORT_COLUMNS = \[([^\]]*)\]/.exec(template)?.[1] ?? '';
    const frontendColumns = [...list.matchAll(/'([^']+)'/g)].map((match) => match[1]);
    expect(frontendColumns).toEqual([...LAB_SHEET_COLUMNS]);
  });
});

describe(readLabSheet.name, () => {
  it('reads header names in any case and in any order, leaving absent optional columns empty', () => {
    const reading = readLabSheet('UNIT,LabCode,METHOD,material\n2,OX-1,luminescence,other\n');
    expect(reading.problems).toEqual([]);
    expect(reading.rowCount).toBe(1);
    expect(reading.samples[0]).toMatchObject({
      row: 1, labCode: 'OX-1', unit: '2', method: 'LUMINESCENCE', material: 'OTHER', ageRelation: 'DATES_DEPOSIT',
      c14Age: null, curve: null, excluded: false, notes: null,
    });
  });

  it('handles a BOM, CRLF line ends and quoted cells holding separators, line breaks and doubled quotes (RFC 4180)', () => {
    const csv = '\uFEFFlabCode,unit,method,material,notes\r\nQ-1,Sand sheet,RADIOCARBON,SHELL,"in ""growth"" position, upper\r\nhalf"\r\nQ-2,1,TEPHRA,OTHER,\r\n';
    const reading = readLabSheet(csv);
    expect(reading.problems).toEqual([]);
    expect(reading.samples.map((s) => s.labCode)).toEqual(['Q-1', 'Q-2']);
    expect(reading.samples[0].notes).toBe('in "growth" position, upper\r\nhalf');
    expect(reading.samples[1].notes).toBeNull();
  });

  it('reads semicolon- and tab-separated sheets by the separator of the header', () => {
    expect(readLabSheet('labCode;unit;method;material;c14Age\nS-1;1;RADIOCARBON;SHELL;1500\n').samples[0].c14Age).toBe(1500);
    expect(readLabSheet('labCode\tunit\tmethod\tmaterial\nT-1\t1\tTEPHRA\tOTHER\n').samples[0].labCode).toBe('T-1');
  });

  it('skips blank rows but keeps counting them, so row numbers follow the sheet', () => {
    const reading = readLabSheet(sheet('A-1,1,,RADIOCARBON,SHELL,1000,20,INTCAL20', '', ' , , ', 'A-2,1,,RADIOCARBON,SHELL,abc,20,INTCAL20'));
    expect(reading.rowCount).toBe(2);
    expect(reading.samples.map((s) => s.row)).toEqual([1, 4]);
    expect(reading.problems).toEqual([{ row: 4, field: 'c14Age', message: 'c14Age: "abc" is not a number' }]);
  });

  it('reads enumerated values in any case and spelling', () => {
    const reading = readLabSheet('labCode,unit,method,material,ageRelation,curve\nE-1,1,Radiocarbon,detrital charcoal,older than deposit,marine20\n');
    expect(reading.samples[0]).toMatchObject({
      method: 'RADIOCARBON', material: 'DETRITAL_CHARCOAL', ageRelation: 'OLDER_THAN_DEPOSIT', curve: 'MARINE20',
    });
  });

  it('names the row and field of each unreadable cell, several per row', () => {
    const reading = readLabSheet(
      'labCode,unit,method,material,ageRelation,c14Age,c14Error,excluded\n' +
        ',1,CARBON,SHELL,sideways,1,234,=B2*2,perhaps\n',
    );
    expect(reading.problems.map((p) => `${p.row}:${p.field}`)).toEqual([
      '1:csv', '1:labCode', '1:method', '1:ageRelation', '1:excluded',
    ]);
    const fields = new Map(reading.problems.map((p) => [p.field, p.message]));
    expect(fields.get('labCode')).toBe('labCode is required in every row.');
    expect(fields.get('method')).toBe('method "CARBON" is not one of RADIOCARBON, LUMINESCENCE, HISTORICAL, TEPHRA.');
    // "1,234" unquoted is two cells (c14Age 1, c14Error 234), which pushes "=B2*2" under excluded.
    expect(fields.get('excluded')).toMatch(/spreadsheet formula/);
    expect(fields.get('csv')).toMatch(/Cell 9 \("perhaps"\) is under no column/);
  });

  it('keeps a quoted "1,234" in one cell and refuses it as a number', () => {
    const reading = readLabSheet(sheet('C-1,1,,RADIOCARBON,SHELL,"1,234",20,INTCAL20'));
    expect(reading.problems).toEqual([
      { row: 1, field: 'c14Age', message: 'c14Age: "1,234" has a comma; write numbers with a point for decimals and no thousands separator (1234.5)' },
    ]);
  });

  describe('header problems (row 0)', () => {
    it('refuses an unknown column, naming it in one problem', () => {
      const reading = readLabSheet('labCode,unit,method,material,labName\nX-1,1,TEPHRA,OTHER,Somewhere\n');
      expect(reading.problems).toHaveLength(1);
      expect(reading.problems[0]).toMatchObject({ row: 0, field: 'header' });
      expect(reading.problems[0].message).toMatch(/^This column is not recognised: "labName"\. Choose the field each one holds, or ignore it; the fields are labCode, unit, depthM/);
      expect(reading.samples).toEqual([]);
      expect(reading.rowCount).toBe(1);
    });

    // A sheet as a radiocarbon laboratory might send it (invented lab, invented values): none of
    // its headers is one of our field names except Material.
    const LAB_SHEET = 'Lab ID,Layer,Method,Conventional age,±,d13C,Material\nQX-101,1,RADIOCARBON,1520,25,-26.1,detrital charcoal\n';

    it('lists every unrecognised column once, in one problem, not once per column', () => {
      const reading = readLabSheet(LAB_SHEET);
      const listing = reading.problems.filter((p) => p.field === 'header');
      expect(listing).toHaveLength(1);
      expect(listing[0].message).toContain('These 5 columns are not recognised: "Lab ID", "Layer", "Conventional age", "±" and "d13C".');
      // The field list appears once in the whole answer.
      expect(reading.problems.map((p) => p.message).join(' ').split('labCode, unit, depthM')).toHaveLength(2);
      expect(reading.columns).toEqual([
        { header: 'Lab ID', field: null, source: 'UNKNOWN' },
        { header: 'Layer', field: null, source: 'UNKNOWN' },
        { header: 'Method', field: 'method', source: 'NAME' },
        { header: 'Conventional age', field: null, source: 'UNKNOWN' },
        { header: '±', field: null, source: 'UNKNOWN' },
        { header: 'd13C', field: null, source: 'UNKNOWN' },
        { header: 'Material', field: 'material', source: 'NAME' },
      ]);
    });

    it('reads the sheet once each header is given a field, and ignores a column chosen to be ignored', () => {
      const choices = new Map<string, HeaderChoice>([
        [headerKey('Lab ID'), { field: 'labCode', source: 'CHOSEN' }],
        [headerKey('LAYER'), { field: 'unit', source: 'REMEMBERED' }],
        [headerKey('conventional   age'), { field: 'c14Age', source: 'CHOSEN' }],
        [headerKey('±'), { field: 'c14Error', source: 'CHOSEN' }],
        [headerKey('d13C'), { field: null, source: 'CHOSEN' }],
      ]);
      const reading = readLabSheet(LAB_SHEET, choices);
      expect(reading.problems).toEqual([]);
      expect(reading.samples[0]).toMatchObject({ labCode: 'QX-101', unit: '1', c14Age: 1520, c14Error: 25, delta13C: null, material: 'DETRITAL_CHARCOAL' });
      expect(reading.columns.find((c) => c.header === 'Layer')).toEqual({ header: 'Layer', field: 'unit', source: 'REMEMBERED' });
      expect(reading.columns.find((c) => c.header === 'd13C')).toEqual({ header: 'd13C', field: null, source: 'CHOSEN' });
    });

    it('refuses two columns that give the same field, naming both headers', () => {
      const choices = new Map<string, HeaderChoice>([[headerKey('Lab ID'), { field: 'labCode', source: 'CHOSEN' }]]);
      const reading = readLabSheet('Lab ID,labCode,unit,method,material\nA,B,1,TEPHRA,OTHER\n', choices);
      expect(reading.problems).toEqual([
        { row: 0, field: 'labCode', message: 'Columns "Lab ID" and "labCode" both give labCode; keep one, or choose another field for one of them.' },
      ]);
    });

    it('reads our field names whatever their case, spacing or punctuation', () => {
      const reading = readLabSheet('Lab code,UNIT,Method,material,Depth (m)\nX-1,1,TEPHRA,OTHER,0.5\n');
      expect(reading.problems).toEqual([]);
      expect(reading.samples[0]).toMatchObject({ labCode: 'X-1', depthM: 0.5 });
    });

    it('refuses a column given twice (in any case) and a missing required column', () => {
      const reading = readLabSheet('labCode,unit,method,LABCODE\nX-1,1,TEPHRA,X-1\n');
      expect(reading.problems).toEqual([
        { row: 0, field: 'labCode', message: 'Column labCode appears twice in the header.' },
        { row: 0, field: 'material', message: 'The sheet needs a material column.' },
      ]);
    });

    it('refuses an empty sheet and a header without rows', () => {
      expect(readLabSheet(' \r\n').problems).toEqual([{ row: 0, field: 'csv', message: expect.stringMatching(/The sheet is empty/) }]);
      expect(readLabSheet(`${HEADER}\r\n\r\n`).problems).toEqual([
        { row: 0, field: 'csv', message: 'The sheet has a header but no sample rows.' },
      ]);
    });

    it('accepts an empty trailing header cell when its cells are empty too', () => {
      expect(readLabSheet('labCode,unit,method,material,\nX-1,1,TEPHRA,OTHER,\n').problems).toEqual([]);
    });

    it('refuses a sheet longer than MAX_LAB_SHEET_ROWS', () => {
      const row = '\nX,1,TEPHRA,OTHER';
      const reading = readLabSheet('labCode,unit,method,material' + row.repeat(MAX_LAB_SHEET_ROWS + 1));
      expect(reading.problems).toEqual([{ row: 0, field: 'csv', message: expect.stringMatching(/at most 50000 can be imported/) }]);
    });

    it('reports a quoted cell that is never closed', () => {
      const reading = readLabSheet('labCode,unit,method,material,notes\nX-1,1,TEPHRA,OTHER,"never closed\n');
      expect(reading.problems[0]).toMatchObject({ row: 1, field: 'csv', message: expect.stringMatching(/a quoted cell is never closed/) });
    });
  });
});

describe(checkLabSheet.name, () => {
  it('accepts good rows with their unit (by name in any case, or by position) and calibration', () => {
    const check = checkLabSheet(
      sheet('G-1,lower PEAT,2.5,RADIOCARBON,DETRITAL_CHARCOAL,2450,30,INTCAL20', 'G-2,2,1.4,RADIOCARBON,SHELL,1800,25,INTCAL20'),
      context(),
    );
    expect(check.problems).toEqual([]);
    expect(check.accepted.map((r) => [r.sample.labCode, r.unit.id])).toEqual([['G-1', 'u1'], ['G-2', 'u2']]);
    // Same engine, same numbers as a single sample (calibrationForSample, its own spec checks it against CHECKS.md).
    const direct = calibrationForSample({ method: 'RADIOCARBON', c14Age: 2450, c14Error: 30, curve: 'INTCAL20', latitude: -41 }, builtInOnly);
    expect(check.accepted[0].calibration.medianCalBp).toBe(direct.medianCalBp);
    expect(check.accepted[0].calibration.hpd95).toEqual(direct.hpd95);
  });

  it('names row 3 and field c14Error for an error of 0, with the sample form’s message, and accepts the other rows', () => {
    const check = checkLabSheet(
      sheet(
        'B-1,1,2.2,RADIOCARBON,SHELL,2000,30,INTCAL20',
        'B-2,1,2.4,RADIOCARBON,SHELL,2100,30,INTCAL20',
        'B-3,1,2.6,RADIOCARBON,SHELL,2200,0,INTCAL20',
      ),
      context(),
    );
    expect(check.problems).toEqual([
      { row: 3, field: 'c14Error', message: 'c14Error must be greater than 0 (the 1-sigma error in 14C years)' },
    ]);
    expect(check.accepted.map((r) => r.sample.row)).toEqual([1, 2]);
  });

  it('reports the fields a method needs, in the calibration engine’s words', () => {
    const check = checkLabSheet(
      'labCode,unit,method,material,calendarAgeBp,calendarErrorYears,c14Age,c14Error\n' +
        'M-1,1,RADIOCARBON,SHELL,,,1500,30\n' +
        'M-2,1,LUMINESCENCE,OTHER,1200,80,,\n',
      context(),
    );
    expect(check.problems).toEqual([
      { row: 1, field: 'curve', message: 'Choose the calibration curve for this radiocarbon sample.' },
      {
        row: 2, field: 'measurementYear',
        message: 'A luminescence sample needs the year it was measured: its age counts back from that year, not from 1950.',
      },
    ]);
  });

  it('refuses a unit the site does not have, by name or position, and a shared unit name', () => {
    const units = [...UNITS, { id: 'u4', name: 'Sand sheet', position: 4, topDepthM: 3, baseDepthM: 4 }];
    const check = checkLabSheet(
      sheet('N-1,Gravel,,RADIOCARBON,SHELL,1000,20,INTCAL20', 'N-2,9,,RADIOCARBON,SHELL,1000,20,INTCAL20', 'N-3,sand sheet,,RADIOCARBON,SHELL,1000,20,INTCAL20'),
      context({ units }),
    );
    expect(check.problems).toEqual([
      { row: 1, field: 'unit', message: 'this site has no unit named "Gravel"' },
      { row: 2, field: 'unit', message: 'this site has no unit at position 9' },
      { row: 3, field: 'unit', message: '2 units of this site are named "sand sheet"; give the unit\'s position number instead' },
    ]);
    expect(check.accepted).toEqual([]);
  });

  it('refuses a depth outside the unit beyond the hand-measurement tolerance', () => {
    const check = checkLabSheet(
      sheet('D-1,1,3.004,RADIOCARBON,SHELL,1000,20,INTCAL20', 'D-2,1,3.2,RADIOCARBON,SHELL,1000,20,INTCAL20'),
      context(),
    );
    expect(check.problems).toEqual([{ row: 2, field: 'depthM', message: 'depth 3.2 m is outside unit "Lower peat" (2-3 m)' }]);
  });

  it('names every row of a lab code repeated in the sheet, and a code already in the project', () => {
    const check = checkLabSheet(
      sheet(
        'R-1,1,,RADIOCARBON,SHELL,1000,20,INTCAL20',
        'R-2,1,,RADIOCARBON,SHELL,1000,20,INTCAL20',
        'R-1,1,,RADIOCARBON,SHELL,1000,20,INTCAL20',
        'R-1,1,,RADIOCARBON,SHELL,1000,20,INTCAL20',
      ),
      context({ takenLabCodes: new Set(['R-2']) }),
    );
    expect(check.problems).toEqual([
      { row: 1, field: 'labCode', message: 'lab code R-1 appears more than once in the sheet: also on rows 3, 4' },
      { row: 2, field: 'labCode', message: 'lab code R-2 is already used by another sample in this project' },
      { row: 3, field: 'labCode', message: 'lab code R-1 appears more than once in the sheet: also on rows 1, 4' },
      { row: 4, field: 'labCode', message: 'lab code R-1 appears more than once in the sheet: also on rows 1, 3' },
    ]);
  });

  it('applies the sample form’s range rules (class-validator on CreateSampleInput)', () => {
    const check = checkLabSheet(
      'labCode,unit,method,material,c14Age,c14Error,curve,delta13C\nLab#1,1,RADIOCARBON,SHELL,1000,20,INTCAL20,-75\n',
      context(),
    );
    expect(check.problems).toEqual([
      { row: 1, field: 'labCode', message: 'labCode may hold letters, digits, spaces and . - _ / only' },
      { row: 1, field: 'delta13C', message: 'delta13C must not be less than -60' },
    ]);
  });

  it('reports one problem per field even when the form rules and the engine both object', () => {
    const check = checkLabSheet(sheet('P-1,1,,RADIOCARBON,SHELL,-50,20,INTCAL20'), context());
    expect(check.problems).toEqual([
      { row: 1, field: 'c14Age', message: 'c14Age cannot be negative: a post-bomb (modern) sample cannot be calibrated on these curves' },
    ]);
  });

  it('returns the problems of every row, not only the first', () => {
    const rows = Array.from({ length: 40 }, (_, i) => `K-${i},1,,RADIOCARBON,SHELL,1000,${i % 4 === 0 ? 'x' : 20},INTCAL20`);
    const check = checkLabSheet(sheet(...rows), context());
    expect(check.problems.map((p) => p.row)).toEqual(Array.from({ length: 10 }, (_, i) => 4 * i + 1));
    expect(check.accepted).toHaveLength(30);
  });
});

describe('listedProblems and duplicate lab codes at scale (issue 17: 2,000 duplicates gave a 22 MB error list)', () => {
  it('names at most five other rows per duplicate, with the count of the rest', () => {
    const rows = Array.from({ length: 2000 }, () => 'R-1,Lower peat,2.5,RADIOCARBON,CHARCOAL,1000,30,INTCAL20').join('\n');
    const check = checkLabSheet(`${HEADER}\n${rows}`, context());
    const duplicates = check.problems.filter((p) => p.field === 'labCode');
    expect(duplicates).toHaveLength(2000);
    expect(duplicates[0].message).toBe('lab code R-1 appears more than once in the sheet: also on rows 2, 3, 4, 5, 6 and 1,994 more');
    expect(duplicates[1999].message).toBe('lab code R-1 appears more than once in the sheet: also on rows 1, 2, 3, 4, 5 and 1,994 more');
    expect(JSON.stringify(duplicates).length).toBeLessThan(300_000);
  });

  it('lists the first problems and counts the rest in one last entry', () => {
    const problems = Array.from({ length: 250 }, (_, i) => ({ row: i + 1, field: 'labCode', message: 'x' }));
    const listed = listedProblems(problems, 200);
    expect(listed).toHaveLength(201);
    expect(listed[199].row).toBe(200);
    expect(listed[200]).toEqual({ row: 0, field: 'csv', message: 'and 50 more problems not listed; fix these and check the sheet again' });
    expect(listedProblems(problems.slice(0, 200), 200)).toHaveLength(200);
  });
});
