import { Table } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import type { ShotFilters, SortField } from '../api/shot-filters';

/** Props of a sortable column header. */
export interface SortHeaderProps {
  field: SortField;
  sort: ShotFilters['sort'];
  onSort: (sort: NonNullable<ShotFilters['sort']>) => void;
  children: ReactNode;
}

/** A column header that sorts the table by its field; a second press reverses the order. */
export function SortHeader({ field, sort, onSort, children }: SortHeaderProps) {
  const active = sort?.field === field;
  const direction = active ? sort.direction : undefined;
  const next = active && direction === 'asc' ? 'desc' : 'asc';
  return (
    <Table.ColumnHeaderCell
      aria-sort={direction === 'asc' ? 'ascending' : direction === 'desc' ? 'descending' : 'none'}
    >
      <button
        type="button"
        className="sort-button"
        onClick={() => onSort({ field, direction: next })}
        data-testid={`sort-${field}`}
      >
        {children}
        <span aria-hidden className="sort-mark">
          {direction === 'asc' ? '▲' : direction === 'desc' ? '▼' : '↕'}
        </span>
        <span className="visually-hidden">
          {active ? `, sorted ${direction === 'asc' ? 'ascending' : 'descending'}` : ', sort'}
        </span>
      </button>
    </Table.ColumnHeaderCell>
  );
}
