/**
 * The lab-sheet format of `importSamples`: one header row naming these columns (any order,
 * extra columns refused), then one row per sample. Enumerated values are the API's enum names
 * (RADIOCARBON, DETRITAL_CHARCOAL, DATES_DEPOSIT, INTCAL20, ...). Empty cells mean "not given".
 *
 * Kept free of imports so the backend's CSV reader can be checked against the same list.
 */
export const SAMPLE_IMPORT_COLUMNS = [
  'labCode',
  'unit',
  'depthM',
  'method',
  'material',
  'ageRelation',
  'c14Age',
  'c14Error',
  'delta13C',
  'curve',
  'deltaR',
  'deltaRError',
  'deltaRSource',
  'inheritanceScaleYears',
  'calendarAgeBp',
  'calendarErrorYears',
  'measurementYear',
  'excluded',
  'exclusionReason',
  'notes',
] as const;

export type SampleImportColumn = (typeof SAMPLE_IMPORT_COLUMNS)[number];

/** Which rows must fill a column: every row, or only rows of one dating method. */
export type ColumnRequirement = 'every row' | 'radiocarbon' | 'luminescence' | 'historical / tephra' | 'optional';

export type SampleImportColumnSpec = {
  column: SampleImportColumn;
  requirement: ColumnRequirement;
  description: string;
};

/** What each column holds, in the order of SAMPLE_IMPORT_COLUMNS (shown beside the template). */
export const SAMPLE_IMPORT_COLUMN_SPECS: readonly SampleImportColumnSpec[] = [
  { column: 'labCode', requirement: 'every row', description: 'Laboratory code, unique in the project.' },
  { column: 'unit', requirement: 'every row', description: 'Unit name, or its position in the column (1 = oldest).' },
  { column: 'depthM', requirement: 'optional', description: 'Depth in metres; must lie within the unit.' },
  { column: 'method', requirement: 'every row', description: 'RADIOCARBON, LUMINESCENCE, HISTORICAL or TEPHRA.' },
  {
    column: 'material',
    requirement: 'every row',
    description:
      'DETRITAL_CHARCOAL, IN_SITU_PLANT, PLANT_MACROFOSSIL, PLANKTIC_FORAMS, BENTHIC_FORAMS, SHELL, BULK_SEDIMENT or OTHER.',
  },
  {
    column: 'ageRelation',
    requirement: 'optional',
    description: 'DATES_DEPOSIT (default), OLDER_THAN_DEPOSIT (detrital, inherited) or YOUNGER_THAN_DEPOSIT (roots).',
  },
  { column: 'c14Age', requirement: 'radiocarbon', description: 'Conventional radiocarbon age, 14C yr BP.' },
  { column: 'c14Error', requirement: 'radiocarbon', description: '1-sigma error of the 14C age, years.' },
  { column: 'delta13C', requirement: 'optional', description: 'delta13C, per mil VPDB.' },
  { column: 'curve', requirement: 'radiocarbon', description: 'INTCAL20, MARINE20 or SHCAL20.' },
  { column: 'deltaR', requirement: 'optional', description: 'Local marine reservoir offset Delta-R, 14C yr (marine curves).' },
  { column: 'deltaRError', requirement: 'optional', description: '1-sigma error of Delta-R, 14C yr.' },
  {
    column: 'deltaRSource',
    requirement: 'optional',
    description: 'Name of the regional Delta-R entry; marine samples of a site with one source share one reservoir offset.',
  },
  {
    column: 'inheritanceScaleYears',
    requirement: 'optional',
    description:
      'Detrital or intrusive samples: mean inherited (or intruded) age, years (1-10,000); empty takes the default for the material.',
  },
  {
    column: 'calendarAgeBp',
    requirement: 'luminescence',
    description:
      'Luminescence: age in years before the measurement year. Historical/tephra: centre of the calendar range, cal BP.',
  },
  {
    column: 'calendarErrorYears',
    requirement: 'luminescence',
    description: 'Luminescence: 1-sigma error, years. Historical/tephra: half-width of the range, years.',
  },
  { column: 'measurementYear', requirement: 'luminescence', description: 'Calendar year (CE) the luminescence age was measured.' },
  { column: 'excluded', requirement: 'optional', description: 'true to keep the sample out of age models; default false.' },
  { column: 'exclusionReason', requirement: 'optional', description: 'Why the sample is excluded.' },
  { column: 'notes', requirement: 'optional', description: 'Free text.' },
];

/** Columns every row must have, whatever its method. */
export const REQUIRED_IMPORT_COLUMNS: readonly SampleImportColumn[] = SAMPLE_IMPORT_COLUMN_SPECS.filter(
  (spec) => spec.requirement === 'every row',
).map((spec) => spec.column);

type ExampleRow = Partial<Record<SampleImportColumn, string>>;

/** Example rows of the template: invented lab codes, one per kind of dating. */
const EXAMPLE_ROWS: readonly ExampleRow[] = [
  {
    labCode: 'EXAMPLE-14C-1',
    unit: 'peat',
    depthM: '1.42',
    method: 'RADIOCARBON',
    material: 'PLANT_MACROFOSSIL',
    ageRelation: 'DATES_DEPOSIT',
    c14Age: '1835',
    c14Error: '25',
    delta13C: '-27.1',
    curve: 'INTCAL20',
    notes: 'in-growth-position rhizome, upper 1 cm of the buried soil',
  },
  {
    labCode: 'EXAMPLE-14C-2',
    unit: '3',
    depthM: '2.10',
    method: 'RADIOCARBON',
    material: 'PLANKTIC_FORAMS',
    c14Age: '2410',
    c14Error: '30',
    curve: 'MARINE20',
    deltaR: '-40',
    deltaRError: '55',
  },
  {
    labCode: 'EXAMPLE-OSL-1',
    unit: 'sand sheet',
    depthM: '0.85',
    method: 'LUMINESCENCE',
    material: 'OTHER',
    calendarAgeBp: '1075',
    calendarErrorYears: '70',
    measurementYear: '2019',
    excluded: 'false',
  },
];

/** One CSV field, quoted when it holds a comma, a double quote or a line break (RFC 4180, section 2). */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** One CSV record; lines end with CRLF as RFC 4180 asks. */
export function csvRecord(values: readonly string[]): string {
  return `${values.map(csvField).join(',')}\r\n`;
}

/** The downloadable template: the header, and the example rows unless `withExamples` is false. */
export function sampleImportTemplateCsv({ withExamples = true }: { withExamples?: boolean } = {}): string {
  const rows = withExamples ? EXAMPLE_ROWS : [];
  return [
    csvRecord(SAMPLE_IMPORT_COLUMNS),
    ...rows.map((row) => csvRecord(SAMPLE_IMPORT_COLUMNS.map((column) => row[column] ?? ''))),
  ].join('');
}

/** The fields of the first record of a CSV text (enough to read a header), honouring quotes. */
export function splitFirstCsvRecord(text: string): string[] {
  const fields: string[] = [];
  let field = '';
  let quoted = false;
  for (let index = 0; index < text.length; index += 1) {
    const char = text[index]!;
    if (quoted) {
      if (char === '"' && text[index + 1] === '"') {
        field += '"';
        index += 1;
      } else if (char === '"') {
        quoted = false;
      } else {
        field += char;
      }
    } else if (char === '"') {
      quoted = true;
    } else if (char === ',') {
      fields.push(field);
      field = '';
    } else if (char === '\n' || char === '\r') {
      break;
    } else {
      field += char;
    }
  }
  fields.push(field);
  return fields;
}
