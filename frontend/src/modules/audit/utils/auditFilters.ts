import type { AuditTrailInput } from '@/gql/graphql';

/** The audit table's filters as the form holds them; blank means "any". */
export type AuditFilters = {
  actorId: string;
  objectType: string;
  objectId: string;
  /** First day shown, `YYYY-MM-DD` (UTC). */
  fromDate: string;
  /** Last day shown, `YYYY-MM-DD` (UTC), included whole. */
  toDate: string;
};

export const NO_AUDIT_FILTERS: AuditFilters = { actorId: '', objectType: '', objectId: '', fromDate: '', toDate: '' };

/** Records per page; the server allows up to 200 (backend audit/dto/audit-trail.input.ts). */
export const AUDIT_PAGE_SIZE = 25;

/** Object types the API records (objectType of backend audit calls), for the filter's suggestions. */
export const AUDIT_OBJECT_TYPES = [
  'project',
  'segment',
  'site',
  'unit',
  'eventHorizon',
  'sample',
  'attachment',
  'hypothesis',
  'tie',
  'membership',
  'invitation',
  'release',
  'user',
] as const;

const DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Midnight UTC at the start of a `YYYY-MM-DD` day, or null for blank or malformed text. */
export function startOfUtcDay(day: string): Date | null {
  const match = DAY.exec(day.trim());
  if (!match) return null;
  const date = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  // Date.UTC rolls 2025-02-31 into March and month 13 into the next year; such a day is not a day.
  return date.getUTCMonth() === Number(match[2]) - 1 && date.getUTCDate() === Number(match[3]) ? date : null;
}

/**
 * The API input for one page of the trail. The "to" day is included whole: the bound sent is the
 * last millisecond of that day, since the server compares `at <= to`.
 */
export function auditTrailInput(projectId: string, filters: AuditFilters, after: string | null, first = AUDIT_PAGE_SIZE): AuditTrailInput {
  const input: AuditTrailInput = { projectId, first };
  if (after) input.after = after;
  if (filters.actorId) input.actorId = filters.actorId;
  if (filters.objectType.trim()) input.objectType = filters.objectType.trim();
  if (filters.objectId.trim()) input.objectId = filters.objectId.trim();
  const from = startOfUtcDay(filters.fromDate);
  if (from) input.from = from.toISOString();
  const toStart = startOfUtcDay(filters.toDate);
  if (toStart) input.to = new Date(toStart.getTime() + 86_400_000 - 1).toISOString();
  return input;
}

/** Whether a filter's text cannot be sent (a date that is not a day, a from after the to). */
export function auditFilterProblems(filters: AuditFilters): Partial<Record<'fromDate' | 'toDate', string>> {
  const problems: Partial<Record<'fromDate' | 'toDate', string>> = {};
  const from = startOfUtcDay(filters.fromDate);
  const to = startOfUtcDay(filters.toDate);
  if (filters.fromDate.trim() && !from) problems.fromDate = 'not a day (YYYY-MM-DD)';
  if (filters.toDate.trim() && !to) problems.toDate = 'not a day (YYYY-MM-DD)';
  if (from && to && from > to) problems.toDate = 'before the first day';
  return problems;
}

/** One field of an audited record, before and after the change. */
export type AuditFieldChange = {
  field: string;
  before: unknown;
  after: unknown;
  changed: boolean;
};

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Structural equality of JSON values (key order ignored). */
export function sameJson(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((item, index) => sameJson(item, b[index]));
  if (isRecord(a) && isRecord(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].every((key) => sameJson(a[key], b[key]));
  }
  return false;
}

/**
 * The fields of a before/after pair, in the order they first appear, each marked changed when
 * the two images differ there. A create has no before and a delete no after: every field counts
 * as changed. Images that are not objects are shown as one field, `value`.
 */
export function auditFieldChanges(before: unknown, after: unknown): AuditFieldChange[] {
  const hasBefore = before !== null && before !== undefined;
  const hasAfter = after !== null && after !== undefined;
  if ((hasBefore && !isRecord(before)) || (hasAfter && !isRecord(after))) {
    return [{ field: 'value', before: before ?? null, after: after ?? null, changed: !sameJson(before ?? null, after ?? null) }];
  }
  const beforeRecord = isRecord(before) ? before : {};
  const afterRecord = isRecord(after) ? after : {};
  const fields = [...new Set([...Object.keys(beforeRecord), ...Object.keys(afterRecord)])];
  return fields.map((field) => {
    const old = field in beforeRecord ? beforeRecord[field] : undefined;
    const next = field in afterRecord ? afterRecord[field] : undefined;
    return { field, before: old, after: next, changed: !hasBefore || !hasAfter || !sameJson(old, next) };
  });
}

/** A JSON value as one short line for a table cell; undefined (absent) as an em dash. */
export function jsonCellText(value: unknown): string {
  if (value === undefined) return '—';
  return typeof value === 'string' ? value : JSON.stringify(value);
}
