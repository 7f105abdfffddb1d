/** A value a table column sorts by; null and undefined sort last in either direction. */
export type SortValue = string | number | boolean | null | undefined;

export type SortDirection = 'ascending' | 'descending';

export type SortState<TKey extends string> = { key: TKey; direction: SortDirection };

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/** Order two values: numbers by size, text in natural order ("VKR-9" before "VKR-10"), blanks last. */
export function compareSortValues(a: SortValue, b: SortValue): number {
  const aBlank = a === null || a === undefined || a === '';
  const bBlank = b === null || b === undefined || b === '';
  if (aBlank || bBlank) return aBlank === bBlank ? 0 : aBlank ? 1 : -1;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  if (typeof a === 'boolean' && typeof b === 'boolean') return Number(a) - Number(b);
  return collator.compare(String(a), String(b));
}

/** Rows sorted by one column (stable); blanks stay at the end when descending too. */
export function sortRows<TRow, TKey extends string>(
  rows: readonly TRow[],
  sortValues: Record<TKey, (row: TRow) => SortValue>,
  { key, direction }: SortState<TKey>,
): TRow[] {
  const valueOf = sortValues[key];
  const sign = direction === 'ascending' ? 1 : -1;
  return rows
    .map((row, index) => ({ row, index, value: valueOf(row) }))
    .sort((a, b) => {
      const aBlank = a.value === null || a.value === undefined || a.value === '';
      const bBlank = b.value === null || b.value === undefined || b.value === '';
      if (aBlank !== bBlank) return aBlank ? 1 : -1;
      return sign * compareSortValues(a.value, b.value) || a.index - b.index;
    })
    .map(({ row }) => row);
}

/** Clicking a column header: a new column sorts ascending, the same column flips direction. */
export function nextSortState<TKey extends string>(current: SortState<TKey>, key: TKey): SortState<TKey> {
  if (current.key !== key) return { key, direction: 'ascending' };
  return { key, direction: current.direction === 'ascending' ? 'descending' : 'ascending' };
}

/** Whether every word of a filter appears (case-insensitively) in one of a row's texts. */
export function matchesTextFilter(texts: readonly (string | null | undefined)[], filter: string): boolean {
  const words = filter.toLowerCase().split(/\s+/).filter((word) => word !== '');
  if (words.length === 0) return true;
  const haystack = texts.filter((text): text is string => typeof text === 'string').join(' ').toLowerCase();
  return words.every((word) => haystack.includes(word));
}
