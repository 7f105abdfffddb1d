import { Icon } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { ReactNode } from 'react';
import type { SortState } from '@/modules/ui/utils/tableSort';

export type SortableColumnHeaderProps<TKey extends string> = {
  sortKey: TKey;
  sort: SortState<TKey>;
  onSort: (key: TKey) => void;
  numeric?: boolean;
  children: ReactNode;
};

/** A table header cell that sorts its column when clicked and shows the current direction. */
export function SortableColumnHeader<TKey extends string>({ sortKey, sort, onSort, numeric = false, children }: SortableColumnHeaderProps<TKey>) {
  const active = sort.key === sortKey;
  const handleClick = () => onSort(sortKey);
  return (
    <th
      className={numeric ? 'sc-th-sortable sc-numeric' : 'sc-th-sortable'}
      aria-sort={active ? sort.direction : 'none'}
    >
      <button type="button" className="sc-sort-button" onClick={handleClick}>
        {children}
        <Icon
          icon={active ? (sort.direction === 'ascending' ? IconNames.CARET_UP : IconNames.CARET_DOWN) : IconNames.DOUBLE_CARET_VERTICAL}
          size={12}
          className={active ? 'sc-sort-icon sc-sort-icon-active' : 'sc-sort-icon'}
        />
      </button>
    </th>
  );
}
