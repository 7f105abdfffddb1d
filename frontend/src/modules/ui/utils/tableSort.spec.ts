import { describe, expect, it } from 'vitest';
import { compareSortValues, matchesTextFilter, nextSortState, sortRows } from './tableSort';

describe(compareSortValues.name, () => {
  it('orders numbers by size and lab codes in natural order', () => {
    expect(compareSortValues(9, 10)).toBeLessThan(0);
    expect(compareSortValues('VKR-9', 'VKR-10')).toBeLessThan(0);
    expect(compareSortValues('peat', 'Peat')).toBe(0);
  });

  it('puts blanks last', () => {
    expect(compareSortValues(null, 1)).toBeGreaterThan(0);
    expect(compareSortValues('', 'a')).toBeGreaterThan(0);
    expect(compareSortValues(undefined, null)).toBe(0);
  });
});

describe(sortRows.name, () => {
  const rows = [
    { name: 'b', km: 20 },
    { name: 'a', km: null },
    { name: 'c', km: 5 },
    { name: 'd', km: 20 },
  ];
  const values = { name: (row: (typeof rows)[number]) => row.name, km: (row: (typeof rows)[number]) => row.km };

  it('sorts ascending and descending, keeping ties in their order and blanks last', () => {
    expect(sortRows(rows, values, { key: 'km', direction: 'ascending' }).map((row) => row.name)).toEqual(['c', 'b', 'd', 'a']);
    expect(sortRows(rows, values, { key: 'km', direction: 'descending' }).map((row) => row.name)).toEqual(['b', 'd', 'c', 'a']);
  });

  it('does not reorder the rows it was given', () => {
    sortRows(rows, values, { key: 'name', direction: 'ascending' });
    expect(rows[0]!.name).toBe('b');
  });
});

describe(nextSortState.name, () => {
  it('starts a new column ascending and flips the same column', () => {
    expect(nextSortState({ key: 'a', direction: 'descending' }, 'b')).toEqual({ key: 'b', direction: 'ascending' });
    expect(nextSortState({ key: 'a', direction: 'ascending' }, 'a')).toEqual({ key: 'a', direction: 'descending' });
  });
});

describe(matchesTextFilter.name, () => {
  it('needs every word somewhere in the row, ignoring case', () => {
    expect(matchesTextFilter(['Skarrow Marsh', 'MARSH', 'North'], 'marsh north')).toBe(true);
    expect(matchesTextFilter(['Skarrow Marsh', 'MARSH', null], 'core')).toBe(false);
    expect(matchesTextFilter(['anything'], '  ')).toBe(true);
  });
});
