import {
  BUNDLE_FORMAT,
  BUNDLE_TABLE_MAX_ITEMS,
  BUNDLE_TABLES,
  BUNDLE_VERSION,
  BundleTable,
  BundleVersion,
  READABLE_BUNDLE_VERSIONS,
  FieldSpec,
  PROJECT_FIELDS,
  ProjectBundle,
  RECORD_FIELDS,
  REF_PATTERN,
} from './bundle-format';

/** One problem found in a bundle, located by a JSON-pointer-like path (`sites[3].latitude`). */
export interface BundleProblem {
  path: string;
  message: string;
}

export type BundleValidation = { ok: true; bundle: ProjectBundle } | { ok: false; problems: BundleProblem[] };

const REF = new RegExp(REF_PATTERN);
const MAX_PROBLEMS = 100;

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function checkField(value: unknown, spec: FieldSpec, path: string, problems: BundleProblem[]): void {
  const nullable = 'nullable' in spec && spec.nullable === true;
  if (value === null) {
    if (!nullable) problems.push({ path, message: 'must not be null' });
    return;
  }
  switch (spec.type) {
    case 'string':
      if (typeof value !== 'string') return void problems.push({ path, message: 'must be a string' });
      if (value.length < (spec.minLength ?? 0)) problems.push({ path, message: `must be at least ${spec.minLength} characters` });
      if (value.length > spec.maxLength) problems.push({ path, message: `must be at most ${spec.maxLength} characters` });
      return;
    case 'number':
    case 'integer':
      if (typeof value !== 'number' || !Number.isFinite(value)) return void problems.push({ path, message: 'must be a finite number' });
      if (spec.type === 'integer' && !Number.isInteger(value)) problems.push({ path, message: 'must be an integer' });
      if (spec.minimum !== undefined && value < spec.minimum) problems.push({ path, message: `must be at least ${spec.minimum}` });
      if (spec.maximum !== undefined && value > spec.maximum) problems.push({ path, message: `must be at most ${spec.maximum}` });
      if ('exclusiveMinimum' in spec && spec.exclusiveMinimum !== undefined && value <= spec.exclusiveMinimum) {
        problems.push({ path, message: `must be greater than ${spec.exclusiveMinimum}` });
      }
      return;
    case 'boolean':
      if (typeof value !== 'boolean') problems.push({ path, message: 'must be true or false' });
      return;
    case 'enum':
      if (typeof value !== 'string' || !spec.values.includes(value)) problems.push({ path, message: `must be one of ${spec.values.join(', ')}` });
      return;
    case 'strings':
      if (!Array.isArray(value)) return void problems.push({ path, message: 'must be an array of strings' });
      if (value.length > spec.maxItems) problems.push({ path, message: `must hold at most ${spec.maxItems} items` });
      value.forEach((item, i) => {
        if (typeof item !== 'string' || item.length === 0 || item.length > spec.maxLength) {
          problems.push({ path: `${path}[${i}]`, message: `must be a string of 1 to ${spec.maxLength} characters` });
        }
      });
      return;
    case 'ref':
      if (typeof value !== 'string' || !REF.test(value)) problems.push({ path, message: `must be a ref matching ${REF_PATTERN}` });
      return;
  }
}

/** The fields a record has in a format version. */
function fieldsOf(fields: Record<string, FieldSpec>, version: BundleVersion): Record<string, FieldSpec> {
  return Object.fromEntries(Object.entries(fields).filter(([, spec]) => (spec.since ?? 1) <= version));
}

function checkObject(value: unknown, allFields: Record<string, FieldSpec>, path: string, problems: BundleProblem[], version: BundleVersion = BUNDLE_VERSION): void {
  if (!isRecord(value)) return void problems.push({ path, message: 'must be an object' });
  const fields = fieldsOf(allFields, version);
  for (const [name, spec] of Object.entries(fields)) {
    if (!Object.hasOwn(value, name)) problems.push({ path: `${path}.${name}`, message: 'is required (use null for no value)' });
    else checkField(value[name], spec, `${path}.${name}`, problems);
  }
  // Own keys only: `in` would take `__proto__` or `constructor` for fields of every object.
  for (const name of Object.keys(value)) if (!Object.hasOwn(fields, name)) problems.push({ path: `${path}.${name}`, message: 'is not a field of this format version' });
}

/**
 * Check a parsed bundle completely before anything is written: the envelope, every field's type
 * and bounds, and the rules between records the database would otherwise refuse one at a time
 * (refs unique and resolving, a unit's depths ordered, positions unique per site, an event's
 * units and a sample's unit in its own site, the per-method age fields, lab codes unique, one
 * preferred hypothesis, ties between two distinct events and each pair once per hypothesis).
 * Returns every problem found, up to 100.
 */
export function validateBundle(input: unknown): BundleValidation {
  const problems: BundleProblem[] = [];
  if (!isRecord(input)) return { ok: false, problems: [{ path: '', message: 'a bundle is a JSON object' }] };
  if (input.format !== BUNDLE_FORMAT) problems.push({ path: 'format', message: `must be "${BUNDLE_FORMAT}"` });
  const readable = (READABLE_BUNDLE_VERSIONS as readonly unknown[]).includes(input.version);
  if (!readable) {
    problems.push({ path: 'version', message: `must be ${READABLE_BUNDLE_VERSIONS.join(' or ')} (this server reads versions ${READABLE_BUNDLE_VERSIONS.join(' and ')} and writes ${BUNDLE_VERSION})` });
  }
  const version = (readable ? input.version : BUNDLE_VERSION) as BundleVersion;
  if (typeof input.exportedAt !== 'string' || Number.isNaN(Date.parse(input.exportedAt))) {
    problems.push({ path: 'exportedAt', message: 'must be an ISO 8601 date-time' });
  }
  checkObject(input.project, PROJECT_FIELDS, 'project', problems);
  const allowed = new Set(['format', 'version', 'exportedAt', 'project', ...BUNDLE_TABLES]);
  for (const name of Object.keys(input)) if (!allowed.has(name)) problems.push({ path: name, message: 'is not a member of this format version' });
  for (const table of BUNDLE_TABLES) {
    const rows = input[table];
    if (!Array.isArray(rows)) {
      problems.push({ path: table, message: 'must be an array' });
      continue;
    }
    if (rows.length > BUNDLE_TABLE_MAX_ITEMS[table]) {
      problems.push({ path: table, message: `holds ${rows.length} records; a bundle may hold at most ${BUNDLE_TABLE_MAX_ITEMS[table]}` });
      continue;
    }
    rows.forEach((row, i) => checkObject(row, RECORD_FIELDS[table], `${table}[${i}]`, problems, version));
  }
  if (problems.length > 0) return { ok: false, problems: problems.slice(0, MAX_PROBLEMS) };
  const bundle = upgraded(input as unknown as ProjectBundle, version);
  checkRelations(bundle, problems);
  return problems.length > 0 ? { ok: false, problems: problems.slice(0, MAX_PROBLEMS) } : { ok: true, bundle };
}

/** A checked bundle of an older version as the current version: fields it lacks are null. */
function upgraded(bundle: ProjectBundle, version: BundleVersion): ProjectBundle {
  if (version === BUNDLE_VERSION) return bundle;
  const fill = <T extends object>(rows: T[], table: BundleTable): T[] => {
    const added = Object.entries(RECORD_FIELDS[table]).filter(([, spec]) => (spec.since ?? 1) > version).map(([name]) => name);
    return added.length === 0 ? rows : rows.map((row) => ({ ...Object.fromEntries(added.map((name) => [name, null])), ...row }));
  };
  return {
    ...bundle,
    version: BUNDLE_VERSION,
    segments: fill(bundle.segments, 'segments'),
    sites: fill(bundle.sites, 'sites'),
    units: fill(bundle.units, 'units'),
    eventHorizons: fill(bundle.eventHorizons, 'eventHorizons'),
    samples: fill(bundle.samples, 'samples'),
    hypotheses: fill(bundle.hypotheses, 'hypotheses'),
    ties: fill(bundle.ties, 'ties'),
  };
}

function indexRefs<T extends { ref: string }>(rows: T[], table: BundleTable, problems: BundleProblem[]): Map<string, T> {
  const byRef = new Map<string, T>();
  rows.forEach((row, i) => {
    if (byRef.has(row.ref)) problems.push({ path: `${table}[${i}].ref`, message: `ref ${row.ref} is used twice in ${table}` });
    byRef.set(row.ref, row);
  });
  return byRef;
}

function checkRelations(bundle: ProjectBundle, problems: BundleProblem[]): void {
  const segments = indexRefs(bundle.segments, 'segments', problems);
  const sites = indexRefs(bundle.sites, 'sites', problems);
  const units = indexRefs(bundle.units, 'units', problems);
  const horizons = indexRefs(bundle.eventHorizons, 'eventHorizons', problems);
  indexRefs(bundle.samples, 'samples', problems);
  const hypotheses = indexRefs(bundle.hypotheses, 'hypotheses', problems);
  indexRefs(bundle.ties, 'ties', problems);
  const missing = (path: string, table: string, ref: string) => problems.push({ path, message: `no ${table} with ref ${ref}` });

  bundle.segments.forEach((s, i) => {
    if (s.endKm <= s.startKm) problems.push({ path: `segments[${i}].endKm`, message: 'must be greater than startKm' });
  });
  bundle.sites.forEach((s, i) => {
    if (s.segmentRef !== null && !segments.has(s.segmentRef)) missing(`sites[${i}].segmentRef`, 'segment', s.segmentRef);
  });
  const positions = new Set<string>();
  bundle.units.forEach((u, i) => {
    if (!sites.has(u.siteRef)) missing(`units[${i}].siteRef`, 'site', u.siteRef);
    if (u.baseDepthM <= u.topDepthM) problems.push({ path: `units[${i}].baseDepthM`, message: 'must be deeper than topDepthM' });
    const key = `${u.siteRef}\u0000${u.position}`;
    if (positions.has(key)) problems.push({ path: `units[${i}].position`, message: `another unit of site ${u.siteRef} has position ${u.position}` });
    positions.add(key);
  });
  bundle.eventHorizons.forEach((h, i) => {
    if (!sites.has(h.siteRef)) missing(`eventHorizons[${i}].siteRef`, 'site', h.siteRef);
    for (const field of ['unitBelowRef', 'unitAboveRef'] as const) {
      const unit = units.get(h[field]);
      if (!unit) missing(`eventHorizons[${i}].${field}`, 'unit', h[field]);
      else if (unit.siteRef !== h.siteRef) problems.push({ path: `eventHorizons[${i}].${field}`, message: 'must be a unit of the same site' });
    }
    if (h.unitBelowRef === h.unitAboveRef) problems.push({ path: `eventHorizons[${i}].unitAboveRef`, message: 'must differ from unitBelowRef' });
  });
  const labCodes = new Set<string>();
  bundle.samples.forEach((s, i) => {
    const path = `samples[${i}]`;
    if (!sites.has(s.siteRef)) missing(`${path}.siteRef`, 'site', s.siteRef);
    const unit = units.get(s.unitRef);
    if (!unit) missing(`${path}.unitRef`, 'unit', s.unitRef);
    else if (unit.siteRef !== s.siteRef) problems.push({ path: `${path}.unitRef`, message: 'must be a unit of the sample’s site' });
    if (labCodes.has(s.labCode)) problems.push({ path: `${path}.labCode`, message: `lab code ${s.labCode} appears twice` });
    labCodes.add(s.labCode);
    if (s.method === 'RADIOCARBON') {
      for (const field of ['c14Age', 'c14Error', 'curve'] as const) {
        if (s[field] === null) problems.push({ path: `${path}.${field}`, message: 'is required for a radiocarbon sample' });
      }
    } else {
      for (const field of ['calendarAgeBp', 'calendarErrorYears'] as const) {
        if (s[field] === null) problems.push({ path: `${path}.${field}`, message: `is required for a ${s.method.toLowerCase()} sample` });
      }
      if (s.method === 'LUMINESCENCE' && s.measurementYear === null) {
        problems.push({ path: `${path}.measurementYear`, message: 'is required for a luminescence sample' });
      }
    }
  });
  if (bundle.hypotheses.filter((h) => h.preferred).length > 1) problems.push({ path: 'hypotheses', message: 'at most one hypothesis may be preferred' });
  bundle.hypotheses.forEach((h, i) => {
    if (h.copiedFromRef !== null && !hypotheses.has(h.copiedFromRef)) missing(`hypotheses[${i}].copiedFromRef`, 'hypothesis', h.copiedFromRef);
  });
  const pairs = new Set<string>();
  bundle.ties.forEach((t, i) => {
    if (!hypotheses.has(t.hypothesisRef)) missing(`ties[${i}].hypothesisRef`, 'hypothesis', t.hypothesisRef);
    if (!horizons.has(t.eventARef)) missing(`ties[${i}].eventARef`, 'event horizon', t.eventARef);
    if (!horizons.has(t.eventBRef)) missing(`ties[${i}].eventBRef`, 'event horizon', t.eventBRef);
    if (t.eventARef === t.eventBRef) problems.push({ path: `ties[${i}].eventBRef`, message: 'a tie links two different events' });
    const key = `${t.hypothesisRef}\u0000${t.eventARef}\u0000${t.eventBRef}`;
    if (pairs.has(key)) problems.push({ path: `ties[${i}]`, message: 'these two events are tied twice in one hypothesis' });
    pairs.add(key);
  });
}

/**
 * A bundle's content with the refs replaced by positions (`sites#0`) and the export time
 * dropped: two bundles of the same data from different databases (export, import, export)
 * compare equal under this. It relies on the exporter's deterministic record order.
 */
export function bundleContent(bundle: ProjectBundle): Omit<ProjectBundle, 'exportedAt'> {
  const labels = new Map<string, string>();
  for (const table of BUNDLE_TABLES) bundle[table].forEach((row, i) => labels.set(`${table}:${row.ref}`, `${table}#${i}`));
  const label = (table: BundleTable, ref: string | null) => (ref === null ? null : (labels.get(`${table}:${ref}`) ?? `missing:${ref}`));
  return {
    format: bundle.format,
    version: bundle.version,
    project: bundle.project,
    segments: bundle.segments.map((r) => ({ ...r, ref: label('segments', r.ref)! })),
    sites: bundle.sites.map((r) => ({ ...r, ref: label('sites', r.ref)!, segmentRef: label('segments', r.segmentRef) })),
    units: bundle.units.map((r) => ({ ...r, ref: label('units', r.ref)!, siteRef: label('sites', r.siteRef)! })),
    eventHorizons: bundle.eventHorizons.map((r) => ({
      ...r,
      ref: label('eventHorizons', r.ref)!,
      siteRef: label('sites', r.siteRef)!,
      unitBelowRef: label('units', r.unitBelowRef)!,
      unitAboveRef: label('units', r.unitAboveRef)!,
    })),
    samples: bundle.samples.map((r) => ({ ...r, ref: label('samples', r.ref)!, siteRef: label('sites', r.siteRef)!, unitRef: label('units', r.unitRef)! })),
    hypotheses: bundle.hypotheses.map((r) => ({ ...r, ref: label('hypotheses', r.ref)!, copiedFromRef: label('hypotheses', r.copiedFromRef) })),
    ties: bundle.ties.map((r) => ({
      ...r,
      ref: label('ties', r.ref)!,
      hypothesisRef: label('hypotheses', r.hypothesisRef)!,
      eventARef: label('eventHorizons', r.eventARef)!,
      eventBRef: label('eventHorizons', r.eventBRef)!,
    })),
  };
}

type JsonSchema = Record<string, unknown>;

function fieldSchema(spec: FieldSpec): JsonSchema {
  const nullable = 'nullable' in spec && spec.nullable === true;
  const orNull = (type: string) => (nullable ? [type, 'null'] : type);
  switch (spec.type) {
    case 'string':
      return { type: orNull('string'), ...(spec.minLength ? { minLength: spec.minLength } : {}), maxLength: spec.maxLength };
    case 'number':
    case 'integer': {
      const bounds: JsonSchema = {};
      if (spec.minimum !== undefined) bounds.minimum = spec.minimum;
      if ('exclusiveMinimum' in spec && spec.exclusiveMinimum !== undefined) bounds.exclusiveMinimum = spec.exclusiveMinimum;
      if (spec.maximum !== undefined) bounds.maximum = spec.maximum;
      return { type: orNull(spec.type), ...bounds };
    }
    case 'boolean':
      return { type: 'boolean' };
    case 'enum':
      return nullable ? { enum: [...spec.values, null] } : { type: 'string', enum: [...spec.values] };
    case 'strings':
      return { type: 'array', maxItems: spec.maxItems, items: { type: 'string', minLength: 1, maxLength: spec.maxLength } };
    case 'ref':
      return nullable ? { anyOf: [{ $ref: '#/$defs/ref' }, { type: 'null' }] } : { $ref: '#/$defs/ref' };
  }
}

function objectSchema(fields: Record<string, FieldSpec>, description?: string): JsonSchema {
  return {
    type: 'object',
    ...(description ? { description } : {}),
    additionalProperties: false,
    required: Object.keys(fields),
    properties: Object.fromEntries(Object.entries(fields).map(([name, spec]) => [name, fieldSchema(spec)])),
  };
}

const TABLE_DESCRIPTIONS: Record<BundleTable, string> = {
  segments: 'A fault or subduction-zone segment with its along-strike extent (km).',
  sites: 'A place with evidence; WGS84 latitude and longitude in degrees.',
  units: 'A stratigraphic unit; position 1 is the oldest at the base; depths in metres below the surface.',
  eventHorizons: 'The contact at which an earthquake is interpreted, between two units of its site.',
  samples: 'A dated sample; radiocarbon needs c14Age, c14Error and curve; other methods calendarAgeBp and calendarErrorYears.',
  hypotheses: 'A correlation hypothesis; at most one is preferred.',
  ties: 'A link between two event horizons in one hypothesis.',
};

/**
 * The JSON Schema (draft 2020-12) of format version 2 (the version written), built from the same field tables the
 * validator reads; `bundle.schema.json` is this object written out. The schema covers each
 * record's shape; the rules between records are the validator's (and the README's).
 */
export function bundleJsonSchema(): JsonSchema {
  return {
    $schema: 'https://json-schema.org/draft/2020-12/schema',
    $id: 'https://stratochron.invalid/schemas/stratochron-bundle/2',
    title: 'Stratochron project bundle, version 2',
    type: 'object',
    additionalProperties: false,
    required: ['format', 'version', 'exportedAt', 'project', ...BUNDLE_TABLES],
    properties: {
      format: { const: BUNDLE_FORMAT },
      version: { const: BUNDLE_VERSION },
      exportedAt: { type: 'string', format: 'date-time' },
      project: objectSchema(PROJECT_FIELDS, 'The project the records belong to; an import makes a new one.'),
      ...Object.fromEntries(
        BUNDLE_TABLES.map((table) => [table, { type: 'array', maxItems: BUNDLE_TABLE_MAX_ITEMS[table], items: { $ref: `#/$defs/${table}` } }]),
      ),
    },
    $defs: {
      ref: { type: 'string', pattern: REF_PATTERN, description: 'The exporter’s id of a record; other records name it by this.' },
      ...Object.fromEntries(BUNDLE_TABLES.map((table) => [table, objectSchema(RECORD_FIELDS[table], TABLE_DESCRIPTIONS[table])])),
    },
  };
}
