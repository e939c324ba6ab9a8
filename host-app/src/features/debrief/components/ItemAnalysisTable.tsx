import type { DebriefItemDto } from '@covalent/shared-types';
import { Badge, Flex, Table } from '@radix-ui/themes';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { SortableHeader } from '@/features/banks/components/SortableHeader';
import { routes } from '@/routes';
import { flagLabels } from '../utils/flagLabels';
import { type ItemSortKey, type SortDir, sortItems } from '../utils/sortItems';
import { FigureText } from './FigureText';

export interface ItemAnalysisTableProps {
  sessionId: string;
  items: DebriefItemDto[];
}

const columns: { key: ItemSortKey; label: string }[] = [
  { key: 'position', label: 'Position' },
  { key: 'p', label: 'p' },
  { key: 'D', label: 'D' },
  { key: 'pointBiserial', label: 'Point-biserial' },
  { key: 'flags', label: 'Flags' },
];

/** One row per item played, sortable by each figure; flags are words, not colours. */
export function ItemAnalysisTable({ sessionId, items }: ItemAnalysisTableProps) {
  const [sort, setSort] = useState<{ key: ItemSortKey; dir: SortDir }>({ key: 'position', dir: 'asc' });
  const onSort = (key: ItemSortKey) =>
    setSort((s) => (s.key === key ? { key, dir: s.dir === 'asc' ? 'desc' : 'asc' } : { key, dir: key === 'position' ? 'asc' : 'desc' }));
  const rows = sortItems(items, sort.key, sort.dir);
  const header = (key: ItemSortKey) => {
    const col = columns.find((c) => c.key === key)!;
    return <SortableHeader label={col.label} sortKey={key} activeKey={sort.key} dir={sort.dir} onSort={onSort} />;
  };

  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Item analysis</caption>
      <Table.Header>
        <Table.Row>
          {header('position')}
          <Table.ColumnHeaderCell>Item</Table.ColumnHeaderCell>
          {header('p')}
          {header('D')}
          {header('pointBiserial')}
          {header('flags')}
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {rows.map((item) => (
          <Table.Row key={item.id}>
            <Table.Cell>{item.position + 1}</Table.Cell>
            <Table.RowHeaderCell>
              <Link to={routes.debriefItem.build(sessionId, item.id)}>{item.prompt}</Link>
            </Table.RowHeaderCell>
            <Table.Cell>
              <FigureText figure={item.p} />
            </Table.Cell>
            <Table.Cell>
              <FigureText figure={item.D} />
            </Table.Cell>
            <Table.Cell>
              <FigureText figure={item.pointBiserial} />
            </Table.Cell>
            <Table.Cell>
              <Flex gap="1" wrap="wrap">
                {item.flags.map((f) => (
                  <Badge key={f} color={f === 'possibleMiskey' ? 'red' : 'amber'} variant="soft">
                    {flagLabels[f]}
                  </Badge>
                ))}
                {item.revisit && (
                  <Badge color="gray" variant="outline">
                    revisit
                  </Badge>
                )}
              </Flex>
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
