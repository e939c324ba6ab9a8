import { Button, Table } from '@radix-ui/themes';

export interface SortableHeaderProps<K extends string> {
  label: string;
  sortKey: K;
  activeKey: K;
  dir: 'asc' | 'desc';
  onSort: (key: K) => void;
}

/** A column header that sorts the table; `aria-sort` tells screen readers which column leads. */
export function SortableHeader<K extends string>({ label, sortKey, activeKey, dir, onSort }: SortableHeaderProps<K>) {
  const active = sortKey === activeKey;
  const ariaSort = active ? (dir === 'asc' ? 'ascending' : 'descending') : 'none';
  return (
    <Table.ColumnHeaderCell aria-sort={ariaSort}>
      <Button variant="ghost" color="gray" highContrast onClick={() => onSort(sortKey)}>
        {label}
        <span aria-hidden="true">{active ? (dir === 'asc' ? ' ↑' : ' ↓') : ''}</span>
      </Button>
    </Table.ColumnHeaderCell>
  );
}
