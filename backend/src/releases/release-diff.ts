import { BUNDLE_TABLES, BundleTable, ProjectBundle } from '../exchange/bundle-format';

/** What happened to one record between two releases. */
export interface RecordChange {
  objectType: string;
  objectId: string;
  label: string;
  change: 'added' | 'changed' | 'removed';
  /** For `changed`: the fields whose values differ. */
  fields: string[];
}

/** The object type each bundle table's records are called in the API and audit trail. */
export const OBJECT_TYPES: Record<BundleTable, string> = {
  segments: 'segment',
  sites: 'site',
  units: 'unit',
  eventHorizons: 'eventHorizon',
  samples: 'sample',
  hypotheses: 'hypothesis',
  ties: 'tie',
};

type AnyRecord = ProjectBundle[BundleTable][number];

function labelOf(table: BundleTable, row: AnyRecord, bundle: ProjectBundle): string {
  if ('labCode' in row) return row.labCode;
  if ('name' in row) return row.name;
  if (table === 'ties' && 'eventARef' in row) {
    const events = new Map(bundle.eventHorizons.map((h) => [h.ref, h.name]));
    return `${events.get(row.eventARef) ?? row.eventARef} – ${events.get(row.eventBRef) ?? row.eventBRef}`;
  }
  return row.ref;
}

function sameValue(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * Records added, changed and removed from one release's snapshot to another's, matched by ref
 * (the record's id, which a project keeps across releases). Listed by table in bundle order,
 * then added, changed, removed, each in the order of the snapshot it appears in.
 */
export function diffSnapshots(from: ProjectBundle, to: ProjectBundle): RecordChange[] {
  const changes: RecordChange[] = [];
  for (const table of BUNDLE_TABLES) {
    const objectType = OBJECT_TYPES[table];
    const before = new Map<string, AnyRecord>(from[table].map((row) => [row.ref, row]));
    const after = new Map<string, AnyRecord>(to[table].map((row) => [row.ref, row]));
    const changed: RecordChange[] = [];
    for (const row of to[table] as AnyRecord[]) {
      const old = before.get(row.ref);
      if (!old) {
        changes.push({ objectType, objectId: row.ref, label: labelOf(table, row, to), change: 'added', fields: [] });
        continue;
      }
      const oldFields = old as unknown as Record<string, unknown>;
      const newFields = row as unknown as Record<string, unknown>;
      const fields = Object.keys(newFields).filter((name) => !sameValue(oldFields[name], newFields[name]));
      if (fields.length > 0) changed.push({ objectType, objectId: row.ref, label: labelOf(table, row, to), change: 'changed', fields });
    }
    changes.push(...changed);
    for (const row of from[table] as AnyRecord[]) {
      if (!after.has(row.ref)) changes.push({ objectType, objectId: row.ref, label: labelOf(table, row, from), change: 'removed', fields: [] });
    }
  }
  return changes;
}
