import { Flex, Table } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** The first field of a sort string and its direction. */
export function primarySort(sort: string | undefined): { field: string; dir: 'asc' | 'desc' } {
  const [field = '', dir = 'asc'] = (sort ?? '').split(',')[0].split(':');
  return { field, dir: dir === 'desc' ? 'desc' : 'asc' };
}

/** The sort after clicking `field`: flips its direction if it leads, else sorts by it ascending. */
export function nextSort(sort: string | undefined, field: string): string {
  const current = primarySort(sort);
  const dir = current.field === field && current.dir === 'asc' ? 'desc' : 'asc';
  // The code breaks ties so the order is stable from page to page.
  return field === 'code' ? `code:${dir}` : `${field}:${dir},code:asc`;
}

/** Props of a sortable column header. */
export interface SortHeaderProps {
  field: string;
  sort: string | undefined;
  onSort: (sort: string) => void;
  children: ReactNode;
  justify?: 'start' | 'end';
}

/** A column header that sorts the table by its field; says its order to screen readers. */
export function SortHeader({ field, sort, onSort, children, justify }: SortHeaderProps) {
  const current = primarySort(sort);
  const active = current.field === field;
  const ariaSort = active ? (current.dir === 'asc' ? 'ascending' : 'descending') : 'none';
  return (
    <Table.ColumnHeaderCell aria-sort={ariaSort} justify={justify}>
      <button type="button" className="sort-button" onClick={() => onSort(nextSort(sort, field))}>
        <Flex align="center" gap="1" justify={justify}>
          {children}
          <span aria-hidden className="sort-mark" data-active={active}>
            {active ? (current.dir === 'asc' ? '▲' : '▼') : '△'}
          </span>
        </Flex>
      </button>
    </Table.ColumnHeaderCell>
  );
}
