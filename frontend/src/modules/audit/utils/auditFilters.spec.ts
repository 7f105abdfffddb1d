import { describe, expect, it } from 'vitest';
import {
  auditFieldChanges,
  auditFilterProblems,
  auditTrailInput,
  jsonCellText,
  NO_AUDIT_FILTERS,
  sameJson,
  startOfUtcDay,
} from './auditFilters';

describe(startOfUtcDay.name, () => {
  it('reads a day as midnight UTC', () => {
    expect(startOfUtcDay('2025-03-09')?.toISOString()).toBe('2025-03-09T00:00:00.000Z');
  });

  it('refuses days that do not exist and other text (2025 is not a leap year: Gregorian rule)', () => {
    expect(startOfUtcDay('2025-02-29')).toBeNull();
    expect(startOfUtcDay('2024-02-29')?.toISOString()).toBe('2024-02-29T00:00:00.000Z');
    expect(startOfUtcDay('9 March')).toBeNull();
    expect(startOfUtcDay('')).toBeNull();
  });
});

describe(auditTrailInput.name, () => {
  it('sends only the project and page size when nothing is filtered', () => {
    expect(auditTrailInput('p1', NO_AUDIT_FILTERS, null, 25)).toEqual({ projectId: 'p1', first: 25 });
  });

  it('sends every filter, with the last day included whole', () => {
    expect(
      auditTrailInput('p1', { actorId: 'u7', objectType: ' sample ', objectId: ' s-9 ', fromDate: '2025-01-01', toDate: '2025-01-31' }, 'c42', 10),
    ).toEqual({
      projectId: 'p1',
      first: 10,
      after: 'c42',
      actorId: 'u7',
      objectType: 'sample',
      objectId: 's-9',
      from: '2025-01-01T00:00:00.000Z',
      to: '2025-01-31T23:59:59.999Z',
    });
  });
});

describe(auditFilterProblems.name, () => {
  it('flags malformed days and a range running backwards', () => {
    expect(auditFilterProblems({ ...NO_AUDIT_FILTERS, fromDate: '2025-13-01' })).toEqual({ fromDate: 'not a day (YYYY-MM-DD)' });
    expect(auditFilterProblems({ ...NO_AUDIT_FILTERS, fromDate: '2025-02-02', toDate: '2025-02-01' })).toEqual({ toDate: 'before the first day' });
    expect(auditFilterProblems({ ...NO_AUDIT_FILTERS, fromDate: '2025-02-01', toDate: '2025-02-01' })).toEqual({});
  });
});

describe(sameJson.name, () => {
  it('compares structure, not key order', () => {
    expect(sameJson({ a: 1, b: [1, { c: null }] }, { b: [1, { c: null }], a: 1 })).toBe(true);
    expect(sameJson({ a: 1 }, { a: 1, b: null })).toBe(false);
    expect(sameJson([1, 2], [2, 1])).toBe(false);
  });
});

describe(auditFieldChanges.name, () => {
  it('marks only the fields an update changed', () => {
    const changes = auditFieldChanges({ id: 'u1', name: 'peat', topDepthM: 1.2 }, { id: 'u1', name: 'peat', topDepthM: 1.25 });
    expect(changes.map((change) => [change.field, change.changed])).toEqual([
      ['id', false],
      ['name', false],
      ['topDepthM', true],
    ]);
  });

  it('counts every field of a create or a delete as changed', () => {
    expect(auditFieldChanges(null, { id: 'x', labCode: 'VLM-101' }).every((change) => change.changed)).toBe(true);
    expect(auditFieldChanges({ id: 'x' }, null)).toEqual([{ field: 'id', before: 'x', after: undefined, changed: true }]);
  });

  it('keeps a field only one side has, as absent on the other', () => {
    expect(auditFieldChanges({ a: 1 }, { a: 1, role: 'ADMIN' })).toEqual([
      { field: 'a', before: 1, after: 1, changed: false },
      { field: 'role', before: undefined, after: 'ADMIN', changed: true },
    ]);
  });

  it('shows images that are not objects as one value', () => {
    expect(auditFieldChanges('old', 'new')).toEqual([{ field: 'value', before: 'old', after: 'new', changed: true }]);
  });
});

describe(jsonCellText.name, () => {
  it('writes strings bare, other values as JSON and absence as a dash', () => {
    expect([jsonCellText('peat'), jsonCellText(1.5), jsonCellText(null), jsonCellText({ a: [1] }), jsonCellText(undefined)]).toEqual([
      'peat',
      '1.5',
      'null',
      '{"a":[1]}',
      '—',
    ]);
  });
});
