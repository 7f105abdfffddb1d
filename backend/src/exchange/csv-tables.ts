import { CsvValue, toCsv } from '../common/csv';
import { ProjectBundle } from './bundle-format';

/** The tables a project exports as CSV, by their URL name (`/export/<table>.csv`). */
export const CSV_TABLES = ['sites', 'units', 'event-horizons', 'samples', 'hypotheses', 'ties'] as const;
export type CsvTable = (typeof CSV_TABLES)[number];

export function isCsvTable(name: string): name is CsvTable {
  return (CSV_TABLES as readonly string[]).includes(name);
}

interface Column<T> {
  header: string;
  value: (row: T) => CsvValue;
}

const column = <T>(header: string, value: (row: T) => CsvValue): Column<T> => ({ header, value });

function table<T>(rows: readonly T[], columns: Column<T>[]): string {
  return toCsv([columns.map((c) => c.header), ...rows.map((row) => columns.map((c) => c.value(row)))]);
}

/**
 * One table of a project as CSV: one row per record, ids as the database holds them, names of
 * the related site or unit beside their ids so a spreadsheet reads without lookups. Cells are
 * written through `toCsv`, which neutralises formula injection.
 */
export function tableCsv(bundle: ProjectBundle, name: CsvTable): string {
  const siteName = new Map(bundle.sites.map((s) => [s.ref, s.name]));
  const unitName = new Map(bundle.units.map((u) => [u.ref, u.name]));
  const segmentName = new Map(bundle.segments.map((s) => [s.ref, s.name]));
  const eventName = new Map(bundle.eventHorizons.map((h) => [h.ref, `${siteName.get(h.siteRef) ?? ''} ${h.name}`.trim()]));
  const hypothesisName = new Map(bundle.hypotheses.map((h) => [h.ref, h.name]));
  const list = (values: string[]) => values.join('; ');
  switch (name) {
    case 'sites':
      return table(bundle.sites, [
        column('id', (s) => s.ref), column('name', (s) => s.name), column('kind', (s) => s.kind),
        column('latitude', (s) => s.latitude), column('longitude', (s) => s.longitude), column('along_strike_km', (s) => s.alongStrikeKm),
        column('elevation_m', (s) => s.elevationM), column('water_depth_m', (s) => s.waterDepthM),
        column('segment_id', (s) => s.segmentRef), column('segment', (s) => (s.segmentRef ? segmentName.get(s.segmentRef) : null)),
        column('notes', (s) => s.notes),
      ]);
    case 'units':
      return table(bundle.units, [
        column('id', (u) => u.ref), column('site_id', (u) => u.siteRef), column('site', (u) => siteName.get(u.siteRef)),
        column('position', (u) => u.position), column('name', (u) => u.name), column('top_depth_m', (u) => u.topDepthM),
        column('base_depth_m', (u) => u.baseDepthM), column('facies', (u) => u.facies), column('notes', (u) => u.notes),
      ]);
    case 'event-horizons':
      return table(bundle.eventHorizons, [
        column('id', (h) => h.ref), column('site_id', (h) => h.siteRef), column('site', (h) => siteName.get(h.siteRef)),
        column('name', (h) => h.name), column('unit_below_id', (h) => h.unitBelowRef), column('unit_below', (h) => unitName.get(h.unitBelowRef)),
        column('unit_above_id', (h) => h.unitAboveRef), column('unit_above', (h) => unitName.get(h.unitAboveRef)),
        column('quality', (h) => h.quality), column('evidence', (h) => list(h.evidence)), column('notes', (h) => h.notes),
      ]);
    case 'samples':
      return table(bundle.samples, [
        column('id', (s) => s.ref), column('lab_code', (s) => s.labCode), column('site_id', (s) => s.siteRef),
        column('site', (s) => siteName.get(s.siteRef)), column('unit_id', (s) => s.unitRef), column('unit', (s) => unitName.get(s.unitRef)),
        column('method', (s) => s.method), column('material', (s) => s.material), column('depth_m', (s) => s.depthM),
        column('age_relation', (s) => s.ageRelation), column('c14_age', (s) => s.c14Age), column('c14_error', (s) => s.c14Error),
        column('delta13c', (s) => s.delta13C), column('curve', (s) => s.curve), column('delta_r', (s) => s.deltaR),
        column('delta_r_error', (s) => s.deltaRError), column('delta_r_source', (s) => s.deltaRSource),
        column('inheritance_scale_years', (s) => s.inheritanceScaleYears), column('calendar_age_bp', (s) => s.calendarAgeBp),
        column('calendar_error_years', (s) => s.calendarErrorYears), column('measurement_year', (s) => s.measurementYear),
        column('excluded', (s) => s.excluded), column('exclusion_reason', (s) => s.exclusionReason), column('notes', (s) => s.notes),
      ]);
    case 'hypotheses':
      return table(bundle.hypotheses, [
        column('id', (h) => h.ref), column('name', (h) => h.name), column('description', (h) => h.description),
        column('preferred', (h) => h.preferred), column('copied_from_id', (h) => h.copiedFromRef),
      ]);
    case 'ties':
      return table(bundle.ties, [
        column('id', (t) => t.ref), column('hypothesis_id', (t) => t.hypothesisRef), column('hypothesis', (t) => hypothesisName.get(t.hypothesisRef)),
        column('event_a_id', (t) => t.eventARef), column('event_a', (t) => eventName.get(t.eventARef)),
        column('event_b_id', (t) => t.eventBRef), column('event_b', (t) => eventName.get(t.eventBRef)),
        column('confidence', (t) => t.confidence), column('evidence', (t) => list(t.evidence)), column('note', (t) => t.note),
      ]);
  }
}
